import { guarded, json } from "@/server/core";
import { cancelInvitation } from "@/server/team/service";

/** Cancels a pending invitation. */
export const DELETE = guarded(
  { invitation: ["cancel"] },
  { what: "cancel invitations", params: ["id"] },
  async ({ request, actor, params }) =>
    json(await cancelInvitation(actor, request.headers, { invitationId: params.id })),
);
