import type { Finding, FindingCode } from "../types";
import type { ChainContext, ChannelContext } from "./chain-context";
import { channelImageProblem, filterWidening, occupiedFilterImpossible } from "./channel-envelope";
import { envelopeBox } from "./envelope-box";
import { worstImage } from "./envelope-image";
import type { ChannelAtOffset } from "./offset-state";
import { combDistanceAtLevel } from "./comb";
import { lorentzianIntegral } from "./lorentz";
import { centroidOffset } from "./received-band";
import { receivedSensitivity } from "./slot";
import { TOL } from "./tolerance";

// (Longer than most files: the four temperature-dependent rules each need their own way to the set of temperatures where they hold, and they are kept together because the window is their intersection.)
/**
 * The temperature window of a chain (docs/plan-format.md §12.6): the
 * temperature offsets t within ±50 K at which, with the LO at the chain's
 * own offset, every error rule holds for every LO shift u within ±D.
 *
 * Only four error rules depend on the temperature: `mode-detuned`,
 * `centre-drift`, `nedt-unmet` and `image-response`; when any other error
 * fires at the chain's LO the window is empty. For each channel, the set of
 * temperatures where each of the four holds is found, and the window is
 * their intersection:
 *
 * - `mode-detuned`: in closed form (the largest detuning at t is
 *   `|e − k·t| + D`, or `|e − k·t|` for the occupied-band filter);
 * - `nedt-unmet`: the worst NEΔT at t is the largest over the detunings
 *   `[−D − k·t, D − k·t]`, so the detunings where NEΔT meets the
 *   requirement are found once (scan and bisection) and mapped to t;
 * - `centre-drift` and `image-response`: sampled in t on a step over which
 *   the received band moves by at most the scan step against the mode and
 *   the comb (no shorter than 1 mK, no longer than 2 K) and every change
 *   bisected to half a millikelvin.
 *
 * Edges are rounded to 1 mK; intervals shorter than that are left out.
 */

/** The window spans ±50 K (the largest temperature excursion a plan may state). */
export const WINDOW_SPAN_K = 50;
/** Edges are reported to 1 mK. */
const EDGE_K = 1e-3;
/** Every change of a sampled rule is bisected to this bracket (K). */
const BRACKET_K = 5e-4;
/**
 * Sampling steps in t, K: the step over which the band moves by the scan
 * step against the mode and the comb, no shorter than 1 mK and no longer
 * than 2 K (a cap for resonators that hardly move: every sampled rule is
 * smooth on the scale the step is derived from).
 */
const MIN_STEP_K = 1e-3;
const MAX_STEP_K = 2;
/** Most samples of the detuning scan for NEΔT (absurd inputs only). */
const MAX_SAMPLES = 200_000;

/** The error codes whose outcome depends on the resonator temperature. */
export const TEMPERATURE_CODES: readonly FindingCode[] = [
  "mode-detuned",
  "centre-drift",
  "image-response",
  "nedt-unmet",
];

export interface TemperatureWindow {
  intervalsK: [number, number][];
  marginK: number | null;
}

type Set1 = [number, number][];

function intersectSets(a: Set1, b: Set1): Set1 {
  const out: Set1 = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    const lo = Math.max(a[i]![0], b[j]![0]);
    const hi = Math.min(a[i]![1], b[j]![1]);
    if (hi >= lo) out.push([lo, hi]);
    if (a[i]![1] < b[j]![1]) i++;
    else j++;
  }
  return out;
}

/** The sorted set where `holds` is true on [lo, hi], by sampling on `step` and bisecting each change to `BRACKET_K`. */
function sampledSet(holds: (t: number) => boolean, lo: number, hi: number, step: number): Set1 {
  const n = Math.max(1, Math.ceil((hi - lo) / step));
  const at = (i: number) => (i === n ? hi : lo + ((hi - lo) * i) / n);
  const out: Set1 = [];
  let prevT = lo;
  let prev = holds(lo);
  let openAt: number | null = prev ? lo : null;
  for (let i = 1; i <= n; i++) {
    const t = at(i);
    const now = holds(t);
    if (now !== prev) {
      let a = prevT;
      let b = t;
      while (b - a > BRACKET_K) {
        const m = (a + b) / 2;
        if (holds(m) === prev) a = m;
        else b = m;
      }
      const edge = (a + b) / 2;
      if (now) openAt = edge;
      else if (openAt !== null) {
        out.push([openAt, edge]);
        openAt = null;
      }
    }
    prev = now;
    prevT = t;
  }
  if (openAt !== null) out.push([openAt, hi]);
  return out;
}

