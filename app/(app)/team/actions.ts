"use server";
import { parseWithZod } from "@conform-to/zod/v4";
import { revalidatePath } from "next/cache";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { HttpError } from "@/server/http";
import { cancelInvitation, changeMemberRole, inviteMember, leaveTeam, removeMember } from "@/server/team/service";
import { InviteSchema } from "@/schemas/auth";

export type ActionState = { error?: string; ok?: string } | undefined;

export async function inviteAction(_prev: unknown, formData: FormData) {
  const submission = parseWithZod(formData, { schema: InviteSchema });
  if (submission.status !== "success") return submission.reply();
  try {
    await inviteMember(await headers(), submission.value);
  } catch (err) {
    if (!(err instanceof HttpError)) throw err;
    if (err.issues?.length)
      return submission.reply({ fieldErrors: Object.fromEntries(err.issues.map((i) => [i.path, [i.message]])) });
    return submission.reply({ formErrors: [err.message] });
  }
  revalidatePath("/team");
  redirect(`/team?invited=${encodeURIComponent(submission.value.email)}`);
}

async function run(fn: (h: Headers) => Promise<unknown>, ok: string): Promise<ActionState> {
  try {
    await fn(await headers());
  } catch (err) {
    if (err instanceof HttpError) return { error: err.message };
    throw err;
  }
  revalidatePath("/team");
  return { ok };
}

export async function changeRoleAction(_prev: ActionState, formData: FormData): Promise<ActionState> {
  return run(
    (h) => changeMemberRole(h, { memberId: formData.get("memberId"), role: formData.get("role") }),
    "Role changed.",
  );
}

export async function removeMemberAction(_prev: ActionState, formData: FormData): Promise<ActionState> {
  return run((h) => removeMember(h, { memberId: formData.get("memberId") }), "Member removed.");
}

export async function cancelInvitationAction(_prev: ActionState, formData: FormData): Promise<ActionState> {
  return run((h) => cancelInvitation(h, { invitationId: formData.get("invitationId") }), "Invitation cancelled.");
}

export async function leaveTeamAction(_prev: ActionState, _formData: FormData): Promise<ActionState> {
  const result = await run((h) => leaveTeam(h), "You left the team.");
  if (result?.error) return result;
  redirect("/teams/new");
}
