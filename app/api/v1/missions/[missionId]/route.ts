import { deleteQuerySchema } from "@/schemas/workspace";
import { CAN, deleteMission, getMission, guarded, json, readJsonBody, updateMission } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";

type P = "missionId";

export const GET = guarded<P>(CAN.read, "read missions", async ({ actor, params }) =>
  json(await getMission(actor, params.missionId)),
);

export const PATCH = guarded<P>(CAN.updateMission, "change missions", async ({ request, actor, params }) =>
  json(await updateMission(actor, params.missionId, await readJsonBody(request))),
);

export const DELETE = guarded<P>(CAN.deleteMission, "delete missions", async ({ actor, params, query }) => {
  const version = query.version === undefined ? undefined : parseOr400(deleteQuerySchema, query, "query").version;
  return json(await deleteMission(actor, params.missionId, version));
});