/** A step in t over which something moving at `rate` GHz/K moves by `scan` GHz, clamped to [1 mK, 2 K]. */
function stepFor(scan: number, rate: number): number {
  if (!(rate > 0)) return MAX_STEP_K;
  return Math.min(MAX_STEP_K, Math.max(MIN_STEP_K, scan / rate));
}

/** t with k·t in [a, b] (within ±50 K). */
function tWhereKtIn(k: number, a: number, b: number): Set1 {
  if (a > b) return [];
  if (k === 0) return a <= 0 && 0 <= b ? [[-WINDOW_SPAN_K, WINDOW_SPAN_K]] : [];
  const p = a / k;
  const q = b / k;
  const lo = Math.max(-WINDOW_SPAN_K, Math.min(p, q));
  const hi = Math.min(WINDOW_SPAN_K, Math.max(p, q));
  return hi >= lo ? [[lo, hi]] : [];
}

const ALL: Set1 = [[-WINDOW_SPAN_K, WINDOW_SPAN_K]];

/** Where `mode-detuned` holds for a channel: every passband's largest detuning within δ/2 (with the allowance). */
function modeHolds(ctx: ChainContext, ch: ChannelContext): Set1 {
  const k = ctx.box.k;
  const reach = ctx.delta / 2 + TOL - (ch.occupiedFilter ? 0 : ctx.D);
  let set = ALL;
  for (const f of ch.centres) {
    const e = ctx.s * f - ctx.modeCentre;
    // |e − k·t| ≤ reach  ⟺  k·t ∈ [e − reach, e + reach]
    set = intersectSets(set, reach < 0 ? [] : tWhereKtIn(k, e - reach, e + reach));
  }
  return set;
}

/** Where `nedt-unmet` holds: the detunings where NEΔT meets the requirement, mapped to t. */
function nedtHolds(ctx: ChainContext, c: ChannelAtOffset, L: number): Set1 {
  const { ch, geo } = c;
  const req = ch.channel.requiredNedtK;
  if (req === null || geo === null) return ALL;
  const k = ctx.box.k;
  const D = ctx.D;
  const w = filterWidening(ch, ctx.box);
  const meets = (d: number) => {
    // as the rule: it fires only on a NEΔT above the requirement (+∞ when nothing of the mode is received)
    return !(receivedSensitivity(ctx, ch, geo, L, d, w).nedtK > req + TOL);
  };
  const span = D + WINDOW_SPAN_K * Math.abs(k);
  const step = Math.max(ch.envelopeStep, (2 * span) / MAX_SAMPLES);
  // detunings where NEΔT meets the requirement, edges bisected finely enough for 1 mK in t
  const bracket = Math.abs(k) > 0 ? Math.abs(k) * BRACKET_K : ch.envelopeStep * 1e-6;
  const n = Math.max(1, Math.ceil((2 * span) / step));
  const dAt = (i: number) => (i === n ? span : -span + (2 * span * i) / n);
  const S: Set1 = [];
  let prevD = -span;
  let prev = meets(-span);
  let openAt: number | null = prev ? -span : null;
  for (let i = 1; i <= n; i++) {
    const d = dAt(i);
    const now = meets(d);
    if (now !== prev) {
      let a = prevD;
      let b = d;
      while (b - a > bracket) {
        const m = (a + b) / 2;
        if (meets(m) === prev) a = m;
        else b = m;
      }
      // the edge on the side where the requirement is met
      const edge = prev ? a : b;
      if (now) openAt = edge;
      else if (openAt !== null) {
        S.push([openAt, edge]);
        openAt = null;
      }
    }
    prev = now;
    prevD = d;
  }
  if (openAt !== null) S.push([openAt, span]);
  // [−D − k·t, D − k·t] ⊂ [s1, s2]  ⟺  k·t ∈ [D − s2, −D − s1]
  const out: Set1 = [];
  for (const [s1, s2] of S) out.push(...tWhereKtIn(k, D - s2, -D - s1));
  return out.sort((p, q) => p[0] - q[0]);
}

