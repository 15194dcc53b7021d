import { ANY_MEMBER, guarded, json } from "@/server/core";
import { getTeam } from "@/server/team/service";

/** The active team: members with roles, pending invitations, and the caller's own role. */
export const GET = guarded(ANY_MEMBER, { what: "read the team" }, async ({ request, actor }) => {
  const { team, members, invitations } = await getTeam(actor, request.headers);
  return json({ team, role: actor.role, members, invitations });
});
