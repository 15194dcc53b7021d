import type { ResultDocument } from "@/lib/plan";
import { errorCountText, WaivedMark, waivedErrorCount, waiverOf, type WaiverMap } from "@/components/waivers";
import { SEVERITY_COLOUR } from "../vocabulary";

/** The live re-check's errors and warnings (info findings are counted only). */
export function FindingsPanel({ result, waivers }: { result: ResultDocument; waivers?: WaiverMap }) {
  const important = result.findings.filter((f) => f.severity !== "info");
  const errors = important.filter((f) => f.severity === "error").length;
  const waived = waivedErrorCount(important, waivers);
  const infoCount = result.findings.length - important.length;
  return (
    <section className="rounded border border-ink-faint p-3 text-sm" aria-label="Findings" data-testid="findings-panel">
      <h2 className="mb-1 font-semibold">
        Findings (live){errors ? <span className="font-normal"> · {errorCountText(errors, waived)}</span> : null}
      </h2>
      <ul className="max-h-64 space-y-1 overflow-auto text-xs">
        {important.slice(0, 80).map((f, i) => (
          <li
            key={`${f.chain}-${f.channel}-${f.code}-${i}`}
            data-code={f.code}
            data-waived={waiverOf(f, waivers) ? "true" : undefined}
          >
            <span className="font-semibold" style={{ color: SEVERITY_COLOUR[f.severity] }}>
              {f.code}
            </span>{" "}
            <span className="text-ink-soft">
              {f.chain}
              {f.channel ? ` · ${f.channel}` : ""}
            </span>{" "}
            {waiverOf(f, waivers) ? <WaivedMark waiver={waiverOf(f, waivers)!} /> : null} — {f.message}
          </li>
        ))}
        {important.length > 80 ? <li>… and {important.length - 80} more errors and warnings</li> : null}
        {important.length === 0 ? <li>No errors or warnings.</li> : null}
      </ul>
      {infoCount ? (
        <p className="mt-1 text-xs text-ink-soft">
          {infoCount} info findings (spurs of order ≤ 3, protected bands) are listed in the table view and the details.
        </p>
      ) : null}
    </section>
  );
}
