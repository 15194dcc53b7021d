import type { Finding } from "@/queries/types";
import { groupFindings } from "../findings";
import { SeverityBadge } from "../ui";
import { Section } from "./section";

/** The report's findings, by chain and then channel, in the engine's order. */
export function FindingsSection({ findings }: { findings: Finding[] }) {
  return (
    <Section title={`Findings (${findings.length})`}>
      {findings.length === 0 ? <p>Every rule passes.</p> : null}
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
                <span>{f.message}</span>
              </li>
            ))}
          </ul>
        </div>
      ))}
    </Section>
  );
}
