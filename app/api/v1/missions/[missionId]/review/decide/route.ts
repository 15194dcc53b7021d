import { decideReviewSchema } from "@/schemas/review";
import { guarded, json } from "@/server/core";
import { decideReview } from "@/server/review";

export const POST = guarded(
  { review: ["decide"] },
  { what: "decide a review", params: ["missionId"], body: decideReviewSchema, bodyLimit: 20_000, input: "decision" },
  async ({ actor, params, body }) => json(await decideReview(actor, params.missionId, body)),
);
