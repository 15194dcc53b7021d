import type { Finding } from "@/queries/types";
import { groupFindings } from "../findings";
import { errorCountText, waivedErrorCount, waiverOf, waiverText, type WaiverMap } from "@/components/waivers";
import { noFindingsText } from "../findings-panel";
import { SeverityBadge } from "../ui";
import { Section } from "./section";

/** The report's findings, by chain and then channel, in the engine's order. */
export function FindingsSection({
  findings,
  channelCount,
  waivers,
}: {
  findings: Finding[];
  channelCount?: number;
  /** Recorded waivers by finding key: on paper a waived error says who waived it and why. */
  waivers?: WaiverMap;
}) {
  const errors = findings.filter((f) => f.severity === "error").length;
  const waived = waivedErrorCount(findings, waivers);
  return (
    <Section title={`Findings (${findings.length}${errors ? `; ${errorCountText(errors, waived)}` : ""})`}>
      {findings.length === 0 ? <p>{noFindingsText(channelCount)}</p> : null}
      {groupFindings(findings).map((g) => (
        <div key={g.chain} className="mb-2">
          <h3 className="font-semibold">Chain {g.chain}</h3>
          <ul>
            {[
              ...g.chainFindings.map((f) => ({ where: "chain", f })),
              ...g.channels.flatMap((c) => c.findings.map((f) => ({ where: c.channel, f }))),
            ].map(({ where, f }, i) => (
              <li key={i} className="flex gap-2 border-b border-ink/5 py-0.5">
                <span className="shrink-0">
                  <SeverityBadge severity={f.severity} />
                </span>
                <span className="w-16 shrink-0 font-medium">{where}</span>
                <span className="w-40 shrink-0 font-mono text-[11px]">{f.code}</span>
                <span>
                  {f.message}
                  {waiverOf(f, waivers) ? (
                    <span className="ml-1 font-semibold text-emerald-900" data-testid="report-waived">
                      {waiverText(waiverOf(f, waivers)!)}
                    </span>
                  ) : null}
                </span>
              </li>
            ))}
          </ul>
        </div>
      ))}
    </Section>
  );
}
