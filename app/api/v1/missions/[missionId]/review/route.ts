import { getMissionRow, guarded, json } from "@/server/core";
import { getReviewOverview } from "@/server/review";

export const GET = guarded(
  { review: ["read"] },
  { what: "read reviews", params: ["missionId"] },
  async ({ actor, params }) => {
    const m = await getMissionRow(actor, params.missionId);
    return json(await getReviewOverview(m.id));
  },
);
