import { CAN, exportPlanDocument, guarded, importPlanDocument, json, readJsonBody } from "@/server/workspace";

type P = "missionId";

export const GET = guarded<P>(CAN.export, "export the plan", async ({ actor, params }) =>
  json(await exportPlanDocument(actor, params.missionId)),
);

export const POST = guarded<P>(CAN.import, "import plans", async ({ request, actor, params }) =>
  json(await importPlanDocument(actor, params.missionId, await readJsonBody(request, 5_000_000)), 201),
);
