import { getMissionRow, guarded, json, notFound } from "@/server/core";
import { CAN, getLatestRevision } from "@/server/workspace";

export const GET = guarded(CAN.read, { what: "read results", params: ["missionId"] }, async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  const latest = await getLatestRevision(m.id);
  if (!latest) throw notFound("result");
  return json(latest.result);
});
