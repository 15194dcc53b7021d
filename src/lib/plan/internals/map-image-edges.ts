import { type Comb, imageFires, imageWindows, makeImageFires } from "./map-image";
import type { MapChannel, MapModel } from "./map-model";
import { type WorkCounter, countSteps } from "./work-counter";

/**
 * The edges of the image rule's firing set for the feasibility map
 * (docs/plan-format.md §6.3 "The image rule"): the fast grid search the
 * map uses and, beside it, the plain scan of the same grid it is tested
 * against. The comb and the rule itself are in `map-image.ts`.
 */

/**
 * Most grid points evaluated on one piece. Only absurd inputs (a piece
 * millions of linewidths long inside an image window) reach it; the step
 * is then coarser than min(δ, B)/16.
 */
export const MAX_GRID_POINTS = 2_000_000;

/**
 * Bisection bracket width for an image-rule map edge (GHz). Where doubles
 * near L are spaced wider than this, the bisection ends when the midpoint
 * rounds to an end (ADR 018).
 */
export const IMAGE_EDGE_BRACKET = 1e-6;

/**
 * The L intervals inside `[lo, hi]` (a piece of the reach outside the
 * channel's band) where the image rule fires for an SSB channel, by the
 * procedure of docs/plan-format.md §6.3 "The image rule": only
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
  // evaluations are counted only when a counter is passed (the map's hot path stays a direct call)
  const fires =
    work === undefined
      ? firesAt
      : (L: number): boolean => {
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
