import { guarded } from "@/server/workspace";
import { parseOr400 } from "@/server/workspace/errors";
import { listAudit } from "@/server/review";
import { auditCsv } from "@/lib/review";
import { auditQuerySchema } from "@/schemas/review";

/** The team's audit trail as CSV, with the same filters as the audit page. */
export const GET = guarded({ audit: ["export"] }, "export the audit trail", async ({ actor, query }) => {
  const q = parseOr400(
    auditQuerySchema,
    Object.fromEntries(Object.entries(query).filter(([, v]) => v !== "")),
    "audit filter",
  );
  const rows = await listAudit(actor, q, 100_000);
  const day = new Date().toISOString().slice(0, 10);
  return new Response(auditCsv(rows), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="heterolane-audit-${day}.csv"`,
      "cache-control": "no-store",
    },
  });
});
