import { getMissionRow, guarded, json } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";
import { compareMissionRevisions } from "@/server/review";
import { compareQuerySchema } from "@/schemas/review";

export const GET = guarded<"missionId">({ plan: ["read"] }, "compare revisions", async ({ actor, params, query }) => {
  const m = await getMissionRow(actor, params.missionId);
  const q = parseOr400(compareQuerySchema, { from: query.from, to: query.to }, "comparison");
  return json(await compareMissionRevisions(m.id, q.from, q.to));
});
