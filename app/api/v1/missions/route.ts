import { CAN, createMission, guarded, json, listMissions, readJsonBody } from "@/server/workspace";

export const GET = guarded(CAN.read, "read missions", async ({ actor }) =>
  json({ missions: await listMissions(actor) }),
);

export const POST = guarded(CAN.createMission, "create missions", async ({ request, actor }) =>
  json(await createMission(actor, await readJsonBody(request)), 201),
);
