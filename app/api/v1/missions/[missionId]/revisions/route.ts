import { CAN, getMissionRow, guarded, json, listRevisions } from "@/server/workspace";

export const GET = guarded<"missionId">(CAN.read, "read revisions", async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  return json({ revisions: await listRevisions(m.id) });
});
