import { updateWaiverSchema } from "@/schemas/review";
import { guarded, json } from "@/server/core";
import { updateWaiver, withdrawWaiver } from "@/server/review";

const params = ["missionId", "waiverId"] as const;

export const PATCH = guarded(
  { review: ["waive"] },
  { what: "change a waiver", params, body: updateWaiverSchema, bodyLimit: 20_000, input: "waiver" },
  async ({ actor, params, body }) => json(await updateWaiver(actor, params.missionId, params.waiverId, body)),
);

/** Withdraws the waiver (kept in the record with who and when). */
export const DELETE = guarded({ review: ["waive"] }, { what: "withdraw a waiver", params }, async ({ actor, params }) =>
  json(await withdrawWaiver(actor, params.missionId, params.waiverId)),
);
