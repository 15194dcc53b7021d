import { missionCreateSchema } from "@/schemas/workspace";
import { guarded, json } from "@/server/core";
import { CAN, createMission, listMissions } from "@/server/workspace";

export const GET = guarded(CAN.read, { what: "read missions" }, async ({ actor }) =>
  json({ missions: await listMissions(actor) }),
);

export const POST = guarded(
  CAN.createMission,
  { what: "create missions", body: missionCreateSchema, input: "mission" },
  async ({ actor, body }) => json(await createMission(actor, body), 201),
);
