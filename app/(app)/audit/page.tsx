import type { Metadata } from "next";
import { roleCan } from "@/lib/permissions";
import { auditQuerySchema } from "@/schemas/review";
import { requirePageActor } from "@/server/auth/page-guard";
import { auditFacets, listAudit } from "@/server/review";

export const metadata: Metadata = { title: "Audit trail" };

type SP = Record<string, string | string[] | undefined>;

/** Who did what and when in the team, filterable by mission, person, action and date; exportable as CSV. */
export default async function AuditPage({ searchParams }: { searchParams: Promise<SP> }) {
  const actor = await requirePageActor("/audit");
  const raw = await searchParams;
  const given = Object.fromEntries(
    Object.entries(raw).flatMap(([k, v]) =>
      typeof v === "string" && v !== "" && ["mission", "person", "action", "from", "to"].includes(k) ? [[k, v]] : [],
    ),
  );
  if (!roleCan(actor.role, { audit: ["read"] }))
    return (
      <main className="mx-auto max-w-7xl px-6 py-6">
        <p role="alert">Your role in this team does not allow you to read the audit trail.</p>
      </main>
    );
  const parsed = auditQuerySchema.safeParse(given);
  const filter = parsed.success ? parsed.data : {};
  const [rows, facets] = await Promise.all([listAudit(actor, filter, 1000), auditFacets(actor)]);
  const qs = new URLSearchParams(parsed.success ? (given as Record<string, string>) : {}).toString();
  const canExport = roleCan(actor.role, { audit: ["export"] });
  const sel = "rounded border border-slate-400 px-2 py-1";
  return (
    <main className="mx-auto max-w-7xl px-6 py-6">
      <h1 className="text-2xl font-semibold text-slate-900">Audit trail</h1>
      <form method="get" className="mt-3 flex flex-wrap items-end gap-3 text-sm" aria-label="Filter the audit trail">
        <label className="flex flex-col">
          <span className="font-medium">Mission</span>
          <select name="mission" defaultValue={given.mission ?? ""} className={sel}>
            <option value="">all missions</option>
            {facets.missions.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col">
          <span className="font-medium">Person</span>
          <select name="person" defaultValue={given.person ?? ""} className={sel}>
            <option value="">everyone</option>
            {facets.people.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col">
          <span className="font-medium">Action</span>
          <select name="action" defaultValue={given.action ?? ""} className={sel}>
            <option value="">all actions</option>
            {facets.actions.map((a) => (
              <option key={a} value={a}>
                {a}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col">
          <span className="font-medium">From (UTC)</span>
          <input type="date" name="from" defaultValue={given.from ?? ""} className={sel} />
        </label>
        <label className="flex flex-col">
          <span className="font-medium">To (UTC)</span>
          <input type="date" name="to" defaultValue={given.to ?? ""} className={sel} />
        </label>
        <button type="submit" className="rounded bg-slate-900 px-3 py-1.5 font-medium text-white">
          Filter
        </button>
        {canExport ? (
          <a
            href={`/api/v1/audit.csv${qs ? `?${qs}` : ""}`}
            className="rounded border border-slate-700 px-3 py-1.5 font-medium"
          >
            Download CSV
          </a>
        ) : null}
      </form>
      {!parsed.success ? (
        <div role="alert" className="mt-3 rounded border border-rose-300 bg-rose-50 px-3 py-2 text-sm text-rose-900">
          The filter is not valid:{" "}
          {parsed.error.issues.map((i) => `${i.path.join(".") || "filter"} ${i.message}`).join("; ")}. Showing
          everything instead.
        </div>
      ) : null}
      <p className="mt-3 text-sm text-slate-700">
        {rows.length} entr{rows.length === 1 ? "y" : "ies"}
        {rows.length === 1000 ? " (the newest 1000; narrow the filter or download the CSV for all)" : ""}
      </p>
      <table className="mt-2 w-full border-collapse text-left text-sm" data-testid="audit-table">
        <thead>
          <tr className="border-b border-slate-400">
            <th className="py-1 pr-3 font-medium">When (UTC)</th>
            <th className="py-1 pr-3 font-medium">Who</th>
            <th className="py-1 pr-3 font-medium">Mission</th>
            <th className="py-1 pr-3 font-medium">Action</th>
            <th className="py-1 pr-3 font-medium">What</th>
            <th className="py-1 font-medium">Revision</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className="border-b border-slate-200 align-top">
              <td className="py-1 pr-3 whitespace-nowrap">{r.at.toISOString().slice(0, 19).replace("T", " ")}</td>
              <td className="py-1 pr-3">{r.actorName}</td>
              <td className="py-1 pr-3">{r.missionName ?? "–"}</td>
              <td className="py-1 pr-3 font-mono text-xs">{r.action}</td>
              <td className="py-1 pr-3">{r.summary}</td>
              <td className="py-1 whitespace-nowrap">
                {r.revisionBefore === r.revisionAfter
                  ? (r.revisionAfter ?? "–")
                  : `${r.revisionBefore ?? "–"} → ${r.revisionAfter ?? "–"}`}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </main>
  );
}
