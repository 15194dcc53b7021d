"use server";
import { redirect } from "next/navigation";
import { InvitationIdSchema } from "@/schemas/auth";
import { stateAction, type ActionState } from "@/server/core";
import { acceptInvitation, declineInvitation } from "@/server/team/service";

export type InvitationActionState = ActionState;

/** Accepts the invitation as the signed-in person, makes its team active and opens its missions. */
export const acceptInvitationAction = stateAction(
  { access: "signed-in", schema: InvitationIdSchema },
  async ({ headers, value }) => {
    await acceptInvitation(headers, value.invitationId);
    redirect("/missions");
  },
);

/** Declines the invitation; the page then shows it as answered. */
export const declineInvitationAction = stateAction(
  { access: "signed-in", schema: InvitationIdSchema },
  async ({ headers, value }) => {
    await declineInvitation(headers, value.invitationId);
    redirect(`/invitations/${encodeURIComponent(value.invitationId)}`);
  },
);
