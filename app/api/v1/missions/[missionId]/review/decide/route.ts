import { guarded, json, readJsonBody } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";
import { decideReview } from "@/server/review";
import { decideReviewSchema } from "@/schemas/review";

export const POST = guarded<"missionId">(
  { review: ["decide"] },
  "decide a review",
  async ({ request, actor, params }) => {
    const body = parseOr400(decideReviewSchema, await readJsonBody(request, 20_000), "decision");
    return json(await decideReview(actor, params.missionId, body));
  },
);
