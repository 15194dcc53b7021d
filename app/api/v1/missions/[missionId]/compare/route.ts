import { compareQuerySchema } from "@/schemas/review";
import { getMissionRow, guarded, json } from "@/server/core";
import { compareMissionRevisions } from "@/server/review";

export const GET = guarded(
  { plan: ["read"] },
  { what: "compare revisions", params: ["missionId"], query: compareQuerySchema, input: "comparison" },
  async ({ actor, params, query }) => {
    const m = await getMissionRow(actor, params.missionId);
    return json(await compareMissionRevisions(m.id, query.from, query.to));
  },
);
