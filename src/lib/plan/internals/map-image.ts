import { combDistanceAtLevel, combIntegralK, combK, combResponse } from "./comb";
import type { MapChannel, MapModel } from "./map-model";
import { type WorkCounter, countSteps } from "./work-counter";

/**
 * The image rule for the feasibility map (plan-format.md, "Derived
 * quantities (per channel)", Image, and "Feasibility map and place"). The
 * comb integrals and the comb's inverse are the engine's closed forms
 * (internals/comb.ts), so the map and the per-offset findings use the
 * same numbers.
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
 * Most grid points evaluated on one piece. Only absurd inputs (a piece
 * millions of linewidths long inside an image window) reach it; the step
 * is then coarser than min(δ, B)/16.
 */
export const MAX_GRID_POINTS = 2_000_000;

/** Most mode windows enumerated; beyond it the whole range is searched. */
const MAX_WINDOWS = 10_000;

/**
 * The L windows inside [lo, hi] where the image rule can fire for an SSB
 * channel: `X'` must meet `±rfInput` (elsewhere `∫Wᵢ = 0`) and come within
 * `r` of a mode centre, where `C(r) = 10^(−threshold/10)·∫W/B`
 * (since `∫Wᵢ ≤ B·max C` over `X'`). Sorted and merged. Each mode window
 * enumerated is one work step (`work`).
 */
export function imageWindows(
  c: Comb,
  m: MapModel,
  ch: MapChannel,
  lo: number,
  hi: number,
  work?: WorkCounter,
): [number, number][] {
  const band = ch.bands[0];
  if (!band) return [];
  const [xl, xh] = band;
  const level = Math.pow(10, -m.imageRejectionDB / 10) * (ch.wantedIntegral / ch.widthGHz);
  const r = combRadius(c, level);
  if (r < 0) return [];
  const out: [number, number][] = [];
  for (const [e1, e2] of [
    [-m.rfMax, -m.rfMin],
    [m.rfMin, m.rfMax],
  ] as const) {
    // X' = [2L − xh, 2L − xl] meets [e1, e2]
    const a = Math.max(lo, (e1 + xl) / 2);
    const b = Math.min(hi, (e2 + xh) / 2);
    if (!(b > a)) continue;
    const nFirst = Math.ceil((e1 - r) / c.fsr);
    const nLast = Math.floor((e2 + r) / c.fsr);
    if (r >= c.fsr / 2 || !(nLast - nFirst < MAX_WINDOWS)) {
      out.push([a, b]);
      continue;
    }
    countSteps(work, nLast - nFirst + 1);
    for (let n = nFirst; n <= nLast; n++) {
      // X' within r of n·fsr: 2L − xh ≤ n·fsr + r and 2L − xl ≥ n·fsr − r
      const wlo = Math.max(a, (n * c.fsr - r + xl) / 2);
      const whi = Math.min(b, (n * c.fsr + r + xh) / 2);
      if (whi > wlo) out.push([wlo, whi]);
    }
  }
  out.sort((p, q) => p[0] - q[0]);
  const merged: [number, number][] = [];
  for (const w of out) {
    const last = merged[merged.length - 1];
    if (last && w[0] <= last[1]) last[1] = Math.max(last[1], w[1]);
    else merged.push(w);
  }
  return merged;
}

/**
 * Bisection bracket width for an image-rule map edge (GHz). Where doubles
 * near L are spaced wider than this, the bisection ends when the midpoint
 * rounds to an end (ADR 005).
 */
export const IMAGE_EDGE_BRACKET = 1e-6;

