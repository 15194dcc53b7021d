import { getMissionRow, guarded, json } from "@/server/core";
import { CAN, listRevisions } from "@/server/workspace";

export const GET = guarded(CAN.read, { what: "read revisions", params: ["missionId"] }, async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  return json({ revisions: await listRevisions(m.id) });
});
