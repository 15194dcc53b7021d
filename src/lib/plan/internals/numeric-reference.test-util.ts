/**
 * Adaptive Simpson quadrature (Lyness, "Notes on the adaptive Simpson
 * quadrature routine", J. ACM 16, 483 (1969)): the deliberately simple
 * independent integrator the closed forms are checked against in tests.
 */
export function adaptiveSimpson(f: (x: number) => number, a: number, b: number, relTol = 1e-10, maxDepth = 50): number {
  const fa = f(a);
  const fb = f(b);
  const m = (a + b) / 2;
  const fm = f(m);
  const whole = ((b - a) / 6) * (fa + 4 * fm + fb);
  const scaleRef = Math.abs(whole) || 1e-300;
  const rec = (a: number, b: number, fa: number, fm: number, fb: number, whole: number, depth: number): number => {
    const m = (a + b) / 2;
    const lm = (a + m) / 2;
    const rm = (m + b) / 2;
    const flm = f(lm);
    const frm = f(rm);
    const left = ((m - a) / 6) * (fa + 4 * flm + fm);
    const right = ((b - m) / 6) * (fm + 4 * frm + fb);
    const diff = left + right - whole;
    if (depth <= 0 || Math.abs(diff) <= 15 * relTol * scaleRef) return left + right + diff / 15;
    return rec(a, m, fa, flm, fm, left, depth - 1) + rec(m, b, fm, frm, fb, right, depth - 1);
  };
  return rec(a, b, fa, fm, fb, whole, maxDepth);
}

/** Simpson on a sub-divided interval: split [a, b] at the given points first (e.g. at peaks). */
export function integratePiecewise(
  f: (x: number) => number,
  a: number,
  b: number,
  cuts: number[],
  relTol = 1e-10,
): number {
  const pts = [a, ...cuts.filter((c) => c > a && c < b).sort((p, q) => p - q), b];
  let sum = 0;
  for (let i = 0; i + 1 < pts.length; i++) sum += adaptiveSimpson(f, pts[i] as number, pts[i + 1] as number, relTol);
  return sum;
}
