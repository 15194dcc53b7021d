import { SEVERITIES } from "@/lib/plan";
import type { LaneFindingInput, Severity } from "../types";

/** Higher is worse: the engine's `SEVERITIES` are listed worst first. */
const rank = Object.fromEntries(SEVERITIES.map((s, i) => [s, SEVERITIES.length - i])) as Readonly<
  Record<Severity, number>
>;

/** The worst severity of a list of findings, null for none. */
export function worstSeverity(findings: readonly Pick<LaneFindingInput, "severity">[]): Severity | null {
  let best: Severity | null = null;
  for (const f of findings) if (best === null || rank[f.severity] > rank[best]) best = f.severity;
  return best;
}

/** Unique codes in first-seen order. */
export function uniqueCodes(findings: readonly Pick<LaneFindingInput, "code">[]): string[] {
  const out: string[] = [];
  for (const f of findings) if (!out.includes(f.code)) out.push(f.code);
  return out;
}
