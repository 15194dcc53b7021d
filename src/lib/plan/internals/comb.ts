/**
 * The whole comb of resonator modes, `C(x) = Σₙ Mₙ(x)` over every integer n,
 * in closed form (docs/plan-format.md §3.1 "Per chain"):
 * `C(x) = π·a·sinh(2πa) / (cosh(2πa) − cos(2πx/fsr))`, `a = δ/(2·fsr)`.
 * This is the Mittag-Leffler / Poisson sum of Lorentzians (the Airy-type
 * function of a Fabry-Perot comb; see Gradshteyn & Ryzhik 1.445.2 for
 * `Σ 1/(n² + a²)`-type sums).
 *
 * Written with `cosh(2πa) − cos θ = 2(sinh²(πa) + sin²(θ/2))` to avoid
 * cancellation near a mode.
 */

export interface Comb {
  fsr: number;
  delta: number;
}

/** `a = δ/(2·fsr)`. */
export function combA(comb: Comb): number {
  return comb.delta / (2 * comb.fsr);
}

/** `C(x)`, the summed power response of every mode of the comb. */
export function combResponse(x: number, comb: Comb): number {
  const a = combA(comb);
  const pa = Math.PI * a;
  if (pa > 300) return pa; // sinh·cosh/(sinh² + s²) = 1 to double precision
  const sh = Math.sinh(pa);
  const s = Math.sin((Math.PI * x) / comb.fsr);
  return (pa * sh * Math.cosh(pa)) / (sh * sh + s * s);
}

/** Peak of the comb, `C(n·fsr) = π·a·coth(πa)`. */
export function combPeak(comb: Comb): number {
  const pa = Math.PI * combA(comb);
  return pa > 300 ? pa : pa / Math.tanh(pa);
}

/**
 * `∫_{x1}^{x2} C(x) dx` in closed form. The antiderivative on the period of
 * mode n is `(δ/2)·(π·n + atan(coth(πa)·tan θ))`, `θ = π(x − n·fsr)/fsr`
 * (from `∫dθ/(A − B cos θ)`, Gradshteyn & Ryzhik 2.553.3); every full
 * period contributes `π·δ/2`. Differences of arctangents are taken with
 * `atan2` forms that do not cancel.
 */
export function combIntegral(x1: number, x2: number, comb: Comb): number {
  return combIntegralK(x1, x2, comb.fsr, comb.delta, combK(comb.fsr, comb.delta));
}

/** `K = coth(πa)` of `combIntegral` (1 where it equals 1 to double precision). */
export function combK(fsr: number, delta: number): number {
  const pa = Math.PI * (delta / (2 * fsr));
  return pa > 300 ? 1 : 1 / Math.tanh(pa);
}

/**
 * `combIntegral` with `K = combK(fsr, delta)` computed once by the caller
 * (the map evaluates the integral many times for one comb); the same
 * arithmetic, so the same numbers.
 */
export function combIntegralK(x1: number, x2: number, fsr: number, delta: number, K: number): number {
  if (x2 <= x1) return 0;
  const n1 = Math.round(x1 / fsr);
  const n2 = Math.round(x2 / fsr);
  const t1 = (Math.PI * (x1 - n1 * fsr)) / fsr;
  const t2 = (Math.PI * (x2 - n2 * fsr)) / fsr;
  const c1 = Math.cos(t1);
  const s1 = Math.sin(t1);
  const c2 = Math.cos(t2);
  const s2 = Math.sin(t2);
  let angle: number;
  if (n1 === n2) {
    // atan(K tan t2) − atan(K tan t1) = atan2(K·sin(t2 − t1), c1c2 + K²s1s2)
    angle = Math.atan2(K * Math.sin((Math.PI * (x2 - x1)) / fsr), c1 * c2 + K * K * s1 * s2);
  } else {
    // up to the end of period n1, whole periods, then from the start of period n2
    const head = Math.atan2(c1, K * s1); // π/2 − atan(K tan t1)
    const tail = Math.atan2(c2, -K * s2); // π/2 + atan(K tan t2)
    angle = head + (n2 - n1 - 1) * Math.PI + tail;
  }
  return (delta / 2) * angle;
}

/**
 * Distance `r ≥ 0` from the nearest mode centre at which the comb falls to
 * `level`: `sin²(πr/fsr) = π·a·sinh(πa)·cosh(πa)/level − sinh²(πa)`.
 * Returns 0 when `level` is at or above the peak, and `Infinity` when the
 * comb stays above `level` everywhere (then every offset is a candidate).
 */
export function combDistanceAtLevel(level: number, comb: Comb): number {
  if (!(level > 0)) return Infinity;
  const pa = Math.PI * combA(comb);
  if (level >= combPeak(comb)) return 0;
  if (pa > 300) return Infinity;
  const sh = Math.sinh(pa);
  const s2 = (pa * sh * Math.cosh(pa)) / level - sh * sh;
  if (s2 >= 1) return Infinity;
  return (comb.fsr / Math.PI) * Math.asin(Math.sqrt(Math.max(0, s2)));
}
