import { getMissionRow, guarded, json } from "@/server/workspace";
import { getReviewOverview } from "@/server/review";

export const GET = guarded<"missionId">({ review: ["read"] }, "read reviews", async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  return json(await getReviewOverview(m.id));
});
