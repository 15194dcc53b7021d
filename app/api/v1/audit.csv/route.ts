import { auditCsv } from "@/lib/review";
import { auditQuerySchema } from "@/schemas/review";
import { guarded } from "@/server/core";
import { listAudit } from "@/server/review";

/** The team's audit trail as CSV, with the same filters as the audit page. */
export const GET = guarded(
  { audit: ["export"] },
  { what: "export the audit trail", query: auditQuerySchema, input: "audit filter" },
  async ({ actor, query }) => {
    const rows = await listAudit(actor, query, 100_000);
    const day = new Date().toISOString().slice(0, 10);
    return new Response(auditCsv(rows), {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="heterolane-audit-${day}.csv"`,
        "cache-control": "no-store",
      },
    });
  },
);
