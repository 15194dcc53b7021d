import { errorResponse } from "@/server/http";
import { getTeam } from "@/server/team/service";

/** The active team: members with roles, pending invitations, and the caller's own role. */
export async function GET(request: Request) {
  try {
    const { actor, team, members, invitations } = await getTeam(request.headers);
    return Response.json({ team, role: actor.role, members, invitations });
  } catch (err) {
    return errorResponse(err);
  }
}
