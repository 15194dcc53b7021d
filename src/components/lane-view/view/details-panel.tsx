import { explainCode, type LaneItem } from "@/lib/lanes";
import type { ResultDocument } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";
import { SEVERITY_COLOUR } from "../vocabulary";
import { EnvelopeFigures } from "./envelope-figures";

/** The selected item's facts, what its codes mean, and the live findings that concern it. */
export function DetailsPanel({
  item,
  plan,
  result,
  onZoom,
}: {
  item: LaneItem | null;
  /** The live plan, for the nominal mode response (absent: the envelope table is left out). */
  plan?: Plan;
  result: ResultDocument;
  onZoom: (i: LaneItem) => void;
}) {
  if (!item)
    return (
      <section className="rounded border border-ink-faint p-3 text-sm text-ink-soft" aria-label="Details">
        Click an item (or tab to it and press Enter) to see its numbers and the findings that concern it.
      </section>
    );
  const related = result.findings.filter((f) => {
    if (item.channel) return f.channel === item.channel && (item.kind !== "image-band" || f.code === "image-response");
    if (item.kind === "lo" || item.kind === "blocked" || item.kind === "feasible")
      return f.chain === item.chain && (f.channel === null || (item.kind === "lo" && item.codes.includes(f.code)));
    if (item.kind === "spur") return f.chain === item.chain && f.code === "spur-in-slot";
    return false;
  });
  return (
    <section className="rounded border border-ink-faint p-3 text-sm" aria-label="Details" data-testid="details-panel">
      <div className="flex items-start justify-between gap-2">
        <h2 className="font-semibold">{item.label}</h2>
        <button
          type="button"
          className="rounded border border-ink-faint px-2 py-0.5 text-xs"
          onClick={() => onZoom(item)}
        >
          Zoom to it
        </button>
      </div>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-xs">
        {item.facts.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-ink-soft">{k}</dt>
            <dd className="tabular-nums">{v}</dd>
          </div>
        ))}
      </dl>
      {item.channel && plan ? <EnvelopeFigures channelId={item.channel} plan={plan} result={result} /> : null}
      {item.codes.filter((c) => c !== "wanted").length ? (
        <ul className="mt-2 space-y-1 text-xs">
          {item.codes
            .filter((c) => c !== "wanted")
            .map((c) => (
              <li key={c}>
                <code className="font-semibold">{c}</code>: {explainCode(c)}
              </li>
            ))}
        </ul>
      ) : null}
      {related.length ? (
        <ul className="mt-2 space-y-1 border-t border-ink-faint pt-2 text-xs" data-testid="details-findings">
          {related.slice(0, 30).map((f, i) => (
            <li key={i}>
              <span className="font-semibold" style={{ color: SEVERITY_COLOUR[f.severity] }}>
                {f.severity} {f.code}
              </span>{" "}
              {f.message}
            </li>
          ))}
          {related.length > 30 ? <li>… and {related.length - 30} more</li> : null}
        </ul>
      ) : null}
    </section>
  );
}
