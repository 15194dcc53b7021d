/**
 * Exact piecewise-linear interval functions of the LO offset `L`, for the
 * feasibility map (docs/plan-format.md §6.2 "Exact edges": every slot
 * edge and spur edge is piecewise linear in L).
 *
 * A `Lin` is `a + b·L`. A `Piece` is an interval-valued function
 * `[lo(L), hi(L)]` that is linear on `[from, to]`; an `IFn` is a sorted list
 * of non-overlapping pieces (where there is no piece the function is
 * undefined: no slot, or a spur dropped by the detector band). Every
 * operation splits pieces exactly where a linear edge meets a limit (the
 * solution of `a + b·L = c`), so all results are exact up to rounding.
 * Nyquist folding of these functions is in `map-fold.ts`.
 */

export interface Lin {
  a: number;
  b: number;
}
export interface Piece {
  from: number;
  to: number;
  lo: Lin;
  hi: Lin;
}
export type IFn = Piece[];
/** Closed L intervals `[lo, hi]`. */
export type LSet = [number, number][];

export const lin = (a: number, b: number): Lin => ({ a, b });
export const at = (f: Lin, L: number): number => f.a + f.b * L;
export const sub = (f: Lin, g: Lin): Lin => ({ a: f.a - g.a, b: f.b - g.b });
const neg = (f: Lin): Lin => ({ a: -f.a, b: -f.b });
const shift = (f: Lin, c: number): Lin => ({ a: f.a + c, b: f.b });

/** The L in (from, to) where `f(L) = c`, or NaN. */
export function crossing(f: Lin, c: number, from: number, to: number): number {
  if (f.b === 0) return NaN;
  const L = (c - f.a) / f.b;
  return L > from && L < to ? L : NaN;
}

/** Split [from, to] at the given points (those strictly inside), in order. */
export function cutsOf(from: number, to: number, pts: number[]): number[] {
  const inside = pts.filter((p) => p > from && p < to);
  inside.sort((p, q) => p - q);
  return [from, ...inside, to];
}

/** Widen every piece by `w` on each side. */
export function widen(fn: IFn, w: number): IFn {
  return fn.map((p) => ({ from: p.from, to: p.to, lo: shift(p.lo, -w), hi: shift(p.hi, w) }));
}

/**
 * `|[lo, hi]|` (an interval straddling 0 becomes `[0, max(|lo|, |hi|)]`),
 * split where an edge crosses 0 and where `−lo = hi`.
 */
export function absFn(fn: IFn): IFn {
  const out: IFn = [];
  for (const p of fn) {
    const cuts = cutsOf(p.from, p.to, [
      crossing(p.lo, 0, p.from, p.to),
      crossing(p.hi, 0, p.from, p.to),
      crossing({ a: p.lo.a + p.hi.a, b: p.lo.b + p.hi.b }, 0, p.from, p.to),
    ]);
    for (let i = 0; i + 1 < cuts.length; i++) {
      const from = cuts[i] as number;
      const to = cuts[i + 1] as number;
      if (!(to > from)) continue;
      const mid = (from + to) / 2;
      const l = at(p.lo, mid);
      const h = at(p.hi, mid);
      if (l >= 0) out.push({ from, to, lo: p.lo, hi: p.hi });
      else if (h <= 0) out.push({ from, to, lo: neg(p.hi), hi: neg(p.lo) });
      else out.push({ from, to, lo: lin(0, 0), hi: -l > h ? neg(p.lo) : p.hi });
    }
  }
  return out;
}

/**
 * Intersection with `[min, max]`; where it is empty the piece is dropped
 * (docs/plan-format.md §5.2 "Building a spur band": a spur with an empty
 * intersection with the detector band is dropped).
 */
export function clipFn(fn: IFn, min: number, max: number): IFn {
  const out: IFn = [];
  for (const p of fn) {
    const cuts = cutsOf(p.from, p.to, [
      crossing(p.lo, min, p.from, p.to),
      crossing(p.lo, max, p.from, p.to),
      crossing(p.hi, min, p.from, p.to),
      crossing(p.hi, max, p.from, p.to),
    ]);
    for (let i = 0; i + 1 < cuts.length; i++) {
      const from = cuts[i] as number;
      const to = cuts[i + 1] as number;
      if (!(to > from)) continue;
      const mid = (from + to) / 2;
      const l = at(p.lo, mid);
      const h = at(p.hi, mid);
      if (h < min || l > max) continue;
      out.push({ from, to, lo: l < min ? lin(min, 0) : p.lo, hi: h > max ? lin(max, 0) : p.hi });
    }
  }
  return out;
}

