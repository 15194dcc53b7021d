import { CAN, getLatestRevision, getMissionRow, guarded, json } from "@/server/workspace";
import { notFound } from "@/server/http";

export const GET = guarded<"missionId">(CAN.read, "read results", async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  const latest = await getLatestRevision(m.id);
  if (!latest) throw notFound("result");
  return json(latest.result);
});
