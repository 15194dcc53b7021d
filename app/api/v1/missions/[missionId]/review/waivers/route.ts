import { getMissionRow, guarded, json, readJsonBody } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";
import { createWaiver, listWaivers } from "@/server/review";
import { createWaiverSchema } from "@/schemas/review";

export const GET = guarded<"missionId">({ review: ["read"] }, "read waivers", async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  return json({ waivers: await listWaivers(m.id) });
});

export const POST = guarded<"missionId">(
  { review: ["waive"] },
  "record a waiver",
  async ({ request, actor, params }) => {
    const body = parseOr400(createWaiverSchema, await readJsonBody(request, 20_000), "waiver");
    return json(await createWaiver(actor, params.missionId, body), 201);
  },
);
