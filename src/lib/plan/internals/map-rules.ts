import type { MapChannel, MapCode, MapModel } from "./map-model";
import { makeComb } from "./map-image";
import { imageFiringIntervals } from "./map-image-edges";
import { MAX_LOCK_ORDER_ENUMERATED } from "./spurs";
import { foldFn, straddleSet, STRADDLES, UNRESOLVED, type FoldedPiece } from "./map-fold";
import {
  absFn,
  clipFn,
  lin,
  outsideSet,
  widen,
  withinGuardSet,
  type IFn,
  type Lin,
  type LSet,
  type Piece,
} from "./map-linear";
import { type WorkCounter, countSteps } from "./work-counter";

/**
 * The exact firing sets of every L-dependent error rule of one chain over
 * one (merged) reach interval `[r0, r1]`: for each code, a list of L
 * intervals where it fires (unsorted, possibly overlapping). Every edge is
 * the solution of a limiting equality (gap = guard, edge = detector bound,
 * edge = k·fs/2, …) except those of `image-response`, which are bisected to
 * 1e-6 GHz (docs/plan-format.md §6.2 "Exact edges" and §6.3 "The image rule");
 * the image rule takes the lowest rejection over the chain's operating
 * envelope (§12.5).
 */
export type FiringSets = Record<MapCode, LSet>;

/** The IF slot of a channel as a piecewise-linear function of L on [r0, r1] (undefined inside a band). */
export function slotFn(ch: MapChannel, r0: number, r1: number): IFn {
  const edges: number[] = [];
  for (const b of ch.bands) edges.push(b[0], b[1]);
  const cuts = [r0, ...edges.filter((e) => e > r0 && e < r1).sort((p, q) => p - q), r1];
  const out: IFn = [];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const from = cuts[i] as number;
    const to = cuts[i + 1] as number;
    if (!(to > from)) continue;
    const mid = (from + to) / 2;
    if (ch.bands.some((b) => mid > b[0] && mid < b[1])) continue; // lo-in-band: no slot
    // distance intervals |L − x| over each band, linear on this region
    const los: Lin[] = [];
    const his: Lin[] = [];
    for (const b of ch.bands) {
      if (mid <= b[0]) {
        los.push(lin(b[0], -1));
        his.push(lin(b[1], -1));
      } else {
        los.push(lin(-b[1], 1));
        his.push(lin(-b[0], 1));
      }
    }
    // hull: min of lower edges, max of upper edges; split where they swap
    const pts: number[] = [];
    for (let p = 0; p < los.length; p++) {
      for (let q = p + 1; q < los.length; q++) {
        for (const [f, g] of [
          [los[p]!, los[q]!],
          [his[p]!, his[q]!],
        ] as const) {
          if (f.b !== g.b) {
            const L = (g.a - f.a) / (f.b - g.b);
            if (L > from && L < to) pts.push(L);
          }
        }
      }
    }
    pts.sort((p, q) => p - q);
    const sub = [from, ...pts, to];
    for (let j = 0; j + 1 < sub.length; j++) {
      const f = sub[j] as number;
      const t = sub[j + 1] as number;
      if (!(t > f)) continue;
      const m = (f + t) / 2;
      let lo = los[0]!;
      let hi = his[0]!;
      for (let k = 1; k < los.length; k++) {
        if (los[k]!.a + los[k]!.b * m < lo.a + lo.b * m) lo = los[k]!;
        if (his[k]!.a + his[k]!.b * m > hi.a + hi.b * m) hi = his[k]!;
      }
      out.push({ from: f, to: t, lo, hi });
    }
  }
  return out;
}

/**
 * The error spur bands of the chain (carrier-beat, lock-lo, lock-self) on
 * [r0, r1], detector-clipped. Lock orders are enumerated up to the engine's
 * limit `MAX_LOCK_ORDER_ENUMERATED` (as the per-offset check does), and only
 * those whose band can reach the detector band for some L in [r0, r1].
 * Each lock order enumerated is one work step.
 */
