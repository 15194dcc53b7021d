import { settingsUpdateSchema } from "@/schemas/workspace";
import { getMissionRow, guarded, json } from "@/server/core";
import { CAN, getSettings, updateSettings } from "@/server/workspace";

const params = ["missionId"] as const;

export const GET = guarded(CAN.read, { what: "read settings", params }, async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  return json(await getSettings(m.id));
});

export const PUT = guarded(
  CAN.edit,
  { what: "change settings", params, body: settingsUpdateSchema, input: "settings" },
  async ({ actor, params, body }) => json(await updateSettings(actor, params.missionId, body)),
);
