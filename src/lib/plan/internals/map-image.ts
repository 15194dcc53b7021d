import { combDistanceAtLevel, combIntegralK, combK, combResponse } from "./comb";
import { type EnvelopeBox, detuningRange, isPointBox } from "./envelope-box";
import { worstImage } from "./envelope-image";
import { lorentzianIntegral } from "./lorentz";
import type { MapChannel, MapModel } from "./map-model";
import { type WorkCounter, countSteps } from "./work-counter";

/**
 * The image rule for the feasibility map (docs/plan-format.md §3.2 "Per
 * channel", Image, and §6.3 "The image rule"). The comb integrals and the
 * comb's inverse are the engine's closed forms
 * (internals/comb.ts), so the map and the per-offset findings use the
 * same numbers. The search for the rule's edges is in `map-image-edges.ts`.
 */

/** Per-chain constants of the comb (`K = coth(πa)` of the closed-form integral computed once). */
export interface Comb {
  linewidth: number;
  fsr: number;
  K: number;
}

export function makeComb(linewidth: number, fsr: number): Comb {
  return { linewidth, fsr, K: combK(fsr, linewidth) };
}

/** `∫_lo^hi C(x) dx` (0 when hi ≤ lo); the engine's `combIntegral` with K taken from the comb. */
export function combIntegral(c: Comb, lo: number, hi: number): number {
  return combIntegralK(lo, hi, c.fsr, c.linewidth, c.K);
}

/** `C(x)` itself (used to bound the image response). */
export function combValue(c: Comb, x: number): number {
  return combResponse(x, { fsr: c.fsr, delta: c.linewidth });
}

/**
 * `∫Wᵢ dy` at LO offset L for an SSB channel with optical band `[xl, xh]`:
 * the image band `X' = 2L − X`, counted where `|x'|` lies in rfInput.
 */
export function imageIntegral(c: Comb, m: MapModel, band: readonly [number, number], L: number): number {
  const lo = 2 * L - band[1];
  const hi = 2 * L - band[0];
  let sum = 0;
  // x' in [rfMin, rfMax]
  const a1 = Math.max(lo, m.rfMin);
  const b1 = Math.min(hi, m.rfMax);
  if (b1 > a1) sum += combIntegral(c, a1, b1);
  // x' in [−rfMax, −rfMin]
  const a2 = Math.max(lo, -m.rfMax);
  const b2 = Math.min(hi, -m.rfMin);
  if (b2 > a2) sum += combIntegral(c, a2, b2);
  return sum;
}

/** Image rejection R(L) in dB (+∞ where `∫Wᵢ = 0`). */
export function imageRejectionDB(c: Comb, m: MapModel, ch: MapChannel, L: number): number {
  const band = ch.bands[0];
  if (!band) return Infinity;
  const wi = imageIntegral(c, m, band, L);
  if (!(wi > 0)) return Infinity;
  return 10 * Math.log10(ch.wantedIntegral / wi);
}

/** The image rule fires (with the 1e-9 dB allowance in favour of passing). */
export function imageFires(c: Comb, m: MapModel, ch: MapChannel, L: number): boolean {
  return imageRejectionDB(c, m, ch, L) < m.imageRejectionDB - 1e-9;
}

/**
 * `imageFires` for one channel as a function of L, with the threshold
 * turned into a ratio once: `10·log10(∫W/∫Wᵢ) < T − 1e-9` is decided
 * without the logarithm when the ratio lies more than a relative 1e-9
 * (about 4e-9 dB) away from `10^((T − 1e-9)/10)`, far beyond the rounding
 * of either form; near it, and for non-finite values, the logarithm
 * decides exactly as `imageFires` does. Same answers, fewer logarithms.
 */
export function makeImageFires(c: Comb, m: MapModel, ch: MapChannel): (L: number) => boolean {
  const band = ch.bands[0];
  if (!band) return () => false;
  const threshold = m.imageRejectionDB - 1e-9;
  const ratio = Math.pow(10, threshold / 10);
  const below = ratio * (1 - 1e-9);
  const above = ratio * (1 + 1e-9);
  const fast = Number.isFinite(above) && below > 0;
  const xl = band[0];
  const xh = band[1];
  const W = ch.wantedIntegral;
  const { rfMin, rfMax } = m;
  const { fsr, linewidth, K } = c;
  return (L: number): boolean => {
    // imageIntegral, inlined
    const lo = 2 * L - xh;
    const hi = 2 * L - xl;
    let wi = 0;
    const a1 = Math.max(lo, rfMin);
    const b1 = Math.min(hi, rfMax);
    if (b1 > a1) wi += combIntegralK(a1, b1, fsr, linewidth, K);
    const a2 = Math.max(lo, -rfMax);
    const b2 = Math.min(hi, -rfMin);
    if (b2 > a2) wi += combIntegralK(a2, b2, fsr, linewidth, K);
    if (!(wi > 0)) return false; // rejection +∞
    if (fast) {
      const r = W / wi;
      if (r < below) return true;
      if (r > above) return false;
    }
    return 10 * Math.log10(W / wi) < threshold;
  };
}

/**
 * The distance `r` from a mode centre within which `C` exceeds `level`
 * (the comb is largest at a mode centre and falls monotonically to the
 * midpoint between modes). Returns `fsr/2` when C exceeds the level
 * everywhere and −1 when it never does.
 */
export function combRadius(c: Comb, level: number): number {
  const r = combDistanceAtLevel(level, { fsr: c.fsr, delta: c.linewidth });
  if (r === 0) return -1;
  return Math.min(r, c.fsr / 2);
}

