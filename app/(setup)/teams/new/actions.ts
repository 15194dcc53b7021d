"use server";
import { parseWithZod } from "@conform-to/zod/v4";
import { randomBytes } from "node:crypto";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { auth } from "@/server/auth/auth";
import { authError } from "@/server/auth/errors";
import { CreateTeamSchema, slugFromName } from "@/schemas/auth";

/** Creates a team (the creator becomes its owner), makes it active and opens its missions. */
export async function createTeamAction(_prev: unknown, formData: FormData) {
  const submission = parseWithZod(formData, { schema: CreateTeamSchema });
  if (submission.status !== "success") return submission.reply();
  const h = await headers();
  const session = await auth.api.getSession({ headers: h });
  if (!session) redirect("/sign-in?next=/teams/new");
  try {
    const team = await auth.api.createOrganization({
      body: { name: submission.value.name, slug: slugFromName(submission.value.name, randomBytes(3).toString("hex")) },
      headers: h,
    });
    if (team) await auth.api.setActiveOrganization({ body: { organizationId: team.id }, headers: h });
  } catch (err) {
    const e = authError(err);
    if (e) return submission.reply({ formErrors: [e.message] });
    throw err;
  }
  redirect("/missions");
}
