import { planImportQuerySchema } from "@/schemas/workspace";
import { guarded, json, readJsonBody } from "@/server/core";
import { CAN, exportPlanDocument, importPlanDocument } from "@/server/workspace";

const params = ["missionId"] as const;

/** The draft plan document; `x-heterolane-revision` names the revision it is, to send back with an import. */
export const GET = guarded(CAN.export, { what: "export the plan", params }, async ({ actor, params }) => {
  const { plan, revision } = await exportPlanDocument(actor, params.missionId);
  return json(plan, 200, { "x-heterolane-revision": String(revision) });
});

/**
 * Imports a plan document; it is validated by `parsePlan` (400 `invalid-plan` with every issue), not by a zod body schema.
 * `?baseRevision=N`: only when the latest revision is still N (409 `stale-version` otherwise).
 */
export const POST = guarded(
  CAN.import,
  { what: "import plans", params, query: planImportQuerySchema, input: "query" },
  async ({ request, actor, params, query }) =>
    json(
      await importPlanDocument(actor, params.missionId, await readJsonBody(request, 5_000_000), {
        baseRevision: query.baseRevision,
      }),
      201,
    ),
);
