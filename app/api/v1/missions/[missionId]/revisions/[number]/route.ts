import { CAN, getMissionRow, getRevision, guarded, json } from "@/server/workspace";
import { notFound } from "@/server/http";

export const GET = guarded<"missionId" | "number">(CAN.read, "read revisions", async ({ actor, params }) => {
  const m = await getMissionRow(actor, params.missionId);
  if (!/^[1-9]\d{0,8}$/.test(params.number)) throw notFound("revision");
  return json(await getRevision(m.id, Number(params.number)));
});
