"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { auth } from "@/server/auth/auth";
import { authError } from "@/server/auth/errors";

export type InvitationActionState = { error?: string } | undefined;

export async function acceptInvitationAction(
  _prev: InvitationActionState,
  formData: FormData,
): Promise<InvitationActionState> {
  const id = String(formData.get("invitationId") ?? "");
  const h = await headers();
  let teamId: string;
  try {
    const res = await auth.api.acceptInvitation({ body: { invitationId: id }, headers: h });
    if (!res) return { error: "This invitation could not be accepted." };
    teamId = res.invitation.organizationId;
    await auth.api.setActiveOrganization({ body: { organizationId: teamId }, headers: h });
  } catch (err) {
    const e = authError(err);
    if (!e) throw err;
    if (e.code === "INVITATION_NOT_FOUND") return { error: "This invitation has expired or was already answered." };
    if (e.code === "YOU_ARE_NOT_THE_RECIPIENT_OF_THE_INVITATION")
      return { error: "This invitation is for another e-mail address. Sign in with that address to accept it." };
    return { error: e.message };
  }
  redirect("/missions");
}

export async function declineInvitationAction(
  _prev: InvitationActionState,
  formData: FormData,
): Promise<InvitationActionState> {
  const id = String(formData.get("invitationId") ?? "");
  try {
    await auth.api.rejectInvitation({ body: { invitationId: id }, headers: await headers() });
  } catch (err) {
    const e = authError(err);
    if (!e) throw err;
    return { error: e.message };
  }
  redirect(`/invitations/${encodeURIComponent(id)}`);
}
