import { errorResponse } from "@/server/http";
import { leaveTeam } from "@/server/team/service";

/** Leaves the active team; the last owner gets 409. */
export async function POST(request: Request) {
  try {
    return Response.json(await leaveTeam(request.headers));
  } catch (err) {
    return errorResponse(err);
  }
}
