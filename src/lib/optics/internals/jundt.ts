/**
 * Temperature-dependent extraordinary index of congruent LiNbO3:
 * D. H. Jundt, "Temperature-dependent Sellmeier equation for the index of
 * refraction, n_e, in congruent lithium niobate", Opt. Lett. 22, 1553–1555
 * (1997), Table 2 coefficients.
 *
 *   n_e² = a1 + b1·F + (a2 + b2·F)/(λ² − (a3 + b3·F)²) + (a4 + b4·F)/(λ² − a5²) − a6·λ²
 *   F = (T − 24.5)(T + 570.82)          T in °C, λ in µm
 *
 * Stated validity roughly 0.4–5 µm and 20–250 °C (from memory; see
 * docs/helpers.md).
 */
const A1 = 5.35583;
const A2 = 0.100473;
const A3 = 0.20692;
const A4 = 100;
const A5 = 11.34927;
const A6 = 1.5334e-2;
const B1 = 4.629e-7;
const B2 = 3.862e-8;
const B3 = -0.89e-8;
const B4 = 2.657e-5;

export function jundtF(temperatureC: number): number {
  return (temperatureC - 24.5) * (temperatureC + 570.82);
}

/** n_e² at λ (µm), T (°C). */
export function jundtIndexSquared(lambdaUm: number, temperatureC: number): number {
  const f = jundtF(temperatureC);
  const l2 = lambdaUm * lambdaUm;
  const p = A3 + B3 * f;
  return A1 + B1 * f + (A2 + B2 * f) / (l2 - p * p) + (A4 + B4 * f) / (l2 - A5 * A5) - A6 * l2;
}

/** ∂(n_e²)/∂λ per µm, analytic. */
export function jundtIndexSquaredSlope(lambdaUm: number, temperatureC: number): number {
  const f = jundtF(temperatureC);
  const l2 = lambdaUm * lambdaUm;
  const p = A3 + B3 * f;
  const d1 = l2 - p * p;
  const d2 = l2 - A5 * A5;
  return (-2 * lambdaUm * (A2 + B2 * f)) / (d1 * d1) - (2 * lambdaUm * (A4 + B4 * f)) / (d2 * d2) - 2 * A6 * lambdaUm;
}

/** ∂(n_e²)/∂T per kelvin, analytic (chain rule through F; dF/dT = 2T + 546.32). */
export function jundtIndexSquaredTemperatureSlope(lambdaUm: number, temperatureC: number): number {
  const f = jundtF(temperatureC);
  const dfdT = 2 * temperatureC + (570.82 - 24.5);
  const l2 = lambdaUm * lambdaUm;
  const p = A3 + B3 * f;
  const d1 = l2 - p * p;
  const d2 = l2 - A5 * A5;
  const dByDf = B1 + B2 / d1 + ((A2 + B2 * f) * 2 * p * B3) / (d1 * d1) + B4 / d2;
  return dByDf * dfdT;
}
