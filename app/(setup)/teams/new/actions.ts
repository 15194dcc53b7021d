"use server";
import { redirect } from "next/navigation";
import { CreateTeamSchema } from "@/schemas/auth";
import { formAction } from "@/server/core";
import { createTeam } from "@/server/team/service";

/** Creates a team (the creator becomes its owner), makes it active and opens its missions. */
export const createTeamAction = formAction(
  { access: "signed-in", schema: CreateTeamSchema, signInNext: "/teams/new" },
  async ({ headers, value }) => {
    await createTeam(headers, value.name);
    redirect("/missions");
  },
);