/**
 * The image rule over an operating envelope for one channel, as a function
 * of L (docs/plan-format.md §12.5): it fires when the lowest rejection over
 * the box falls short of the requirement (with the 1e-9 dB allowance), by
 * the same evaluation as the per-offset check (`worstImage`, which stops as
 * soon as the answer is known). An occupied-band filter that cannot be
 * built (its slot starts within D of 0 GHz) has no image figure, so the
 * rule does not fire there. A box of one point is the nominal rule
 * (`makeImageFires`). `withinPossible` leaves out the check for an
 * impossible filter, for a search that already keeps to where the filter
 * can be built (its ends then take the rule's limit from inside).
 */
export function makeEnvelopeImageFires(
  c: Comb,
  m: MapModel,
  ch: MapChannel,
  box: EnvelopeBox,
  withinPossible = false,
): (L: number) => boolean {
  if (isPointBox(box)) return makeImageFires(c, m, ch);
  const band = ch.bands[0];
  const problem = ch.imageProblem ? { ...ch.imageProblem, box } : null;
  if (!band || !problem) return () => false;
  const threshold = m.imageRejectionDB - 1e-9;
  const D = box.D;
  const [xl, xh] = band;
  return (L: number): boolean => {
    if (!withinPossible && ch.occupied && D > 0 && (L <= xl ? xl - L : L - xh) <= D) return false;
    return worstImage(problem, L, threshold).rejectionDB < threshold;
  };
}

/** The lowest `∫W` of an SSB channel over the box (the wanted band slides against the mode; the integral is largest when centred, so lowest at an end). */
export function lowestWantedIntegral(m: MapModel, ch: MapChannel, box: EnvelopeBox): number {
  const p = ch.imageProblem;
  if (!p || isPointBox(box)) return ch.wantedIntegral;
  const [dMin, dMax] = detuningRange(box);
  return Math.min(
    lorentzianIntegral(p.xl + dMin, p.xh + dMin, p.modeCentre, p.delta),
    lorentzianIntegral(p.xl + dMax, p.xh + dMax, p.modeCentre, p.delta),
  );
}

/** Most mode windows enumerated; beyond it the whole range is searched. */
const MAX_WINDOWS = 10_000;

/**
 * The L windows inside [lo, hi] where the image rule can fire for an SSB
 * channel: `X'` must meet `±rfInput` (elsewhere `∫Wᵢ = 0`) and come within
 * `r` of a mode centre, where `C(r) = 10^(−threshold/10)·∫W/B`
 * (since `∫Wᵢ ≤ B·max C` over `X'`). Sorted and merged. Each mode window
 * enumerated is one work step (`work`).
 *
 * Over an operating envelope (`box`), `∫W` is its lowest over the box, B
 * and X are the received band's (widened by D for the occupied-band
 * filter), the image band moves by the LO shift u (so each window widens
 * by D/2 in L) and mode n moves by `n·φ·t` (by `|n·φ|·max|t|/2` in L).
 */
export function imageWindows(
  c: Comb,
  m: MapModel,
  ch: MapChannel,
  lo: number,
  hi: number,
  work?: WorkCounter,
  box?: EnvelopeBox,
): [number, number][] {
  const band = ch.bands[0];
  if (!band) return [];
  const moving = box !== undefined && !isPointBox(box);
  const w = moving && ch.occupied ? box.D : 0;
  const xl = w === 0 ? band[0] : band[0] - w;
  const xh = w === 0 ? band[1] : band[1] + w;
  const D = moving ? box.D : 0;
  const tMax = moving ? Math.max(Math.abs(box.tLo), Math.abs(box.tHi)) : 0;
  const phi = moving ? Math.abs(box.phi) : 0;
  const wanted = moving ? lowestWantedIntegral(m, ch, box) : ch.wantedIntegral;
  const level = Math.pow(10, -m.imageRejectionDB / 10) * (wanted / (ch.widthGHz + 2 * w));
  const r0 = combRadius(c, level);
  if (r0 < 0) return [];
  // the comb's period, hence its shape, changes a little with t: a 1 % wider radius covers it
  const r = moving ? Math.min(c.fsr / 2, r0 * 1.01) : r0;
  const out: [number, number][] = [];
  for (const [e1, e2] of [
    [-m.rfMax, -m.rfMin],
    [m.rfMin, m.rfMax],
  ] as const) {
    // X' = [2L + u − xh, 2L + u − xl] meets [e1, e2] for some u within ±D
    const a = Math.max(lo, (e1 + xl - D) / 2);
    const b = Math.min(hi, (e2 + xh + D) / 2);
    if (!(b > a)) continue;
    const nFirst = Math.ceil((e1 - r) / c.fsr) - (moving ? 1 : 0);
    const nLast = Math.floor((e2 + r) / c.fsr) + (moving ? 1 : 0);
    if (r >= c.fsr / 2 || !(nLast - nFirst < MAX_WINDOWS)) {
      out.push([a, b]);
      continue;
    }
    countSteps(work, nLast - nFirst + 1);
    for (let n = nFirst; n <= nLast; n++) {
      // X' within r of n·(fsr + φ·t): 2L + u − xh ≤ n·fsr + |n·φ|·tMax + r and 2L + u − xl ≥ n·fsr − |n·φ|·tMax − r
      const move = Math.abs(n) * phi * tMax;
      const wlo = Math.max(a, (n * c.fsr - move - r + xl - D) / 2);
      const whi = Math.min(b, (n * c.fsr + move + r + xh + D) / 2);
      if (whi > wlo) out.push([wlo, whi]);
    }
  }
  out.sort((p, q) => p[0] - q[0]);
  const merged: [number, number][] = [];
  for (const w2 of out) {
    const last = merged[merged.length - 1];
    if (last && w2[0] <= last[1]) last[1] = Math.max(last[1], w2[1]);
    else merged.push(w2);
  }
  return merged;
}
