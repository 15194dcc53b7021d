import { combIntegralK, combK } from "./comb";
import { type EnvelopeBox, detuningRange, pointAt, temperaturesAt } from "./envelope-box";
import { minimise } from "./extremum";
import { lorentzianIntegral } from "./lorentz";

/**
 * The image rejection of an SSB channel over the operating envelope
 * (docs/plan-format.md §12.3 "Image" and §12.4 "Worst values over the
 * box"): the one evaluation the channel's figures, the per-offset check,
 * the feasibility map and the temperature window all share, so that they
 * agree exactly.
 *
 * At a point `(u, t)` of the box the received optical band is `X + u`
 * (`X` widened by D for the occupied-band filter), the LO `L + u`, so the
 * image band is `2L + u − X`, integrated against the comb whose modes sit
 * at `n·(fsr + t·φ)`; the wanted integral is `∫_{X + d} M` against the mode
 * at rest, `d = u − k·t`. With the detuning d and t as coordinates,
 *
 * `R(d, t) = 10·log10( ∫W(d) / ∫Wᵢ(2L + d + k·t, t) )`,
 *
 * and at fixed d only the comb modes other than the wanted one move
 * against the image band (by `(n − n*)·φ` per kelvin), and the band
 * against the rfInput edges (by `k`). The search is therefore:
 *
 * - one dimension in d when the box holds one temperature, or φ = 0;
 * - one dimension in d (with t at the value nearest 0) when no mode other
 *   than the wanted one is the nearest mode to the image band and no
 *   rfInput edge lies inside the band's travel: then R depends on t only
 *   through modes at least half an FSR away, and a final search over t at
 *   the best d (then over d again around it) picks up that dependence;
 * - otherwise nested: the minimum over d at each t (`minimise`), minimised
 *   over t on a scan whose step moves the image band by at most the scan
 *   step against every comb mode near it and the rfInput edges.
 */
export interface ImageProblem {
  /** The received optical band at u = 0, [xl, xh]: the channel's band, widened by D for the occupied-band filter. */
  xl: number;
  xh: number;
  /** Centre and linewidth of the wanted mode (GHz). */
  modeCentre: number;
  delta: number;
  fsr: number;
  /** Index of the wanted mode, n* = s·k. */
  nStar: number;
  rfMin: number;
  rfMax: number;
  box: EnvelopeBox;
  /** Scan step in d (GHz): δ/16 (the comb and the wanted mode integrated over a band are smooth on the scale of δ). */
  step: number;
}

/** The worst (lowest) image rejection over the box and where it occurs. */
export interface ImageWorst {
  /** R in dB; +∞ when nothing of the image band gets in anywhere in the box. */
  rejectionDB: number;
  /** LO shift u (GHz) and temperature offset t (K) of the worst point. */
  u: number;
  t: number;
  /** The optical image band at that point. */
  opticalImage: [number, number];
}

/** Most temperature samples of the nested search (absurd inputs only). */
const MAX_T_SAMPLES = 256;

/** The comb at the last temperature offset used (its K = coth(πa) is worked out once per temperature). */
interface CombCache {
  t: number;
  fsr: number;
  K: number;
}

/** `R(d, t)` of the problem at LO offset L, in dB (+∞ when nothing of the image gets in). */
function rejection(p: ImageProblem, cache: CombCache, L: number, d: number, t: number): number {
  if (t !== cache.t) {
    cache.t = t;
    cache.fsr = p.fsr + p.box.phi * t;
    cache.K = combK(cache.fsr, p.delta);
  }
  const W = lorentzianIntegral(p.xl + d, p.xh + d, p.modeCentre, p.delta);
  const z = 2 * L + d + p.box.k * t;
  const lo = z - p.xh;
  const hi = z - p.xl;
  let wi = 0;
  const a1 = Math.max(lo, p.rfMin);
  const b1 = Math.min(hi, p.rfMax);
  if (b1 > a1) wi += combIntegralK(a1, b1, cache.fsr, p.delta, cache.K);
  const a2 = Math.max(lo, -p.rfMax);
  const b2 = Math.min(hi, -p.rfMin);
  if (b2 > a2) wi += combIntegralK(a2, b2, cache.fsr, p.delta, cache.K);
  return wi > 0 ? 10 * Math.log10(W / wi) : Infinity;
}

/** The image rejection (dB) of the problem at one point (u, t) of the box, LO at L (+∞ when nothing of the image gets in). */
export function imageRejectionAtPoint(p: ImageProblem, L: number, u: number, t: number): number {
  const cache: CombCache = { t: 0, fsr: p.fsr, K: combK(p.fsr, p.delta) };
  return rejection(p, cache, L, u - p.box.k * t, t);
}

function result(p: ImageProblem, L: number, d: number, t: number, value: number): ImageWorst {
  const u = Math.min(p.box.D, Math.max(-p.box.D, d + p.box.k * t)) + 0;
  return { rejectionDB: value, u, t: t + 0, opticalImage: [2 * L + u - p.xh, 2 * L + u - p.xl] };
}

