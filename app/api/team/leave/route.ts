import { ANY_MEMBER, guarded, json } from "@/server/core";
import { leaveTeam } from "@/server/team/service";

/** Leaves the active team; the last owner gets 409. */
export const POST = guarded(ANY_MEMBER, { what: "leave the team" }, async ({ request, actor }) =>
  json(await leaveTeam(actor, request.headers)),
);
