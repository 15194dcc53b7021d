/**
 * Nyquist folding of the piecewise-linear interval functions of
 * `map-linear.ts` (docs/plan-format.md §5.4 "Folding with a sample rate"), and the L set where
 * a band straddles a zone edge. The zone edges met on a piece are
 * enumerated up to `MAX_ZONE_CROSSINGS`; each edge tried is one work step.
 */
import { type IFn, type LSet, type Lin, type Piece, above, at, below, crossing, cutsOf, lin, sub } from "./map-linear";
import { TOL } from "./tolerance";
import { type WorkCounter, countSteps } from "./work-counter";

/** Multiples `k·h` (k ≥ 0) met by the edge `f` on (from, to), as L values; each multiple tried is one work step. */
function multipleCrossings(f: Lin, h: number, from: number, to: number, out: number[], work?: WorkCounter): void {
  if (f.b === 0) return;
  const v0 = at(f, from);
  const v1 = at(f, to);
  const kLo = Math.max(0, Math.floor(Math.min(v0, v1) / h));
  const kHi = Math.ceil(Math.max(v0, v1) / h);
  // Past 2^53 consecutive integers are no longer distinct doubles (k + 1 === k),
  // and more than MAX_ZONE_CROSSINGS edges are marked unresolved by the callers.
  if (!(kHi - kLo <= MAX_ZONE_CROSSINGS) || !(kHi < Number.MAX_SAFE_INTEGER)) return;
  countSteps(work, kHi - kLo + 1);
  for (let k = kLo; k <= kHi; k++) {
    const L = crossing(f, k * h, from, to);
    if (L === L) out.push(L);
    // an edge that reaches k·h within 1e-9 GHz of a joint of two pieces only touches it there:
    // cut where it is the allowance away, so the tie is decided as the per-offset check decides it
    const exact = (k * h - f.a) / f.b;
    if (Math.abs(exact - from) <= TOL || Math.abs(exact - to) <= TOL) {
      for (const c of [k * h - TOL, k * h + TOL]) {
        const Lt = crossing(f, c, from, to);
        if (Lt === Lt) out.push(Lt);
      }
    }
  }
}

/** The fold of a linear edge lying in zone z (even: shift down, odd: mirror). */
function foldLin(f: Lin, z: number, h: number): Lin {
  return z % 2 === 0 ? { a: f.a - z * h, b: f.b } : { a: (z + 1) * h - f.a, b: -f.b };
}

/**
 * One folded piece: `zone` is the Nyquist zone of a band that does not
 * straddle, `STRADDLES` (−1) when it straddles, `UNRESOLVED` (−2) where the
 * zone edges were not enumerated (see `MAX_ZONE_CROSSINGS`).
 */
export interface FoldedPiece extends Piece {
  zone: number;
}
export const STRADDLES = -1;
export const UNRESOLVED = -2;

/**
 * Most zone edges enumerated on one piece. Real plans stay far below it (a
 * 300 GHz reach sampled at 1 GS/s has 600); only absurd magnitudes (a reach
 * of 1e300 GHz, a sample rate of 1e-299 GHz) exceed it. Beyond it a piece
 * is left unresolved: folded to all of `[0, fs/2]` and treated as firing
 * (conservatively) by the rules that fold — the exact map there would have
 * more intervals than can be listed.
 */
export const MAX_ZONE_CROSSINGS = 20_000;

/** How many multiples of h the edges of a piece cross (an estimate, ≥ the exact count − 2). */
function zoneCrossings(p: Piece, h: number): number {
  return (Math.abs(at(p.lo, p.to) - at(p.lo, p.from)) + Math.abs(at(p.hi, p.to) - at(p.hi, p.from))) / h;
}

/** The band is wider than `w` over the whole piece (its width is linear in L). */
function widerThan(p: Piece, w: number): boolean {
  return at(p.hi, p.from) - at(p.lo, p.from) > w && at(p.hi, p.to) - at(p.lo, p.to) > w;
}

/**
 * Nyquist folding into `[0, h]`, h = fs/2 (docs/plan-format.md §5.4):
 * zone `z = floor(f/h)`, even zones shift down, odd zones mirror; a band
 * crossing one zone edge `K·h` reaches 0 (K even) or h (K odd), one holding a
 * whole zone becomes `[0, h]`. Input edges must be ≥ 0. Each zone edge
 * tried is one work step (`work`).
 */