/**
 * The L intervals inside `[lo, hi]` (a piece of the reach outside the
 * channel's band) where the image rule fires for an SSB channel, by the
 * contract's procedure (plan-format.md, "Feasibility map and place"): only
 * the windows where `X'` comes within `r` of a mode centre are searched;
 * each window is split at the kinks where `X'` crosses a `±rfInput` edge;
 * on each piece the rule is evaluated on a grid of step ≤ min(δ, B)/16, and
 * every change of state between neighbouring grid points is bisected to
 * 1e-6 GHz (the edge is the midpoint of the final bracket).
 *
 * The grid outcome is found without evaluating every grid point: between
 * the kinks, `∫Wᵢ(L)` changes only through the two moving edges of `X'`,
 * `d∫Wᵢ/dL = 2·(C(2L − x_l) − C(2L − x_h))` (terms absent where an edge is
 * held by an rfInput edge), and the comb satisfies `C(u) = C(v)` only when
 * `u ± v` is a multiple of fsr. So `∫Wᵢ` — hence the rule's state — is
 * monotone between the points where the centre of `X'` is a multiple of
 * fsr/2, `L = (n·fsr + x_l + x_h)/4`. On each monotone run of grid points
 * the state changes at most once: compare the run's ends and binary-search
 * the grid for the change. The changes found are exactly those a point-by-
 * point scan of the same grid finds.
 *
 * Work steps (`work`): the mode windows, every evaluation of the rule
 * (grid points and bisection steps) and every monotone split point.
 */
export function imageFiringIntervals(
  c: Comb,
  m: MapModel,
  ch: MapChannel,
  lo: number,
  hi: number,
  work?: WorkCounter,
): [number, number][] {
  const band = ch.bands[0];
  if (!band || !ch.ssb || !(hi > lo)) return [];
  const [xl, xh] = band;
  const B = ch.widthGHz;
  const windows = imageWindows(c, m, ch, lo, hi, work);
  const kinks: number[] = [];
  for (const e of [m.rfMin, m.rfMax, -m.rfMin, -m.rfMax]) kinks.push((e + xh) / 2, (e + xl) / 2);
  const step = Math.min(m.linewidth, B) / 16;
  const gridCount = (p: number, q: number) => Math.min(MAX_GRID_POINTS, Math.max(1, Math.ceil((q - p) / step)));
  const firesAt = makeImageFires(c, m, ch);
  let steps = 0;
  const fires = (L: number): boolean => {
    steps++;
    return firesAt(L);
  };
  const out: [number, number][] = [];
  const push = (a: number, b: number) => {
    if (!(b > a)) return;
    const last = out[out.length - 1];
    if (last && a <= last[1]) last[1] = Math.max(last[1], b);
    else out.push([a, b]);
  };
  const quarter = c.fsr / 4;
  const centreSum = (xl + xh) / 4;
  for (const [wlo, whi] of windows) {
    const cuts = [wlo, ...kinks.filter((k) => k > wlo && k < whi).sort((p, q) => p - q), whi];
    for (let i = 0; i + 1 < cuts.length; i++) {
      const p = cuts[i] as number;
      const q = cuts[i + 1] as number;
      const n = gridCount(p, q);
      const gridL = (j: number) => (j === n ? q : p + ((q - p) * j) / n);
      // the last two grid states are remembered (run ends are read twice)
      let j1 = -1;
      let v1 = false;
      let j2 = -1;
      let v2 = false;
      const state = (j: number): boolean => {
        if (j === j1) return v1;
        if (j === j2) return v2;
        const v = fires(gridL(j));
        j2 = j1;
        v2 = v1;
        j1 = j;
        v1 = v;
        return v;
      };
      // runs of grid indices between the monotone split points
      const splits: number[] = [];
      const kFirst = Math.ceil((p - centreSum) / quarter);
      const kLast = Math.floor((q - centreSum) / quarter);
      if (!(kLast - kFirst < n)) {
        // more monotone runs than grid points (fsr far below the grid step): every grid point is its own run
        steps += n;
        for (let j = 0; j < n; j++) splits.push(j);
      } else {
        if (kLast >= kFirst) steps += kLast - kFirst + 1;
        for (let k = kFirst; k <= kLast; k++) {
          const Lk = k * quarter + centreSum;
          if (Lk > p && Lk < q) {
            const j = Math.min(n - 1, Math.floor(((Lk - p) / (q - p)) * n));
            if (splits[splits.length - 1] !== j) splits.push(j);
          }
        }
      }
      const changes: number[] = []; // t: state(t) ≠ state(t + 1)
      let ja = 0;
      for (const jb of [...splits, n]) {
        if (jb > ja && state(ja) !== state(jb)) {
          let a = ja;
          let b = jb;
          const s0 = state(ja);
          while (b - a > 1) {
            const mid = (a + b) >> 1;
            if (state(mid) === s0) a = mid;
            else b = mid;
          }
          changes.push(a);
        }
        if (jb < n && state(jb) !== state(jb + 1)) changes.push(jb);
        ja = jb + 1;
      }
      let openAt: number | null = state(0) ? p : null;
      for (const t of changes) {
        let a = gridL(t);
        let b = gridL(t + 1);
        const before = state(t);
        while (b - a > IMAGE_EDGE_BRACKET) {
          const mid = (a + b) / 2;
          // far from 0 (|L| above about 1e10 GHz) neighbouring doubles are more than the bracket
          // apart: the midpoint is an end, and the edge (the bracket's midpoint) is that end
          if (mid === a || mid === b) break;
          if (fires(mid) === before) a = mid;
          else b = mid;
        }
        const edge = (a + b) / 2;
        if (before) {
          if (openAt !== null) push(openAt, edge);
          openAt = null;
        } else openAt = edge;
      }
      if (openAt !== null) push(openAt, q);
    }
  }
  countSteps(work, steps);
  return out;
}

