import { z } from "zod";
import { deleteQuerySchema, missionUpdateSchema } from "@/schemas/workspace";
import { guarded, json } from "@/server/core";
import { CAN, deleteMission, getMission, updateMission } from "@/server/workspace";

const params = ["missionId"] as const;
/** `?version=` is optional when deleting a mission (checked when given). */
const deleteMissionQuery = z.object({ version: deleteQuerySchema.shape.version.optional() });

export const GET = guarded(CAN.read, { what: "read missions", params }, async ({ actor, params }) =>
  json(await getMission(actor, params.missionId)),
);

export const PATCH = guarded(
  CAN.updateMission,
  { what: "change missions", params, body: missionUpdateSchema, input: "mission update" },
  async ({ actor, params, body }) => json(await updateMission(actor, params.missionId, body)),
);

export const DELETE = guarded(
  CAN.deleteMission,
  { what: "delete missions", params, query: deleteMissionQuery, input: "query" },
  async ({ actor, params, query }) => json(await deleteMission(actor, params.missionId, query.version)),
);
