import type { Plan } from "@/schemas/plan";
import { checkChainAtOffset } from "./check-chain-at-offset";
import { L_DEPENDENT_ERROR_CODES, type FindingCode } from "./types";

/** One sample of the brute-force reference. */
export interface FeasibilitySample {
  L: number;
  /** The L-dependent error codes that fire at L, in rules-table order (empty: feasible). */
  codes: FindingCode[];
}

/** Reach intervals merged where they overlap or touch (docs/plan-format.md §1.3 "Intervals, gap and guard"). */
function mergedReach(plan: Plan, chainId: string): [number, number][] {
  const chain = plan.chains.find((c) => c.id === chainId);
  const laser = chain && plan.lasers.find((l) => l.id === chain.laser);
  if (!laser) throw new Error(`no chain with id "${chainId}" (or its laser)`);
  const list = laser.reach.map((r) => [r.minGHz, r.maxGHz] as [number, number]).sort((a, b) => a[0] - b[0]);
  const out: [number, number][] = [];
  for (const iv of list) {
    const last = out[out.length - 1];
    if (last && iv[0] <= last[1]) last[1] = Math.max(last[1], iv[1]);
    else out.push(iv);
  }
  return out;
}

/**
 * The deliberately simple brute-force reference for the feasibility map:
 * sample L from the low edge of every merged reach interval in steps of
 * `stepGHz` (and at its high edge), run the full per-offset check of the
 * chain at each sample, and keep the error findings whose rule depends on
 * L. Slow by design; used by the tests to check the exact map.
 */
export function sampleFeasibility(plan: Plan, chainId: string, stepGHz: number): FeasibilitySample[] {
  if (!(stepGHz > 0)) throw new Error("stepGHz must be greater than 0");
  const out: FeasibilitySample[] = [];
  for (const [r0, r1] of mergedReach(plan, chainId)) {
    // r0, r0 + step, … strictly below r1 (by more than a billionth of a step), then r1 itself
    const offsets: number[] = [];
    for (let i = 0; r0 + i * stepGHz < r1 - stepGHz * 1e-9; i++) offsets.push(r0 + i * stepGHz);
    offsets.push(r1);
    for (const L of offsets) {
      const codes = new Set<FindingCode>();
      for (const f of checkChainAtOffset(plan, chainId, L)) {
        if (f.severity === "error" && L_DEPENDENT_ERROR_CODES.includes(f.code)) codes.add(f.code);
      }
      out.push({ L, codes: L_DEPENDENT_ERROR_CODES.filter((c) => codes.has(c)) });
    }
  }
  return out;
}
