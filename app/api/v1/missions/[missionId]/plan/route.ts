import { guarded, json, readJsonBody } from "@/server/core";
import { CAN, exportPlanDocument, importPlanDocument } from "@/server/workspace";

const params = ["missionId"] as const;

export const GET = guarded(CAN.export, { what: "export the plan", params }, async ({ actor, params }) =>
  json(await exportPlanDocument(actor, params.missionId)),
);

/** Imports a plan document; it is validated by `parsePlan` (400 `invalid-plan` with every issue), not by a zod body schema. */
export const POST = guarded(CAN.import, { what: "import plans", params }, async ({ request, actor, params }) =>
  json(await importPlanDocument(actor, params.missionId, await readJsonBody(request, 5_000_000)), 201),
);