export function errorSpurFns(m: MapModel, r0: number, r1: number, work?: WorkCounter): IFn[] {
  const D = m.drift;
  const out: IFn[] = [];
  const moving = (c: number): IFn =>
    clipFn(absFn([{ from: r0, to: r1, lo: lin(c - D, 1), hi: lin(c + D, 1) }]), m.detMin, m.detMax);
  out.push(moving(0)); // carrier-beat |L| ± D
  const M = Math.min(m.lockOrders, MAX_LOCK_ORDER_ENUMERATED);
  const reachIF = m.detMax + D;
  // |L − k·fm| ± D meets the detector only if k·fm ∈ [r0 − reachIF, r1 + reachIF];
  // |L + k·fm| ± D only if k·fm ∈ [−r1 − reachIF, −r0 + reachIF]
  for (const [sign, lo, hi] of [
    [-1, r0 - reachIF, r1 + reachIF],
    [1, -r1 - reachIF, -r0 + reachIF],
  ] as const) {
    const kLo = Math.max(1, Math.ceil(lo / m.fm));
    const kHi = Math.min(M, Math.floor(hi / m.fm));
    countSteps(work, kHi - kLo + 1);
    for (let k = kLo; k <= kHi; k++) out.push(moving(sign * k * m.fm));
  }
  const kSelf = Math.min(2 * M, Math.floor(m.detMax / m.fm));
  countSteps(work, kSelf);
  for (let k = 1; k <= kSelf; k++) {
    const f = k * m.fm; // lock-self, fixed tone
    if (f >= m.detMin && f <= m.detMax) out.push([{ from: r0, to: r1, lo: lin(f, 0), hi: lin(f, 0) }]);
  }
  return out.filter((f) => f.length > 0);
}

/** Compute the firing sets of every L-dependent error rule on the reach interval [r0, r1]; `work` counts the work steps. */
export function firingSets(m: MapModel, r0: number, r1: number, work?: WorkCounter): FiringSets {
  const sets: FiringSets = {
    "lo-uncovered": [],
    "lo-in-band": [],
    "if-outside-detector": [],
    "slot-overlap": [],
    "image-response": [],
    "spur-in-slot": [],
    "nyquist-straddle": [],
    "alias-overlap": [],
  };
  const D = m.drift;
  const g = m.guard;
  const h = m.halfFs;

  // lo-uncovered: [L − D, L + D] must lie inside this reach interval
  if (D > 0) {
    sets["lo-uncovered"].push([r0, Math.min(r1, r0 + D)], [Math.max(r0, r1 - D), r1]);
  }

  const occ: IFn[] = [];
  const folded: FoldedPiece[][] = [];
  const foldedClear: FoldedPiece[][] = [];
  const comb = makeComb(m.linewidth, m.fsr);
  for (const ch of m.channels) {
    for (const b of ch.bands) {
      const lo = Math.max(r0, b[0]);
      const hi = Math.min(r1, b[1]);
      if (hi > lo) sets["lo-in-band"].push([lo, hi]);
    }
    const slot = slotFn(ch, r0, r1);
    const O = widen(slot, D);
    occ.push(O);
    outsideSet(O, m.detMin, m.detMax, sets["if-outside-detector"]);
    if (ch.ssb) {
      const image = sets["image-response"];
      for (const p of slot)
        for (const iv of imageFiringIntervals(comb, m, ch, p.from, p.to, work, m.box)) image.push(iv);
    }
    if (h !== null) {
      straddleSet(O, h, sets["nyquist-straddle"], work);
      const f = foldFn(O, h, work);
      folded.push(f);
      // alias-overlap leaves straddling bands out; unresolved pieces stay in (and fire, conservatively)
      foldedClear.push(f.filter((p) => p.zone !== STRADDLES));
    }
  }

  const n = m.channels.length;
  if (!m.sharedIf) {
    for (let i = 0; i < n; i++) {
      for (let j = i + 1; j < n; j++) withinGuardSet(occ[i]!, occ[j]!, g, sets["slot-overlap"]);
    }
  }

  const spurs = errorSpurFns(m, r0, r1, work);
  const spursFolded = h === null ? [] : spurs.map((s) => foldFn(s, h, work));
  for (let i = 0; i < n; i++) {
    for (const s of spurs) withinGuardSet<Piece>(s, occ[i]!, g, sets["spur-in-slot"]);
    if (h !== null) {
      for (const s of spursFolded) withinGuardSet<Piece>(s, folded[i]!, g, sets["spur-in-slot"]);
    }
  }

  if (h !== null) {
    const differentZone = (p: FoldedPiece, q: FoldedPiece) => p.zone !== q.zone || p.zone === UNRESOLVED;
    for (let i = 0; i < n; i++) {
      for (let j = i + 1; j < n; j++) {
        withinGuardSet(foldedClear[i]!, foldedClear[j]!, g, sets["alias-overlap"], differentZone);
      }
    }
  }
  return sets;
}
