import type { MapModel } from "./map-model";
import { MAP_CODES } from "./map-model";
import { firingSets } from "./map-rules";
import type { WorkCounter } from "./work-counter";

/** Breakpoints closer than this (GHz) are merged (docs/plan-format.md §6.2 "Exact edges"). */
export const MERGE_GHZ = 1e-9;

/** One piece of the reach union with the constant set of firing codes (`CODE_BIT` mask). */
export interface MapPiece {
  lo: number;
  hi: number;
  mask: number;
}

/**
 * Sweep the firing sets of every L-dependent error rule over each merged
 * reach interval: join each code's intervals where they overlap or touch
 * (leaving out what remains 1e-9 GHz long or shorter), sort all interval
 * edges (merging those closer than 1e-9 GHz), and keep, between consecutive breakpoints, the set of codes whose
 * firing sets cover that piece. Consecutive pieces with the same set are
 * joined. Pieces come in increasing L and tile the reach union. `work`
 * counts the work steps of the firing sets.
 */
export function mapPieces(m: MapModel, work?: WorkCounter): MapPiece[] {
  const out: MapPiece[] = [];
  for (const [r0, r1] of m.reach) {
    const sets = firingSets(m, r0, r1, work);
    // per code, the union's edges in increasing order: from, to, from, to, …
    const runs: number[][] = [];
    let total = 0;
    for (let i = 0; i < MAP_CODES.length; i++) {
      const code = MAP_CODES[i] as (typeof MAP_CODES)[number];
      const run: number[] = [];
      runs.push(run);
      // union of this code's firing intervals first: far fewer events to sort.
      // Starts and ends are sorted separately (native typed-array sorts); the
      // union is where the count of open intervals is positive, and an end
      // equal to a start joins the two (starts are taken first).
      const list = sets[code];
      const starts = list.length > 64 ? new Float64Array(list.length) : new Array<number>(list.length);
      const ends = list.length > 64 ? new Float64Array(list.length) : new Array<number>(list.length);
      let k = 0;
      for (const iv of list) {
        const lo = Math.max(iv[0], r0);
        const hi = Math.min(iv[1], r1);
        if (!(hi > lo)) continue;
        starts[k] = lo;
        ends[k] = hi;
        k++;
      }
      // typed arrays sort numerically without a comparator; short plain arrays need one
      const byValue = (x: number, y: number) => x - y;
      const st = starts instanceof Float64Array ? starts.subarray(0, k).sort() : starts.slice(0, k).sort(byValue);
      const en = ends instanceof Float64Array ? ends.subarray(0, k).sort() : ends.slice(0, k).sort(byValue);
      let a = 0;
      let b = 0;
      let open = 0;
      let from = 0;
      while (b < k) {
        if (a < k && (st[a] as number) <= (en[b] as number)) {
          if (open === 0) from = st[a] as number;
          open++;
          a++;
        } else {
          open--;
          // a run no longer than the merging distance is dropped (after joining the pieces it is made of)
          if (open === 0 && (en[b] as number) - from > MERGE_GHZ) run.push(from, en[b] as number);
          b++;
        }
      }
      total += run.length;
    }
    // merge the sorted runs into one increasing event list (the order of equal
    // edges does not matter: a group of edges is applied as a whole below)
    const xs = new Float64Array(total);
    const ds = new Int32Array(total); // +(index+1) for an opening, −(index+1) for a closing
    const at = new Int32Array(runs.length);
    for (let e = 0; e < total; e++) {
      let pick = -1;
      let best = 0;
      for (let i = 0; i < runs.length; i++) {
        const run = runs[i] as number[];
        const j = at[i] as number;
        if (j < run.length && (pick < 0 || (run[j] as number) < best)) {
          pick = i;
          best = run[j] as number;
        }
      }
      const j = at[pick] as number;
      xs[e] = best;
      ds[e] = j % 2 === 0 ? pick + 1 : -(pick + 1);
      at[pick] = j + 1;
    }
    const counts = new Int32Array(MAP_CODES.length);
    let mask = 0;
    let cur = r0;
    let k = 0;
    const emit = (lo: number, hi: number) => {
      const last = out[out.length - 1];
      if (last && last.mask === mask && last.hi === lo) last.hi = hi;
      else out.push({ lo, hi, mask });
    };
    while (true) {
      // apply the group of events at `cur` (chained within MERGE_GHZ)
      let lastX = cur;
      while (k < total && (xs[k] as number) - lastX < MERGE_GHZ) {
        lastX = Math.max(lastX, xs[k] as number);
        const d = ds[k] as number;
        const i = Math.abs(d) - 1;
        counts[i] = (counts[i] as number) + (d > 0 ? 1 : -1);
        if (counts[i]! > 0) mask |= 1 << i;
        else mask &= ~(1 << i);
        k++;
      }
      const next = k < total ? Math.min(xs[k] as number, r1) : r1;
      if (r1 - next < MERGE_GHZ || next <= cur) {
        if (r1 > cur) emit(cur, r1);
        break;
      }
      emit(cur, next);
      cur = next;
    }
  }
  return out;
}
