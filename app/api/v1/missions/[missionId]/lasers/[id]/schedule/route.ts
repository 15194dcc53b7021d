import { scheduleUpdateSchema } from "@/schemas/workspace-schedule";
import { guarded, json } from "@/server/core";
import { CAN, getSchedule, putSchedule } from "@/server/workspace";

const params = ["missionId", "id"] as const;

export const GET = guarded(CAN.read, { what: "read the schedule", params }, async ({ actor, params }) =>
  json(await getSchedule(actor, params.missionId, params.id)),
);

export const PUT = guarded(
  CAN.edit,
  { what: "change the schedule", params, body: scheduleUpdateSchema, input: "schedule" },
  async ({ actor, params, body }) => json(await putSchedule(actor, params.missionId, params.id, body)),
);