/** Append `[lo, hi]` to a sorted set, joining it with the last interval when they meet. */
export function pushInterval(out: LSet, lo: number, hi: number): void {
  if (!(hi > lo)) return;
  const last = out[out.length - 1];
  if (last && lo <= last[1]) {
    if (hi > last[1]) last[1] = hi;
  } else out.push([lo, hi]);
}

/** The rounding allowance of threshold comparisons (docs/plan-format.md §1.4 "The 1e-9 allowance"), in GHz. */
const TOL = 1e-9;

/**
 * The sub-interval of [from, to] where `f(L) < c`, as [lo, hi] (possibly
 * empty: lo ≥ hi). A sloped edge meets the limit at one exact L (the edge
 * of the set); a constant one is a tie over the whole piece when it equals
 * the limit, and the 1e-9 allowance decides it in favour of passing.
 *
 * One tie rule with the per-offset check (docs/plan-format.md §6.2): where
 * the set would run right up to the end of the piece (the margin reaches
 * its limit within 1e-9 GHz of a joint of two linear pieces, as when the
 * hull of a centred DSB channel puts a slot edge exactly on a Nyquist
 * edge), the margin only touches its limit there, and the allowance
 * decides that tie as the per-offset check does: the set ends where the
 * margin is the allowance short of its limit, leaving the same hole of
 * 2·1e-9/|slope| GHz around the joint.
 */
export function below(f: Lin, c: number, from: number, to: number): [number, number] {
  if (f.b === 0) return f.a < c - TOL ? [from, to] : [to, from];
  let L = (c - f.a) / f.b;
  if (Math.abs(L - (f.b > 0 ? to : from)) <= TOL) L = (c - TOL - f.a) / f.b;
  return f.b > 0 ? [from, Math.min(to, L)] : [Math.max(from, L), to];
}
/** The sub-interval of [from, to] where `f(L) > c`. */
export function above(f: Lin, c: number, from: number, to: number): [number, number] {
  return below(neg(f), -c, from, to);
}

/**
 * Where two interval functions are both defined and within guard: the gap
 * `max(A.lo, B.lo) − min(A.hi, B.hi)` is the largest of the four linear
 * terms `A.lo − B.hi`, `B.lo − A.hi`, `A.lo − A.hi`, `B.lo − B.hi`, so
 * `gap < g` holds where all four are below g (the last two are minus a
 * width: they matter for a point-like spur band against a zero guard).
 * `accept` filters piece pairs (used for "different Nyquist zones").
 * Result unsorted.
 */
export function withinGuardSet<P extends Piece>(
  A: readonly P[],
  B: readonly P[],
  g: number,
  out: LSet,
  accept?: (p: P, q: P) => boolean,
): void {
  let i = 0;
  let j = 0;
  while (i < A.length && j < B.length) {
    const p = A[i] as P;
    const q = B[j] as P;
    const from = Math.max(p.from, q.from);
    const to = Math.min(p.to, q.to);
    if (to > from && (!accept || accept(p, q))) {
      const s1 = below(sub(p.lo, q.hi), g, from, to);
      const s2 = below(sub(q.lo, p.hi), g, from, to);
      const s3 = below(sub(p.lo, p.hi), g, from, to);
      const s4 = below(sub(q.lo, q.hi), g, from, to);
      const lo = Math.max(s1[0], s2[0], s3[0], s4[0]);
      const hi = Math.min(s1[1], s2[1], s3[1], s4[1]);
      if (hi > lo) out.push([lo, hi]);
    }
    if (p.to <= q.to) i++;
    else j++;
  }
}

/** Where the function is defined and `[lo, hi]` is not inside `[min, max]`. */
export function outsideSet(fn: IFn, min: number, max: number, out: LSet): void {
  for (const p of fn) {
    const s1 = below(p.lo, min, p.from, p.to);
    if (s1[1] > s1[0]) out.push(s1);
    const s2 = above(p.hi, max, p.from, p.to);
    if (s2[1] > s2[0]) out.push(s2);
  }
}
