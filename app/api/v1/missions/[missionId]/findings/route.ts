import { findingsQuerySchema } from "@/schemas/workspace";
import { CAN, getMissionRow, guarded, json, listFindings } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";

export const GET = guarded<"missionId">(CAN.read, "read findings", async ({ actor, params, query }) => {
  const filter = parseOr400(findingsQuerySchema, query, "findings filter");
  const m = await getMissionRow(actor, params.missionId);
  return json(await listFindings(m.id, filter));
});
