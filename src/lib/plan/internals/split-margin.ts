import { type NedtModel, nedtWith } from "./nedt-model";

/**
 * What the best split of a schedule (docs/plan-format.md §13.6) works
 * with: the cycle, and per dwell in schedule order the switch into it and
 * the channels of its chain that have a required NEΔT, each with its own
 * integration time and its NEΔT model at its worst point. A dwell whose
 * chain has no such channel keeps its length (`fixedMs`).
 */
export interface SplitProblem {
  cycleMs: number;
  dwells: SplitDwell[];
}

export interface SplitDwell {
  switchMs: number;
  /** The dwell's length when the split leaves it as it is (its chain has no channel with a requirement), else null. */
  fixedMs: number | null;
  channels: SplitChannel[];
}

export interface SplitChannel {
  requiredNedtK: number;
  integrationMs: number;
  model: NedtModel;
}

/**
 * The worst NEΔT of each channel (in dwell order, then channel order) when
 * the dwells are `dwellsMs`: the duty of a dwell is its usable time over
 * the cycle (the larger of `cycleMs` and the sum of the dwells).
 */
export function splitNedts(p: SplitProblem, dwellsMs: readonly number[]): number[] {
  let busy = 0;
  for (const d of dwellsMs) busy += d;
  const cycle = Math.max(p.cycleMs, busy);
  const out: number[] = [];
  p.dwells.forEach((d, j) => {
    const usable = Math.max(0, (dwellsMs[j] as number) - d.switchMs);
    const duty = usable === cycle ? 1 : usable / cycle;
    for (const c of d.channels) out.push(duty > 0 ? nedtWith(c.model, c.integrationMs * duty) : Infinity);
  });
  return out;
}

/** The common margin of a split: the smallest `1 − NEΔT/required` over the channels (1 when there are none). */
export function splitMargin(p: SplitProblem, dwellsMs: readonly number[]): number {
  const nedts = splitNedts(p, dwellsMs);
  let k = 0;
  let m = 1;
  for (const d of p.dwells)
    for (const c of d.channels) {
      m = Math.min(m, 1 - (nedts[k] as number) / c.requiredNedtK);
      k++;
    }
  return m;
}