export function foldFn(fn: IFn, h: number, work?: WorkCounter): FoldedPiece[] {
  const out: FoldedPiece[] = [];
  for (const p of fn) {
    if (widerThan(p, 2 * h)) {
      // holds a whole zone everywhere: folds onto all of [0, h] and straddles
      out.push({ from: p.from, to: p.to, lo: lin(0, 0), hi: lin(h, 0), zone: STRADDLES });
      continue;
    }
    if (!(zoneCrossings(p, h) <= MAX_ZONE_CROSSINGS)) {
      out.push({ from: p.from, to: p.to, lo: lin(0, 0), hi: lin(h, 0), zone: UNRESOLVED });
      continue;
    }
    const pts: number[] = [];
    multipleCrossings(p.lo, h, p.from, p.to, pts, work);
    multipleCrossings(p.hi, h, p.from, p.to, pts, work);
    const cuts = cutsOf(p.from, p.to, pts);
    for (let i = 0; i + 1 < cuts.length; i++) {
      const from = cuts[i] as number;
      const to = cuts[i + 1] as number;
      if (!(to > from)) continue;
      const mid = (from + to) / 2;
      const l = at(p.lo, mid);
      const hv = at(p.hi, mid);
      const zl = Math.floor(l / h);
      const zh = Math.floor(hv / h);
      // interior multiples of h: floor(l/h)+1 .. ceil(hv/h)−1
      const kFirst = zl + 1;
      const kLast = Math.ceil(hv / h) - 1;
      // a multiple within the allowance of an edge does not make a straddle (as in the per-offset
      // check, docs/plan-format.md §1.4); such a band keeps the zone of its midpoint
      const kTol = Math.max(1, Math.floor((l + TOL) / h) + 1);
      const straddles = kTol * h > l + TOL && kTol * h < hv - TOL;
      const tieZone = straddles ? -1 : Math.floor((l + hv) / 2 / h);
      if (kLast - kFirst >= 1) {
        out.push({ from, to, lo: lin(0, 0), hi: lin(h, 0), zone: straddles ? -1 : tieZone });
      } else if (kLast === kFirst) {
        const fl = foldLin(p.lo, zl, h);
        const fh = foldLin(p.hi, zh, h);
        const sub2 = cutsOf(from, to, [crossing(sub(fl, fh), 0, from, to)]);
        for (let j = 0; j + 1 < sub2.length; j++) {
          const f2 = sub2[j] as number;
          const t2 = sub2[j + 1] as number;
          if (!(t2 > f2)) continue;
          const m2 = (f2 + t2) / 2;
          const lower = at(fl, m2) <= at(fh, m2) ? fl : fh;
          const upper = at(fl, m2) <= at(fh, m2) ? fh : fl;
          // a band crossing only 0 (lower edge below 0, e.g. an occupied band
          // widened by drift) is not a Nyquist straddle (k ≥ 1): it keeps zone 0
          if (kFirst % 2 === 0)
            out.push({ from: f2, to: t2, lo: lin(0, 0), hi: upper, zone: kFirst === 0 ? 0 : tieZone });
          else out.push({ from: f2, to: t2, lo: lower, hi: lin(h, 0), zone: tieZone });
        }
      } else {
        const fl = foldLin(p.lo, zl, h);
        const fh = foldLin(p.hi, zl, h);
        if (zl % 2 === 0) out.push({ from, to, lo: fl, hi: fh, zone: zl });
        else out.push({ from, to, lo: fh, hi: fl, zone: zl });
      }
    }
  }
  return out;
}

/** Where the interior of `[lo, hi]` holds a multiple `k·h`, k ≥ 1; each multiple tried is one work step (`work`). */
export function straddleSet(fn: IFn, h: number, out: LSet, work?: WorkCounter): void {
  for (const p of fn) {
    if (
      (widerThan(p, h) && at(p.hi, p.from) > h && at(p.hi, p.to) > h) ||
      !(zoneCrossings(p, h) <= MAX_ZONE_CROSSINGS)
    ) {
      // wider than a zone and reaching past h: some k·h (k ≥ 1) is always inside;
      // or too many zone edges to enumerate: marked as firing (conservative, see MAX_ZONE_CROSSINGS)
      out.push([p.from, p.to]);
      continue;
    }
    const l0 = at(p.lo, p.from);
    const l1 = at(p.lo, p.to);
    const h0 = at(p.hi, p.from);
    const h1 = at(p.hi, p.to);
    const kLo = Math.max(1, Math.floor(Math.min(l0, l1) / h));
    const kHi = Math.ceil(Math.max(h0, h1) / h);
    if (!(kHi - kLo <= MAX_ZONE_CROSSINGS) || !(kHi < Number.MAX_SAFE_INTEGER)) {
      // a band so far out that its zone index is beyond exact integers (k + 1 === k):
      // the zone edges cannot be resolved, so the rule is marked as firing (conservative)
      out.push([p.from, p.to]);
      continue;
    }
    countSteps(work, kHi - kLo + 1);
    for (let k = kLo; k <= kHi; k++) {
      const s1 = below(p.lo, k * h, p.from, p.to);
      const s2 = above(p.hi, k * h, p.from, p.to);
      const lo = Math.max(s1[0], s2[0]);
      const hi = Math.min(s1[1], s2[1]);
      if (hi > lo) out.push([lo, hi]);
    }
  }
}
