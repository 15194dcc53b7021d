/**
 * Lorentzian mode response and its closed-form integrals
 * (docs/plan-format.md §3.1 and §3.2; the Lorentzian line shape of a
 * resonator mode, e.g. Saleh & Teich, Fundamentals of Photonics, ch. 10).
 *
 * `M(x) = 1 / (1 + (2(x − x0)/δ)²)` with FWHM δ. With `u = 2(x − x0)/δ`,
 * `∫M dx = (δ/2)·atan u` and `∫M² dx = (δ/2)·(u/(1+u²) + atan u)/2`.
 */

/** Power response of one mode centred at `x0` with FWHM `delta`. */
export function lorentzian(x: number, x0: number, delta: number): number {
  const u = (2 * (x - x0)) / delta;
  return 1 / (1 + u * u);
}

/**
 * `atan(u2) − atan(u1)` without cancellation: `atan2(u2 − u1, 1 + u1·u2)`,
 * exact because `cos(atan u1)·cos(atan u2) > 0`. `du = u2 − u1` is passed in
 * separately so the caller can form it without subtracting large numbers.
 */
export function atanDiff(u1: number, u2: number, du: number = u2 - u1): number {
  return Math.atan2(du, 1 + u1 * u2);
}

/** `∫_{x1}^{x2} M(x) dx` for the Lorentzian centred at x0 with FWHM delta (GHz·1). */
export function lorentzianIntegral(x1: number, x2: number, x0: number, delta: number): number {
  const u1 = (2 * (x1 - x0)) / delta;
  const u2 = (2 * (x2 - x0)) / delta;
  const du = (2 * (x2 - x1)) / delta;
  return (delta / 2) * atanDiff(u1, u2, du);
}

/**
 * `∫_{x1}^{x2} M(x)² dx`. The rational part `u2/(1+u2²) − u1/(1+u1²)` is
 * written as `(u2 − u1)(1 − u1·u2)/((1+u1²)(1+u2²))` to avoid cancellation.
 */
export function lorentzianSquaredIntegral(x1: number, x2: number, x0: number, delta: number): number {
  const u1 = (2 * (x1 - x0)) / delta;
  const u2 = (2 * (x2 - x0)) / delta;
  const du = (2 * (x2 - x1)) / delta;
  const rational = (du * (1 - u1 * u2)) / ((1 + u1 * u1) * (1 + u2 * u2));
  return (delta / 2) * 0.5 * (rational + atanDiff(u1, u2, du));
}

/** `log1p(t)/t`, continuous at t = 0. */
function log1pOver(t: number): number {
  return Math.abs(t) < 1e-8 ? 1 - t / 2 : Math.log1p(t) / t;
}

/**
 * `∫_{y1}^{y2} L(y; p1)·L(y; p2) dy` for two Lorentzians of equal half-width
 * `hw` (`L(y; p) = 1/(1 + ((y − p)/hw)²)`), used for the overlap of the two
 * band images of a DSB channel. Partial fractions with `u = (y − p1)/hw`,
 * `w = u − D`, `D = (p2 − p1)/hw` give the antiderivative
 * `G(u) = [log1p(D·(u + w)/(1 + w²))/D + atan u + atan w] / (4 + D²)`,
 * which is smooth in D and equals `(u/(1+u²) + atan u)/2` at D = 0.
 */
export function lorentzianProductIntegral(y1: number, y2: number, p1: number, p2: number, hw: number): number {
  const D = (p2 - p1) / hw;
  const u1 = (y1 - p1) / hw;
  const u2 = (y2 - p1) / hw;
  const w1 = u1 - D;
  const w2 = u2 - D;
  const du = (y2 - y1) / hw;
  const logPart = (u: number, w: number) => {
    const z = (u + w) / (1 + w * w);
    return z * log1pOver(D * z);
  };
  const value = logPart(u2, w2) - logPart(u1, w1) + atanDiff(u1, u2, du) + atanDiff(w1, w2, du);
  return (hw * value) / (4 + D * D);
}
