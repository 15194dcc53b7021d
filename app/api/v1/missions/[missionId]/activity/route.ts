import { CAN, getMissionRow, guarded, json, listActivity } from "@/server/workspace";

export const GET = guarded<"missionId">(CAN.audit, "read the activity log", async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  return json({ activity: await listActivity(m.id) });
});
