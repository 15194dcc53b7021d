"use client";

import { useMemo, useState } from "react";
import type { Finding, Severity } from "@/queries/types";
import { countBySeverity, groupFindings, SEVERITIES } from "./findings";
import { Empty, SeverityBadge } from "./ui";
import { errorCountText, WaivedMark, waivedErrorCount, waiverOf, type WaiverMap } from "@/components/waivers";

function FindingItem({ f, waivers }: { f: Finding; waivers?: WaiverMap }) {
  const waiver = waiverOf(f, waivers);
  return (
    <li className="flex gap-2 py-1.5" data-code={f.code} data-waived={waiver ? "true" : undefined}>
      <div className="flex shrink-0 flex-col items-start gap-1 pt-0.5">
        <SeverityBadge severity={f.severity} />
        {waiver ? <WaivedMark waiver={waiver} /> : null}
      </div>
      <div className={`min-w-0 ${waiver ? "opacity-80" : ""}`}>
        <span className="font-mono text-xs text-ink-soft">{f.code}</span>
        <p className="text-sm leading-snug">{f.message}</p>
      </div>
    </li>
  );
}

/** What an empty findings list means: a plan without channels has not been checked for anything yet. */
export function noFindingsText(channelCount: number | undefined): string {
  return channelCount === 0
    ? "No channels yet, so no rule has checked anything: add a channel (or upload a channel list) to get the first findings. A plan without channels cannot be submitted for review."
    : "No findings: every rule passes.";
}

/** Findings of the latest check, grouped by chain and channel, filterable by severity. */
export function FindingsPanel({
  findings,
  channelNames,
  focus,
  channelCount,
  waivers,
}: {
  findings: Finding[];
  channelNames: Map<string, string>;
  focus?: string | null;
  /** The plan's channels; with none, "no findings" would claim a check that never ran. */
  channelCount?: number;
  /** Recorded waivers by finding key: a waived error is marked as such. */
  waivers?: WaiverMap;
}) {
  const [shown, setShown] = useState<Record<Severity, boolean>>({ error: true, warning: true, info: false });
  const counts = countBySeverity(findings);
  const waived = waivedErrorCount(findings, waivers);
  const groups = useMemo(() => groupFindings(findings.filter((f) => shown[f.severity])), [findings, shown]);
  return (
    <div data-testid="findings-panel">
      <div className="mb-2 flex flex-wrap gap-3 text-sm" role="group" aria-label="Show severities">
        {SEVERITIES.map((s) => (
          <label key={s} className="inline-flex items-center gap-1.5">
            <input type="checkbox" checked={shown[s]} onChange={(e) => setShown({ ...shown, [s]: e.target.checked })} />
            <SeverityBadge severity={s} />
            <span className="tabular-nums">
              {s === "error" && waived > 0 ? errorCountText(counts.error, waived) : counts[s]}
            </span>
          </label>
        ))}
      </div>
      {findings.length === 0 ? <Empty>{noFindingsText(channelCount)}</Empty> : null}
      {findings.length > 0 && groups.length === 0 ? <Empty>No findings of the chosen severities.</Empty> : null}
      <div className="space-y-4">
        {groups.map((g) => (
          <section key={g.chain} aria-label={`Chain ${g.chain}`}>
            <h3 className="border-b border-ink/15 pb-1 text-sm font-semibold">Chain {g.chain}</h3>
            {g.chainFindings.length > 0 ? (
              <div className="mt-1">
                <h4 className="text-xs font-medium uppercase tracking-wide text-ink-soft">Whole chain</h4>
                <ul className="divide-y divide-ink/5">
                  {g.chainFindings.map((f, i) => (
                    <FindingItem key={`${f.code}-${i}`} f={f} waivers={waivers} />
                  ))}
                </ul>
              </div>
            ) : null}
            {g.channels.map((c) => (
              <div
                key={c.channel}
                id={`findings-${c.channel}`}
                data-findings-channel={c.channel}
                className={`mt-2 rounded ${focus === c.channel ? "bg-amber-50 ring-1 ring-sev-warning/40" : ""}`}
              >
                <h4 className="text-xs font-medium text-ink-soft">
                  <span className="uppercase tracking-wide">Channel</span>{" "}
                  <span className="font-semibold text-ink">{c.channel}</span>
                  {channelNames.get(c.channel) ? (
                    <span className="normal-case"> · {channelNames.get(c.channel)}</span>
                  ) : null}
                </h4>
                <ul className="divide-y divide-ink/5">
                  {c.findings.map((f, i) => (
                    <FindingItem key={`${f.code}-${i}`} f={f} waivers={waivers} />
                  ))}
                </ul>
              </div>
            ))}
          </section>
        ))}
      </div>
    </div>
  );
}
