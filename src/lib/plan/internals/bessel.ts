/**
 * Bessel function of the first kind `J_m(β)` for integer m ≥ 0 by its power
 * series `J_m(β) = Σ_k (−1)^k (β/2)^(2k+m) / (k!·(k+m)!)` (Abramowitz &
 * Stegun 9.1.10; DLMF 10.2.2). For the plan's range `0 < β < 2.4` and small
 * m the terms fall fast; summing until a term no longer changes the total
 * gives full double precision.
 */
export function besselJ(m: number, beta: number): number {
  if (!Number.isInteger(m) || m < 0) throw new RangeError(`besselJ: order must be a non-negative integer, got ${m}`);
  const half = beta / 2;
  const q = -half * half;
  // first term (β/2)^m / m!
  let term = 1;
  for (let i = 1; i <= m; i++) term *= half / i;
  let sum = term;
  for (let k = 1; k < 200; k++) {
    term *= q / (k * (k + m));
    const next = sum + term;
    if (next === sum) break;
    sum = next;
  }
  return sum;
}

/**
 * `J_m(β)` split as `(β/2)^m/m! · S` for `β > 0`: returns `log10((β/2)^m/m!)`
 * and the series factor `S = Σ_k (−β²/4)^k·m!/(k!(k+m)!)` (S = 1 at β = 0).
 * Used where `J_m` itself would underflow (tiny β or large m) but its
 * logarithm is needed.
 */
export function besselJLog10Parts(m: number, beta: number): { log10Lead: number; series: number } {
  const half = beta / 2;
  const q = -half * half;
  let log10Lead = m * Math.log10(half);
  for (let i = 2; i <= m; i++) log10Lead -= Math.log10(i);
  let term = 1;
  let series = 1;
  for (let k = 1; k < 200; k++) {
    term *= q / (k * (k + m));
    const next = series + term;
    if (next === series) break;
    series = next;
  }
  return { log10Lead, series };
}