/** Where `centre-drift` holds: the centre error at t (largest at u = ±D) within the tolerance. */
function centreHolds(ctx: ChainContext, ch: ChannelContext): Set1 {
  const tol = ch.centreToleranceGHz;
  if (tol === null) return ALL;
  const k = ctx.box.k;
  const D = ctx.D;
  const width = ch.B + 2 * filterWidening(ch, ctx.box);
  const es = ch.centres.map((f) => ctx.s * f - ctx.modeCentre);
  const holds = (t: number) => {
    for (const e of es) {
      for (const u of D === 0 ? [0] : [-D, D]) {
        if (Math.abs(u + centroidOffset(e + u - k * t, width, ctx.delta)) > tol + TOL) return false;
      }
    }
    return true;
  };
  if (k === 0) return holds(0) ? ALL : [];
  return sampledSet(holds, -WINDOW_SPAN_K, WINDOW_SPAN_K, stepFor(ch.envelopeStep, Math.abs(k)));
}

/**
 * The temperatures within ±50 K at which the image rule can fire for the
 * channel at L: the image band (over u within ±D) must meet ±rfInput and
 * come within r of a comb mode `n·(fsr + φ·t)`, where the comb falls to
 * `10^(−R/10)·∫W/B` (∫W its lowest over the detunings of ±50 K): the bound
 * of docs/plan-format.md §6.3, with the modes moving. Sorted, merged.
 */
function imageCandidates(ctx: ChainContext, ch: ChannelContext, L: number, xl: number, xh: number): Set1 {
  const D = ctx.D;
  const k = ctx.box.k;
  const lo = 2 * L - D - xh;
  const hi = 2 * L + D - xl;
  const [rMin, rMax] = ctx.rfInput;
  const meetsRf = Math.min(hi, rMax) > Math.max(lo, rMin) || Math.min(hi, -rMin) > Math.max(lo, -rMax);
  if (!meetsRf) return [];
  const span = D + WINDOW_SPAN_K * Math.abs(k);
  const wanted = Math.min(
    lorentzianIntegral(xl - span, xh - span, ctx.modeCentre, ctx.delta),
    lorentzianIntegral(xl + span, xh + span, ctx.modeCentre, ctx.delta),
  );
  const level = Math.pow(10, -ctx.plan.settings.imageRejectionDB / 10) * (wanted / (xh - xl));
  const r0 = combDistanceAtLevel(level, ctx.comb);
  if (r0 === 0) return [];
  const r = r0 * 1.01;
  if (r >= ctx.fsr / 2) return ALL;
  const out: Set1 = [];
  const phi = ctx.phi;
  const fMin = ctx.fsr - WINDOW_SPAN_K * Math.abs(phi);
  const fMax = ctx.fsr + WINDOW_SPAN_K * Math.abs(phi);
  if (!(fMin > 0)) return ALL;
  // modes n whose centre n·F (F within fsr ± 50|φ|) can come within r of [lo, hi]
  const ends = [(lo - r) / fMin, (lo - r) / fMax, (hi + r) / fMin, (hi + r) / fMax];
  const nLo = Math.floor(Math.min(...ends));
  const nHi = Math.ceil(Math.max(...ends));
  if (!(nHi - nLo < 10_000)) return ALL;
  for (let n = nLo; n <= nHi; n++) {
    if (n === 0) {
      if (lo - r <= 0 && 0 <= hi + r) return ALL;
      continue;
    }
    // n·fsr + n·φ·t ∈ [lo − r, hi + r]
    out.push(...tWhereKtIn(n * phi, lo - r - n * ctx.fsr, hi + r - n * ctx.fsr));
  }
  out.sort((p, q) => p[0] - q[0]);
  const merged: Set1 = [];
  for (const iv of out) {
    const last = merged[merged.length - 1];
    if (last && iv[0] <= last[1]) last[1] = Math.max(last[1], iv[1]);
    else merged.push([iv[0], iv[1]]);
  }
  return merged;
}

