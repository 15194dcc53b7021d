import { findingsQuerySchema } from "@/schemas/workspace";
import { getMissionRow, guarded, json } from "@/server/core";
import { CAN, listFindings } from "@/server/workspace";

export const GET = guarded(
  CAN.read,
  { what: "read findings", params: ["missionId"], query: findingsQuerySchema, input: "findings filter" },
  async ({ actor, params, query }) => {
    const m = await getMissionRow(actor, params.missionId);
    return json(await listFindings(m.id, query));
  },
);
