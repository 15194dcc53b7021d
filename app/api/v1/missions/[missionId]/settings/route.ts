import { CAN, getMissionRow, getSettings, guarded, json, readJsonBody, updateSettings } from "@/server/workspace";

type P = "missionId";

export const GET = guarded<P>(CAN.read, "read settings", async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  return json(await getSettings(m.id));
});

export const PUT = guarded<P>(CAN.edit, "change settings", async ({ request, actor, params }) =>
  json(await updateSettings(actor, params.missionId, await readJsonBody(request))),
);