/** Where `image-response` holds at the chain's LO: the lowest rejection over u at t meets the requirement. */
function imageHolds(ctx: ChainContext, c: ChannelAtOffset, L: number): Set1 {
  const { ch, geo } = c;
  if (geo === null) return ALL;
  const required = ctx.plan.settings.imageRejectionDB - TOL;
  const at = (t: number) => {
    const problem = channelImageProblem(ctx, ch, envelopeBox(ctx.D, t, t, ctx.phi, ctx.nStar));
    if (!problem) return true;
    return !(worstImage(problem, L, required).rejectionDB < required);
  };
  if (ctx.phi === 0) return at(0) ? ALL : [];
  const probe = channelImageProblem(ctx, ch, ctx.box);
  if (!probe) return ALL;
  // the image band moves against the wanted mode (k) and against the comb mode nearest it (n·φ)
  const nImage = Math.round((2 * L - (probe.xl + probe.xh) / 2) / ctx.fsr);
  const step = stepFor(ch.envelopeStep, Math.max(Math.abs(ctx.box.k), Math.abs(nImage * ctx.phi)));
  // it holds outside the candidate temperatures; inside them, sample and bisect
  let holds: Set1 = [];
  let from = -WINDOW_SPAN_K;
  for (const [a, b] of imageCandidates(ctx, ch, L, probe.xl, probe.xh)) {
    if (a > from) holds.push([from, a]);
    const inside = sampledSet(at, a, b, step);
    holds = holds.concat(inside);
    from = b;
  }
  if (from < WINDOW_SPAN_K) holds.push([from, WINDOW_SPAN_K]);
  // join the pieces that meet
  const joined: Set1 = [];
  for (const iv of holds) {
    const last = joined[joined.length - 1];
    if (last && iv[0] <= last[1]) last[1] = Math.max(last[1], iv[1]);
    else joined.push([iv[0], iv[1]]);
  }
  return joined;
}

const round = (t: number) => Math.round(t / EDGE_K) * EDGE_K;

/**
 * The temperature window of the chain at LO offset L, given the findings of
 * the full check there and the channels' geometry.
 */
export function temperatureWindowAt(
  ctx: ChainContext,
  L: number,
  findings: readonly Finding[],
  channels: readonly ChannelAtOffset[],
): TemperatureWindow {
  const blocked = findings.some((f) => f.severity === "error" && !TEMPERATURE_CODES.includes(f.code));
  if (blocked) return { intervalsK: [], marginK: null };
  let set = ALL;
  if (ctx.phi === 0) {
    // nothing moves with the temperature: the four rules hold everywhere or nowhere, as at the chain's LO
    if (findings.some((f) => f.severity === "error")) set = [];
    return windowOf(ctx, set);
  }
  for (const c of channels) {
    if (set.length === 0) break;
    set = intersectSets(set, modeHolds(ctx, c.ch));
    // an impossible occupied-band filter has no figures (its if-outside-detector error empties the window anyway)
    if (occupiedFilterImpossible(c.ch, c.geo, ctx.D)) continue;
    if (set.length) set = intersectSets(set, centreHolds(ctx, c.ch));
    if (c.geo === null) continue;
    if (set.length) set = intersectSets(set, nedtHolds(ctx, c, L));
    if (set.length && !c.ch.dsb) set = intersectSets(set, imageHolds(ctx, c, L));
  }
  return windowOf(ctx, set);
}

/** The window from the set where every rule holds: edges rounded to 1 mK, and the margin of ±Te. */
function windowOf(ctx: ChainContext, set: Set1): TemperatureWindow {
  const intervalsK: [number, number][] = [];
  for (const [a, b] of set) {
    const lo = round(a) + 0;
    const hi = round(b) + 0;
    if (hi - lo >= EDGE_K / 2) intervalsK.push([lo, hi]);
  }
  if (intervalsK.length === 0) return { intervalsK, marginK: null };
  const Te = ctx.Te;
  let margin = -Infinity;
  for (const [a, b] of intervalsK) margin = Math.max(margin, Math.min(b - Te, -Te - a));
  return { intervalsK, marginK: round(margin) + 0 };
}
