import { guarded, json, readJsonBody } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";
import { updateWaiver, withdrawWaiver } from "@/server/review";
import { updateWaiverSchema } from "@/schemas/review";

export const PATCH = guarded<"missionId" | "waiverId">(
  { review: ["waive"] },
  "change a waiver",
  async ({ request, actor, params }) => {
    const body = parseOr400(updateWaiverSchema, await readJsonBody(request, 20_000), "waiver");
    return json(await updateWaiver(actor, params.missionId, params.waiverId, body));
  },
);

/** Withdraws the waiver (kept in the record with who and when). */
export const DELETE = guarded<"missionId" | "waiverId">(
  { review: ["waive"] },
  "withdraw a waiver",
  async ({ actor, params }) => {
    return json(await withdrawWaiver(actor, params.missionId, params.waiverId));
  },
);
