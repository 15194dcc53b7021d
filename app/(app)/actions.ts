"use server";
import { redirect } from "next/navigation";
import { z } from "zod";
import { SwitchTeamSchema } from "@/schemas/auth";
import { auth } from "@/server/auth/auth";
import { plainAction } from "@/server/core";
import { switchTeam } from "@/server/team/service";

/** Makes a team the active one (better-auth checks membership) and goes to its missions. */
export const switchTeamAction = plainAction(
  {
    access: "signed-in",
    schema: SwitchTeamSchema,
    signInNext: "/missions",
    // A missing choice goes back to the missions; a team the person does not belong to, to the team picker.
    refused: (err) =>
      redirect(err.status === 400 && err.code === "invalid-input" ? "/missions" : "/teams/new?error=not-a-member"),
  },
  async ({ headers, value }) => {
    if (value.teamId === "__new") redirect("/teams/new");
    await switchTeam(headers, value.teamId);
    redirect("/missions");
  },
);

/** Signs out (a signed-out caller is simply sent to the sign-in page). */
export const signOutAction = plainAction(
  { access: "public", schema: z.object({}), refused: () => redirect("/sign-in") },
  async ({ headers }) => {
    await auth.api.signOut({ headers }).catch(() => undefined);
    redirect("/sign-in");
  },
);
