import { getMissionRow, guarded, json, notFound } from "@/server/core";
import { CAN, getRevision } from "@/server/workspace";

export const GET = guarded(
  CAN.read,
  { what: "read revisions", params: ["missionId", "number"] },
  async ({ actor, params }) => {
    const m = await getMissionRow(actor, params.missionId);
    // A path segment that cannot be a revision number names no revision: 404, like a missing one.
    if (!/^[1-9]\d{0,8}$/.test(params.number)) throw notFound("revision");
    return json(await getRevision(m.id, Number(params.number)));
  },
);
