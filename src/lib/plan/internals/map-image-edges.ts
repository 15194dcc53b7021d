import { type EnvelopeBox, isPointBox } from "./envelope-box";
import { type Comb, imageFires, imageWindows, makeEnvelopeImageFires, makeImageFires } from "./map-image";
import type { MapChannel, MapModel } from "./map-model";
import { type WorkCounter, countSteps } from "./work-counter";

// (Longer than most files: the fast search and the plain scan it is tested against share their geometry and are kept side by side.)
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
 * Where the search looks, for a channel over an envelope box (the nominal
 * point when `box` is left out): the received band, the piece of `[lo, hi]`
 * the rule can apply on (an occupied-band filter is impossible within D of
 * the band), the kinks where an edge of the image band crosses an rfInput
 * edge (zones of half-width D/2 in L: the image band moves with the LO
 * shift), and the half-width of the zones around the points where the
 * centre of the image band is a multiple of fsr/2 (D/2, and the comb's
 * motion `|k·φ|·max|t|/4` for the k-th such point).
 */
interface SearchGeometry {
  xl: number;
  xh: number;
  lo: number;
  hi: number;
  /** Kink zones [from, to] (points for the nominal rule). */
  kinks: [number, number][];
  /** Half-width of the split zone of the k-th monotone split point. */
  splitHalfWidth: (k: number) => number;
  moving: boolean;
}

function searchGeometry(m: MapModel, ch: MapChannel, lo: number, hi: number, box?: EnvelopeBox): SearchGeometry {
  const band = ch.bands[0] as [number, number];
  const moving = box !== undefined && !isPointBox(box);
  const D = moving ? box.D : 0;
  const w = moving && ch.occupied ? D : 0;
  const xl = w === 0 ? band[0] : band[0] - w;
  const xh = w === 0 ? band[1] : band[1] + w;
  let a = lo;
  let b = hi;
  if (w > 0) {
    // no image figure where the occupied band would reach 0 GHz (slot.lo ≤ D)
    if (hi <= band[0]) b = Math.min(hi, band[0] - D);
    else if (lo >= band[1]) a = Math.max(lo, band[1] + D);
  }
  const kinks: [number, number][] = [];
  for (const e of [m.rfMin, m.rfMax, -m.rfMin, -m.rfMax]) {
    kinks.push([(e + xh - D) / 2, (e + xh + D) / 2], [(e + xl - D) / 2, (e + xl + D) / 2]);
  }
  const tMax = moving ? Math.max(Math.abs(box.tLo), Math.abs(box.tHi)) : 0;
  const phi = moving ? Math.abs(box.phi) : 0;
  return { xl, xh, lo: a, hi: b, kinks, splitHalfWidth: (k) => D / 2 + (Math.abs(k) * phi * tMax) / 4, moving };
}

/** The cuts of a window at the kink zones' ends (increasing, without repeats), and whether each piece lies in a zone. */
function windowPieces(g: SearchGeometry, wlo: number, whi: number): { p: number; q: number; inZone: boolean }[] {
  const pts: number[] = [];
  for (const [k1, k2] of g.kinks) {
    if (k1 > wlo && k1 < whi) pts.push(k1);
    if (k2 !== k1 && k2 > wlo && k2 < whi) pts.push(k2);
  }
  pts.sort((x, y) => x - y);
  const cuts = [wlo];
  for (const x of pts) if (x !== cuts[cuts.length - 1]) cuts.push(x);
  if (whi !== cuts[cuts.length - 1]) cuts.push(whi);
  const out: { p: number; q: number; inZone: boolean }[] = [];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const p = cuts[i] as number;
    const q = cuts[i + 1] as number;
    const mid = (p + q) / 2;
    out.push({ p, q, inZone: g.moving && g.kinks.some(([k1, k2]) => mid > k1 && mid < k2) });
  }
  return out;
}

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
  box?: EnvelopeBox,
): [number, number][] {
  const band = ch.bands[0];
  if (!band || !ch.ssb || !(hi > lo)) return [];
  const g = searchGeometry(m, ch, lo, hi, box);
  if (!(g.hi > g.lo)) return [];
  const B = ch.widthGHz;
  const windows = imageWindows(c, m, ch, g.lo, g.hi, work, box);
  const step = Math.min(m.linewidth, B) / 16;
  const gridCount = (p: number, q: number) => Math.min(MAX_GRID_POINTS, Math.max(1, Math.ceil((q - p) / step)));
  const firesAt = box === undefined ? makeImageFires(c, m, ch) : makeEnvelopeImageFires(c, m, ch, box, true);
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
  const centreSum = (g.xl + g.xh) / 4;
  // the piece being searched and the grid on it (the helpers below are made once, not per piece)
  let p = 0;
  let q = 0;
  let n = 1;
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
  const indexOf = (L: number) => Math.min(n - 1, Math.floor(((L - p) / (q - p)) * n));
  for (const [wlo, whi] of windows) {
    for (const piece of windowPieces(g, wlo, whi)) {
      p = piece.p;
      q = piece.q;
      n = gridCount(p, q);
      j1 = -1;
      j2 = -1;
      // runs of grid indices between the monotone split points (every grid point of a split zone,
      // and of a piece inside a kink zone, is its own run)
      const splits: number[] = [];
      const widest = g.moving
        ? g.splitHalfWidth(Math.ceil((Math.max(Math.abs(p), Math.abs(q)) + Math.abs(centreSum)) / quarter) + 1)
        : 0;
      const kFirst = Math.ceil((p - widest - centreSum) / quarter);
      const kLast = Math.floor((q + widest - centreSum) / quarter);
      if (piece.inZone || !(kLast - kFirst < n)) {
        // more monotone runs than grid points (fsr far below the grid step), or inside a kink zone:
        // every grid point is its own run
        steps += n;
        for (let j = 0; j < n; j++) splits.push(j);
      } else {
        if (kLast >= kFirst) steps += kLast - kFirst + 1;
        for (let k = kFirst; k <= kLast; k++) {
          const Lk = k * quarter + centreSum;
          if (!g.moving) {
            if (Lk > p && Lk < q) {
              const j = indexOf(Lk);
              if (splits[splits.length - 1] !== j) splits.push(j);
            }
            continue;
          }
          const hw = g.splitHalfWidth(k);
          const zl = Math.max(p, Lk - hw);
          const zh = Math.min(q, Lk + hw);
          if (!(zh >= zl) || zh <= p || zl >= q) continue;
          for (let j = Math.max(0, indexOf(zl)); j <= indexOf(zh); j++) {
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
  box?: EnvelopeBox,
): [number, number][] {
  const band = ch.bands[0];
  if (!band || !ch.ssb || !(hi > lo)) return [];
  const g = searchGeometry(m, ch, lo, hi, box);
  if (!(g.hi > g.lo)) return [];
  const B = ch.widthGHz;
  const windows = imageWindows(c, m, ch, g.lo, g.hi, undefined, box);
  const step = Math.min(m.linewidth, B) / 16;
  const gridCount = (p: number, q: number) => Math.min(MAX_GRID_POINTS, Math.max(1, Math.ceil((q - p) / step)));
  const fires =
    box === undefined ? (L: number) => imageFires(c, m, ch, L) : makeEnvelopeImageFires(c, m, ch, box, true);
  const out: [number, number][] = [];
  const push = (a: number, b: number) => {
    if (!(b > a)) return;
    const last = out[out.length - 1];
    if (last && a <= last[1]) last[1] = Math.max(last[1], b);
    else out.push([a, b]);
  };
  for (const [wlo, whi] of windows) {
    for (const { p, q } of windowPieces(g, wlo, whi)) {
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
