import { TOL } from "./tolerance";

/** A closed interval `[lo, hi]` (docs/plan-format.md §1.3: intervals are closed). */
export type Interval = readonly [number, number];

export function interval(lo: number, hi: number): Interval {
  return lo <= hi ? [lo, hi] : [hi, lo];
}

/**
 * The gap between two intervals, `max(a.lo, b.lo) − min(a.hi, b.hi)`;
 * negative when they overlap (docs/plan-format.md §1.3 "Intervals, gap and guard").
 */
export function gap(a: Interval, b: Interval): number {
  return Math.max(a[0], b[0]) - Math.min(a[1], b[1]);
}

/** "Within guard" (gap < guard), with the 1e-9 allowance in favour of passing. */
export function withinGuard(a: Interval, b: Interval, guard: number): boolean {
  return gap(a, b) < guard - TOL;
}

/** `inner ⊂ outer`, with the 1e-9 allowance in favour of passing. */
export function insideOf(inner: Interval, outer: Interval): boolean {
  return inner[0] >= outer[0] - TOL && inner[1] <= outer[1] + TOL;
}

/** `x` strictly inside `[lo, hi]` (no allowance: an edge is not inside). */
export function strictlyInside(x: number, iv: Interval): boolean {
  return x > iv[0] && x < iv[1];
}

/** Smallest interval holding every given interval. */
export function hull(list: readonly Interval[]): Interval {
  let lo = Infinity;
  let hi = -Infinity;
  for (const iv of list) {
    if (iv[0] < lo) lo = iv[0];
    if (iv[1] > hi) hi = iv[1];
  }
  return [lo, hi];
}

/** Widen by `w` on each side. */
export function widen(iv: Interval, w: number): Interval {
  return [iv[0] - w, iv[1] + w];
}

/** `k·[l, h]` for k ≥ 0. */
export function scale(iv: Interval, k: number): Interval {
  return k >= 0 ? [k * iv[0], k * iv[1]] : [k * iv[1], k * iv[0]];
}

/** `a·[l,h] + b·[l',h'] = [a·l + b·l', a·h + b·h']` for a, b ≥ 0. */
export function addScaled(a: number, x: Interval, b: number, y: Interval): Interval {
  return [a * x[0] + b * y[0], a * x[1] + b * y[1]];
}

/** `a·[l,h] − b·[l',h'] = [a·l − b·h', a·h − b·l']` for a, b ≥ 0. */
export function subScaled(a: number, x: Interval, b: number, y: Interval): Interval {
  return [a * x[0] - b * y[1], a * x[1] - b * y[0]];
}

/** `|[lo, hi]|`: an interval straddling 0 becomes `[0, max(|lo|, |hi|)]`. */
export function absInterval(iv: Interval): Interval {
  if (iv[0] >= 0) return [iv[0], iv[1]];
  if (iv[1] <= 0) return [-iv[1], -iv[0]];
  return [0, Math.max(-iv[0], iv[1])];
}

/** Intersection, or null when empty (touching closed intervals intersect in a point). */
export function intersect(a: Interval, b: Interval): Interval | null {
  const lo = Math.max(a[0], b[0]);
  const hi = Math.min(a[1], b[1]);
  return lo <= hi ? [lo, hi] : null;
}

/** Sort and merge intervals that overlap or touch (docs/plan-format.md §1.3: reach intervals). */
export function mergeIntervals(list: readonly Interval[]): Interval[] {
  const sorted = [...list].sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  const out: [number, number][] = [];
  for (const iv of sorted) {
    const last = out[out.length - 1];
    if (last && iv[0] <= last[1]) {
      if (iv[1] > last[1]) last[1] = iv[1];
    } else {
      out.push([iv[0], iv[1]]);
    }
  }
  return out;
}

/** Total length of the union of intervals. */
export function unionLength(list: readonly Interval[]): number {
  let total = 0;
  for (const iv of mergeIntervals(list)) total += iv[1] - iv[0];
  return total;
}

/** Order intervals by lower edge, then upper edge. */
export function compareIntervals(a: Interval, b: Interval): number {
  return a[0] - b[0] || a[1] - b[1];
}

/** How far outside `outer` the interval `inner` reaches (≥ 0). */
export function outsideBy(inner: Interval, outer: Interval): number {
  return Math.max(0, outer[0] - inner[0], inner[1] - outer[1]);
}
