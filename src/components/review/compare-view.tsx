import type { FieldChange, Json, PlanSection } from "@/lib/review";
import type { compareMissionRevisions } from "@/server/review";

/** The comparison as the server builds it (src/server/review compareMissionRevisions). */
export type CompareViewProps = Awaited<ReturnType<typeof compareMissionRevisions>>;
type FindingView = CompareViewProps["findings"]["new"][number];

const SECTION: Record<PlanSection, string> = {
  plan: "Plan",
  settings: "Settings",
  lasers: "Laser pair",
  resonators: "Resonator",
  detectors: "Detector",
  chains: "Receiver chain",
  channels: "Channel",
};

const show = (v: Json | undefined) =>
  v === undefined ? "—" : v === null ? "none" : typeof v === "string" ? v : JSON.stringify(v);

function FieldRow({ f }: { f: FieldChange }) {
  return (
    <tr className="border-b border-slate-200 align-top">
      <td className="py-1 pr-3 font-mono text-xs">{f.path}</td>
      <td className={`py-1 pr-3 ${f.before === undefined ? "text-slate-400" : "bg-rose-50"}`}>{show(f.before)}</td>
      <td className={`py-1 ${f.after === undefined ? "text-slate-400" : "bg-emerald-50"}`}>{show(f.after)}</td>
    </tr>
  );
}

function FindingItem({ f }: { f: FindingView }) {
  return (
    <li className="py-1 text-sm">
      <span className="font-semibold">{f.severity}</span> <code>{f.code}</code> · chain {f.chain}
      {f.channel ? ` · channel ${f.channel}` : ""}
      <div className="text-slate-700">{f.message}</div>
    </li>
  );
}

/** Side-by-side differences of two revisions: plan fields (before | after) and findings (resolved | new). */
export function CompareView({ from, to, entities, findings }: CompareViewProps) {
  return (
    <div data-testid="compare-view">
      <div className="grid grid-cols-2 gap-4 text-sm">
        {[from, to].map((r, i) => (
          <div key={i} className="rounded border border-slate-300 bg-white p-3">
            <div className="font-semibold">
              {i === 0 ? "Earlier" : "Later"}: revision {r.number} ({r.status})
            </div>
            <div className="text-slate-700">
              by {r.authorName}, {r.createdAt.slice(0, 16).replace("T", " ")} UTC
            </div>
          </div>
        ))}
      </div>
      <h2 className="mt-6 text-lg font-semibold">Plan differences</h2>
      {entities.length === 0 ? <p className="text-sm text-slate-700">The plan documents are the same.</p> : null}
      {entities.map((e) => (
        <section key={`${e.section}/${e.id}`} className="mt-3 rounded border border-slate-300 bg-white p-3">
          <h3 className="text-sm font-semibold">
            {SECTION[e.section] ?? e.section} {e.id} — {e.kind}
          </h3>
          <table className="mt-1 w-full table-fixed border-collapse text-left text-sm">
            <thead>
              <tr className="border-b border-slate-400">
                <th className="w-1/4 py-1 pr-3 font-medium">Field</th>
                <th className="py-1 pr-3 font-medium">Revision {from.number}</th>
                <th className="py-1 font-medium">Revision {to.number}</th>
              </tr>
            </thead>
            <tbody>
              {e.fields.map((f) => (
                <FieldRow key={f.path} f={f} />
              ))}
            </tbody>
          </table>
        </section>
      ))}
      <h2 className="mt-6 text-lg font-semibold">Findings</h2>
      <div className="grid grid-cols-2 gap-4">
        <div>
          <h3 className="text-sm font-semibold">
            Resolved (only in revision {from.number}): {findings.resolved.length}
          </h3>
          <ul>
            {findings.resolved.map((f) => (
              <FindingItem key={f.id} f={f} />
            ))}
          </ul>
        </div>
        <div>
          <h3 className="text-sm font-semibold">
            New (only in revision {to.number}): {findings.new.length}
          </h3>
          <ul>
            {findings.new.map((f) => (
              <FindingItem key={f.id} f={f} />
            ))}
          </ul>
        </div>
      </div>
      <details className="mt-3">
        <summary className="cursor-pointer text-sm font-semibold">
          Unchanged findings: {findings.unchanged.length}
        </summary>
        <ul>
          {findings.unchanged.map((p) => (
            <FindingItem key={p.after.id} f={p.after} />
          ))}
        </ul>
      </details>
    </div>
  );
}
