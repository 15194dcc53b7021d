import { getMissionRow, guarded, json } from "@/server/core";
import { CAN, listActivity } from "@/server/workspace";

export const GET = guarded(
  CAN.audit,
  { what: "read the activity log", params: ["missionId"] },
  async ({ actor, params }) => {
    const m = await getMissionRow(actor, params.missionId);
    return json({ activity: await listActivity(m.id) });
  },
);
