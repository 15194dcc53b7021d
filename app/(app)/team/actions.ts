"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { ChangeRoleSchema, InvitationIdSchema, InviteSchema, MemberIdSchema } from "@/schemas/auth";
import { ANY_MEMBER, formAction, stateAction, type ActionState } from "@/server/core";
import { cancelInvitation, changeMemberRole, inviteMember, leaveTeam, removeMember } from "@/server/team/service";

export type { ActionState };

export const inviteAction = formAction(
  { access: { invitation: ["create"] }, what: "invite people", schema: InviteSchema },
  async ({ actor, headers, value }) => {
    await inviteMember(actor, headers, value);
    revalidatePath("/team");
    redirect(`/team?invited=${encodeURIComponent(value.email)}`);
  },
);

export const changeRoleAction = stateAction(
  { access: { member: ["update"] }, what: "change roles", schema: ChangeRoleSchema },
  async ({ actor, headers, value }) => {
    await changeMemberRole(actor, headers, value);
    revalidatePath("/team");
    return { ok: "Role changed." };
  },
);

export const removeMemberAction = stateAction(
  { access: { member: ["delete"] }, what: "remove members", schema: MemberIdSchema },
  async ({ actor, headers, value }) => {
    await removeMember(actor, headers, value);
    revalidatePath("/team");
    return { ok: "Member removed." };
  },
);

export const cancelInvitationAction = stateAction(
  {
    access: { invitation: ["cancel"] },
    what: "cancel invitations",
    schema: InvitationIdSchema,
  },
  async ({ actor, headers, value }) => {
    await cancelInvitation(actor, headers, value);
    revalidatePath("/team");
    return { ok: "Invitation cancelled." };
  },
);

export const leaveTeamAction = stateAction(
  { access: ANY_MEMBER, what: "leave the team", schema: z.object({}) },
  async ({ actor, headers }) => {
    await leaveTeam(actor, headers);
    revalidatePath("/team");
    redirect("/teams/new");
  },
);
