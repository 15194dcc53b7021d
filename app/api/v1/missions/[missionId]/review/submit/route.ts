import { submitReviewSchema } from "@/schemas/review";
import { guarded, json } from "@/server/core";
import { submitReview } from "@/server/review";

export const POST = guarded(
  { review: ["submit"] },
  {
    what: "submit a plan for review",
    params: ["missionId"],
    body: submitReviewSchema,
    bodyLimit: 20_000,
    input: "submission",
  },
  async ({ actor, params, body }) => json(await submitReview(actor, params.missionId, body)),
);
