import type { Interval } from "./intervals";
import { TOL } from "./tolerance";

/**
 * Nyquist folding of a sampled IF (docs/plan-format.md §5.4 "Folding with
 * a sample rate"): with `h = fs/2`, zone `z = floor(f/h)`; even zones shift
 * down by `z·h`, odd zones mirror to `(z+1)·h − f`. Zones are numbered from
 * 0 here (findings report the 1-based zone `z + 1`, as in §5.4).
 */
export function nyquistZone(f: number, sampleRateGHz: number): number {
  return Math.floor(f / (sampleRateGHz / 2));
}

/** The folded frequency of `f ≥ 0` in `[0, fs/2]`. */
export function foldFrequency(f: number, sampleRateGHz: number): number {
  const h = sampleRateGHz / 2;
  const z = Math.floor(f / h);
  const r = f - z * h;
  return z % 2 === 0 ? r : h - r;
}

/**
 * The image of `[lo, hi]` (lo ≥ 0) under the fold: one interval; a band that
 * crosses a zone edge reaches 0 (even multiple of h) or `fs/2` (odd multiple).
 */
export function foldInterval(iv: Interval, sampleRateGHz: number): Interval {
  const h = sampleRateGHz / 2;
  const a = foldFrequency(iv[0], sampleRateGHz);
  const b = foldFrequency(iv[1], sampleRateGHz);
  let lo = Math.min(a, b);
  let hi = Math.max(a, b);
  const kFirst = Math.floor(iv[0] / h) + 1;
  const kLast = Math.ceil(iv[1] / h) - 1;
  if (kLast - kFirst >= 1) return [0, h];
  if (kLast === kFirst) {
    if (kFirst % 2 === 0) lo = 0;
    else hi = h;
  }
  return [lo, hi];
}

/**
 * A multiple `k·fs/2` (k ≥ 1) strictly inside the interval, beyond the 1e-9
 * allowance; null when there is none.
 */
export function interiorNyquistEdge(iv: Interval, sampleRateGHz: number): number | null {
  const h = sampleRateGHz / 2;
  const k = Math.max(1, Math.floor((iv[0] + TOL) / h) + 1);
  const edge = k * h;
  return edge > iv[0] + TOL && edge < iv[1] - TOL ? edge : null;
}
