import { createWaiverSchema } from "@/schemas/review";
import { getMissionRow, guarded, json } from "@/server/core";
import { createWaiver, listWaivers } from "@/server/review";

const params = ["missionId"] as const;

export const GET = guarded({ review: ["read"] }, { what: "read waivers", params }, async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  return json({ waivers: await listWaivers(m.id) });
});

export const POST = guarded(
  { review: ["waive"] },
  { what: "record a waiver", params, body: createWaiverSchema, bodyLimit: 20_000, input: "waiver" },
  async ({ actor, params, body }) => json(await createWaiver(actor, params.missionId, body), 201),
);
