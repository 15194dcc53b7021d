import type { LaneFindingInput, Severity } from "../types";

const rank: Record<Severity, number> = { info: 1, warning: 2, error: 3 };

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