/**
 * How fast, at fixed d, the image band moves against what shapes `∫Wᵢ`
 * (GHz/K): the comb modes nearest to it other than the wanted one, and the
 * rfInput edges inside its travel. −1 when its travel meets no part of
 * ±rfInput (nothing gets in anywhere).
 */
export function imageRate(p: ImageProblem, L: number): number {
  return imageTravel(p, L).rate;
}

/**
 * The image band's travel over the box at L: the rate of `imageRate`, and
 * whether an rfInput edge lies inside it (then `∫Wᵢ` also changes on the
 * scale of the band's own width, where the band crosses that edge).
 */
function imageTravel(p: ImageProblem, L: number): { rate: number; edgeInside: boolean } {
  const zLo = 2 * L - p.box.D - p.xh;
  const zHi = 2 * L + p.box.D - p.xl;
  let rate = -1;
  let edgeInside = false;
  for (let w = 0; w < 2; w++) {
    const e1 = w === 0 ? p.rfMin : -p.rfMax;
    const e2 = w === 0 ? p.rfMax : -p.rfMin;
    const a = Math.max(zLo, e1);
    const b = Math.min(zHi, e2);
    if (!(b > a)) continue;
    const nLo = Math.round(a / p.fsr);
    const nHi = Math.round(b / p.fsr);
    rate = Math.max(rate, Math.abs(p.box.phi) * Math.max(Math.abs(nLo - p.nStar), Math.abs(nHi - p.nStar)));
    for (const e of [e1, e2]) {
      if (e > zLo && e < zHi) {
        rate = Math.max(rate, Math.abs(p.box.k));
        edgeInside = true;
      }
    }
  }
  return { rate, edgeInside };
}

/**
 * The worst image rejection of the problem at LO offset L. With
 * `stopBelow`, the search ends as soon as a rejection below it is found
 * (the answer is then some value below it, enough to decide the rule).
 */
export function worstImage(p: ImageProblem, L: number, stopBelow = -Infinity): ImageWorst {
  const box = p.box;
  const k = box.k;
  const cache: CombCache = { t: 0, fsr: p.fsr, K: combK(p.fsr, p.delta) };
  const travel = imageTravel(p, L);
  const rate = travel.rate;
  if (rate < 0) return result(p, L, 0, pointAt(box, 0).t, Infinity);
  const opts = { stopBelow };
  // where the band crosses an rfInput edge its integral changes on the scale of its width too
  const step = travel.edgeInside ? Math.min(p.step, (p.xh - p.xl) / 16) : p.step;

  if (box.tLo === box.tHi || box.phi === 0) {
    const t0 = box.phi === 0 ? pointAt(box, 0).t : box.tLo;
    const r = minimise((d) => rejection(p, cache, L, d, t0), -box.D - k * t0, box.D - k * t0, step, opts);
    return result(p, L, r.x, t0, r.fx);
  }

  if (rate === 0) {
    // R depends on t only through modes half an FSR or more away: search d, then polish t and d
    const [dMin, dMax] = detuningRange(box);
    let best = minimise((d) => rejection(p, cache, L, d, pointAt(box, d).t), dMin, dMax, step, opts);
    let d = best.x;
    let t = pointAt(box, d).t;
    for (let round = 0; round < 1 && !(best.fx < stopBelow); round++) {
      const [t1, t2] = temperaturesAt(box, d);
      const dd = d;
      const rt = minimise((tt) => rejection(p, cache, L, dd, tt), t1, t2, (t2 - t1) / 2, opts);
      if (rt.fx < best.fx) {
        best = rt;
        t = rt.x;
      }
      if (best.fx < stopBelow) break;
      const tt = t;
      const rd = minimise(
        (x) => rejection(p, cache, L, x, tt),
        Math.max(-box.D - k * tt, d - step),
        Math.min(box.D - k * tt, d + step),
        step,
        opts,
      );
      if (rd.fx < best.fx) {
        best = rd;
        d = rd.x;
      }
    }
    return result(p, L, d, t, best.fx);
  }

  // nested: the minimum over d at each t, minimised over t
  const tStep = Math.max((box.tHi - box.tLo) / MAX_T_SAMPLES, step / rate);
  let bestD = 0;
  let bestT = box.tLo;
  let bestV = Infinity;
  minimise(
    (t) => {
      const r = minimise((d) => rejection(p, cache, L, d, t), -box.D - k * t, box.D - k * t, step, opts);
      if (r.fx < bestV || (r.fx === bestV && t < bestT)) {
        bestV = r.fx;
        bestD = r.x;
        bestT = t;
      }
      return r.fx;
    },
    box.tLo,
    box.tHi,
    tStep,
    opts,
  );
  return result(p, L, bestD, bestT, bestV);
}
