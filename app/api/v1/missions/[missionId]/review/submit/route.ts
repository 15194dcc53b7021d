import { guarded, json, readJsonBody } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";
import { submitReview } from "@/server/review";
import { submitReviewSchema } from "@/schemas/review";

export const POST = guarded<"missionId">(
  { review: ["submit"] },
  "submit a plan for review",
  async ({ request, actor, params }) => {
    const body = parseOr400(submitReviewSchema, await readJsonBody(request, 20_000), "submission");
    return json(await submitReview(actor, params.missionId, body));
  },
);
