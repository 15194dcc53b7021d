"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { auth } from "@/server/auth/auth";
import { authError } from "@/server/auth/errors";
import { SwitchTeamSchema } from "@/schemas/auth";

/** Makes a team the active one (better-auth checks membership) and goes to its missions. */
export async function switchTeamAction(formData: FormData): Promise<void> {
  const parsed = SwitchTeamSchema.safeParse({ teamId: formData.get("teamId") });
  if (!parsed.success) redirect("/missions");
  if (parsed.data.teamId === "__new") redirect("/teams/new");
  try {
    await auth.api.setActiveOrganization({ body: { organizationId: parsed.data.teamId }, headers: await headers() });
  } catch (err) {
    if (!authError(err)) throw err;
    redirect("/teams/new?error=not-a-member");
  }
  redirect("/missions");
}

export async function signOutAction(): Promise<void> {
  await auth.api.signOut({ headers: await headers() }).catch(() => undefined);
  redirect("/sign-in");
}
