import { type SplitProblem, splitMargin } from "./internals/split-margin";

export type { SplitProblem, SplitDwell, SplitChannel } from "./internals/split-margin";

/** The best split of a schedule's cycle among its dwells (docs/plan-format.md §13.6). */
export interface BestSplit {
  method: "closed-form" | "search";
  /** The dwells in schedule order (ms), exact: together they fill the cycle. */
  dwellsMs: number[];
  /** The common margin at `dwellsMs`. */
  commonMargin: number;
}

/** Bisection steps of the search (the margin's bracket shrinks 2^-200 times: to the last bit of a double). */
const SEARCH_STEPS = 200;
/** How many times the search may double its bracket below the largest possible margin. */
const BRACKET_DOUBLINGS = 64;

/**
 * The dwell lengths that meet every channel's required NEΔT with the
 * largest common margin `min(1 − NEΔT/required)` (docs/plan-format.md
 * §13.6): the cycle less the switches and the fixed dwells (the time `A`
 * there is to share) is split among the dwells with channels. With no gain
 * drift anywhere (every `floor` 0), NEΔT ∝ 1/√duty gives the closed form
 * `fⱼ ∝ cⱼ`, `cⱼ = maxₖ noiseₖ/(τₖ·requiredₖ²)`; otherwise the margin m is
 * found by bisection: dwell j needs the fraction `maxₖ C·noiseₖ /
 * (τₖ·A·(requiredₖ²(1−m)² − floorₖ))` of A, which grows with m, and the
 * largest m whose needs sum to at most 1 is kept. Null when no dwell has a
 * channel with a requirement, or nothing is left to share.
 */
export function bestSplit(p: SplitProblem): BestSplit | null {
  const C = p.cycleMs;
  let available = C;
  const shared: number[] = [];
  p.dwells.forEach((d, j) => {
    if (d.fixedMs !== null) available -= d.fixedMs;
    else {
      available -= d.switchMs;
      shared.push(j);
    }
  });
  if (shared.length === 0 || !(available > 0)) return null;
  const A = available;
  const closed = p.dwells.every((d) => d.channels.every((c) => c.model.floorK2 === 0));
  let fractions: number[];
  if (closed) {
    const c = shared.map((j) => need(p, j, C, A, 0));
    const sum = c.reduce((a, b) => a + b, 0);
    fractions = c.map((x) => (sum > 0 ? x / sum : 1 / c.length));
  } else {
    let mMax = Infinity;
    for (const d of p.dwells)
      for (const ch of d.channels) mMax = Math.min(mMax, 1 - Math.sqrt(ch.model.floorK2) / ch.requiredNedtK);
    const total = (m: number) => shared.reduce((s, j) => s + need(p, j, C, A, m), 0);
    let lo = mMax - 1;
    for (let i = 0; i < BRACKET_DOUBLINGS && !(total(lo) <= 1); i++) lo = mMax - 2 ** (i + 1);
    let hi = mMax;
    for (let i = 0; i < SEARCH_STEPS && hi - lo > 0; i++) {
      const mid = lo + (hi - lo) / 2;
      if (mid === lo || mid === hi) break;
      if (total(mid) <= 1) lo = mid;
      else hi = mid;
    }
    const needs = shared.map((j) => need(p, j, C, A, lo));
    const sum = needs.reduce((a, b) => a + b, 0);
    fractions = needs.map((x) => (sum > 0 && Number.isFinite(sum) ? x / sum : 1 / needs.length));
  }
  const dwellsMs = p.dwells.map((d) => d.fixedMs ?? d.switchMs);
  shared.forEach((j, i) => (dwellsMs[j] = (dwellsMs[j] as number) + (fractions[i] as number) * A));
  return { method: closed ? "closed-form" : "search", dwellsMs, commonMargin: splitMargin(p, dwellsMs) };
}

/** The fraction of `A` dwell j needs for every channel of its chain to have margin m (Infinity when none can). */
function need(p: SplitProblem, j: number, C: number, A: number, m: number): number {
  let f = 0;
  for (const ch of p.dwells[j]?.channels ?? []) {
    const t = ch.requiredNedtK * (1 - m);
    const room = t * t - ch.model.floorK2;
    if (!(room > 0) || !(1 - m > 0)) return Infinity;
    f = Math.max(f, (C * ch.model.noiseK2s) / ((ch.integrationMs / 1000) * A * room));
  }
  return f;
}
