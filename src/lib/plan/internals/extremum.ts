/**
 * Extrema of a smooth function of one variable over a closed interval, to
 * the precision of the argument (docs/plan-format.md §12.4 "Worst values
 * over the box"): the interval is scanned in equal steps no longer than a
 * given scale (chosen so that no extremum hides between two samples), and
 * every sample that is lowest among its neighbours is refined by Brent's
 * method (R. P. Brent, *Algorithms for Minimization
 * without Derivatives*, Prentice-Hall, 1973, ch. 5: golden-section search
 * with parabolic steps) inside the two steps around it. The ends of the
 * interval are candidates themselves.
 */

/** Refinement stops when the bracket is this narrow (in the unit of the argument). */
export const ARG_TOL = 1e-9;

/**
 * Most scan samples of one search. Only an envelope more than about 250
 * linewidths wide reaches it (docs/decisions/022); the step is then
 * coarser than asked.
 */
export const MAX_SCAN_SAMPLES = 4096;

export interface Extremum {
  x: number;
  /** f(x). */
  fx: number;
}

/** Two values count as equal extrema when they differ by this relative amount or less (the smaller argument wins). */
const TIE = 1e-12;

function better(a: Extremum, b: Extremum): Extremum {
  if (a.fx === b.fx) return a.x <= b.x ? a : b;
  if (!Number.isFinite(a.fx) || !Number.isFinite(b.fx)) return a.fx < b.fx ? a : b;
  const scale = Math.max(Math.abs(a.fx), Math.abs(b.fx));
  if (Math.abs(a.fx - b.fx) <= TIE * scale) return a.x <= b.x ? a : b;
  return a.fx < b.fx ? a : b;
}

const GOLD = 0.3819660112501051; // (3 − √5)/2

/**
 * Brent's minimiser of f on [a, b] (Brent 1973, procedure `localmin`),
 * starting from the interior point x0 with value f0. Returns the best point
 * seen. Stops when the bracket is below `ARG_TOL` (plus a relative
 * allowance for large arguments), or at once when a value below
 * `stopBelow` is found.
 */
export function brentMinimise(
  f: (x: number) => number,
  a: number,
  b: number,
  x0: number,
  f0: number,
  stopBelow = -Infinity,
): Extremum {
  let x = x0;
  let w = x0;
  let v = x0;
  let fx = f0;
  let fw = f0;
  let fv = f0;
  let d = 0;
  let e = 0;
  for (let iter = 0; iter < 100; iter++) {
    const m = 0.5 * (a + b);
    const tol = ARG_TOL * 0.5 + 1e-15 * Math.abs(x);
    const t2 = 2 * tol;
    if (Math.abs(x - m) <= t2 - 0.5 * (b - a) || fx < stopBelow) break;
    let p = 0;
    let q = 0;
    let r = 0;
    if (Math.abs(e) > tol) {
      r = (x - w) * (fx - fv);
      q = (x - v) * (fx - fw);
      p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      r = e;
      e = d;
    }
    if (Math.abs(p) < Math.abs(0.5 * q * r) && p > q * (a - x) && p < q * (b - x)) {
      // parabolic step
      d = p / q;
      const u = x + d;
      if (u - a < t2 || b - u < t2) d = x < m ? tol : -tol;
    } else {
      e = (x < m ? b : a) - x;
      d = GOLD * e;
    }
    const u = Math.abs(d) >= tol ? x + d : x + (d > 0 ? tol : -tol);
    const fu = f(u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
  return { x, fx };
}

export interface MinimiseOptions {
  /** Stop as soon as a value below this is found (the result is then that value, not the minimum). */
  stopBelow?: number;
}

/**
 * The minimum of f over [a, b] (a ≤ b): scan with `ceil((b − a)/step)`
 * equal steps (at least one; at most `MAX_SCAN_SAMPLES`), then refine
 * every sample that is no higher than its neighbours by Brent's method
 * between those neighbours. Equal minima go to the smaller argument.
 * Non-finite values are allowed (+∞ is never a minimum unless every value
 * is +∞).
 */
export function minimise(
  f: (x: number) => number,
  a: number,
  b: number,
  step: number,
  options: MinimiseOptions = {},
): Extremum {
  const stop = options.stopBelow ?? -Infinity;
  if (!(b > a)) {
    const fa = f(a);
    return { x: a, fx: fa };
  }
  const n = Math.min(MAX_SCAN_SAMPLES, Math.max(1, Math.ceil((b - a) / step)));
  // (short scans are the common case: plain arrays allocate less than typed ones)
  const xs: number[] | Float64Array = n < 64 ? new Array<number>(n + 1) : new Float64Array(n + 1);
  const fs: number[] | Float64Array = n < 64 ? new Array<number>(n + 1) : new Float64Array(n + 1);
  for (let i = 0; i <= n; i++) {
    const x = i === n ? b : a + ((b - a) * i) / n;
    xs[i] = x;
    const fx = f(x);
    fs[i] = fx;
    if (fx < stop) return { x, fx };
  }
  let bi = 0;
  for (let i = 1; i <= n; i++) {
    const fi = fs[i]!;
    const fb = fs[bi]!;
    if (fi === fb) continue; // equal: the smaller argument (the earlier sample) stays
    if (!Number.isFinite(fi) || !Number.isFinite(fb)) {
      if (fi < fb) bi = i;
    } else if (Math.abs(fi - fb) > TIE * Math.max(Math.abs(fi), Math.abs(fb)) && fi < fb) bi = i;
  }
  let best: Extremum = { x: xs[bi]!, fx: fs[bi]! };
  for (let i = 0; i <= n; i++) {
    const fi = fs[i]!;
    const left = i > 0 ? fs[i - 1]! : Infinity;
    const right = i < n ? fs[i + 1]! : Infinity;
    if (!(fi <= left && fi <= right) || !Number.isFinite(fi)) continue;
    const lo = i > 0 ? xs[i - 1]! : xs[0]!;
    const hi = i < n ? xs[i + 1]! : xs[n]!;
    const end = i === 0 || i === n;
    if (end) {
      // an end sample: it is the minimum of its step unless the function falls just inside it
      const h = (hi - lo) * 1e-6;
      const probe = i === 0 ? lo + h : hi - h;
      const fp = f(probe);
      if (fp < stop) return { x: probe, fx: fp };
      if (!(fp < fi)) continue;
    }
    const start = end ? 0.5 * (lo + hi) : xs[i]!;
    const fStart = end ? f(start) : fi;
    if (fStart < stop) return { x: start, fx: fStart };
    const r = brentMinimise(f, lo, hi, start, fStart, stop);
    best = better(best, r);
    if (best.fx < stop) return best;
  }
  return best;
}

/** The maximum of f over [a, b], as `minimise` of −f (equal maxima go to the smaller argument). */
export function maximise(f: (x: number) => number, a: number, b: number, step: number): Extremum {
  const r = minimise((x) => -f(x), a, b, step);
  return { x: r.x, fx: -r.fx };
}