/**
 * The same firing intervals by the plain procedure: every grid point of
 * every piece evaluated (the reference the fast search is tested against).
 */
export function imageFiringIntervalsByScan(
  c: Comb,
  m: MapModel,
  ch: MapChannel,
  lo: number,
  hi: number,
): [number, number][] {
  const band = ch.bands[0];
  if (!band || !ch.ssb || !(hi > lo)) return [];
  const [xl, xh] = band;
  const B = ch.widthGHz;
  const windows = imageWindows(c, m, ch, lo, hi);
  const kinks: number[] = [];
  for (const e of [m.rfMin, m.rfMax, -m.rfMin, -m.rfMax]) kinks.push((e + xh) / 2, (e + xl) / 2);
  const step = Math.min(m.linewidth, B) / 16;
  const gridCount = (p: number, q: number) => Math.min(MAX_GRID_POINTS, Math.max(1, Math.ceil((q - p) / step)));
  const fires = (L: number) => imageFires(c, m, ch, L);
  const out: [number, number][] = [];
  const push = (a: number, b: number) => {
    if (!(b > a)) return;
    const last = out[out.length - 1];
    if (last && a <= last[1]) last[1] = Math.max(last[1], b);
    else out.push([a, b]);
  };
  for (const [wlo, whi] of windows) {
    const cuts = [wlo, ...kinks.filter((k) => k > wlo && k < whi).sort((p, q) => p - q), whi];
    for (let i = 0; i + 1 < cuts.length; i++) {
      const p = cuts[i] as number;
      const q = cuts[i + 1] as number;
      const n = gridCount(p, q);
      let prevL = p;
      let prev = fires(p);
      let openAt: number | null = prev ? p : null;
      for (let j = 1; j <= n; j++) {
        const L = j === n ? q : p + ((q - p) * j) / n;
        const now = fires(L);
        if (now !== prev) {
          let a = prevL;
          let b = L;
          while (b - a > IMAGE_EDGE_BRACKET) {
            const mid = (a + b) / 2;
            // far from 0 (|L| above about 1e10 GHz) neighbouring doubles are more than the bracket
            // apart: the midpoint is an end, and the edge (the bracket's midpoint) is that end
            if (mid === a || mid === b) break;
            if (fires(mid) === prev) a = mid;
            else b = mid;
          }
          const edge = (a + b) / 2;
          if (now) openAt = edge;
          else if (openAt !== null) {
            push(openAt, edge);
            openAt = null;
          }
        }
        prev = now;
        prevL = L;
      }
      if (openAt !== null) push(openAt, q);
    }
  }
  return out;
}
