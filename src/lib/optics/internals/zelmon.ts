/**
 * Congruent LiNbO3 Sellmeier fits at 21 °C, valid about 0.4–5 µm:
 * D. E. Zelmon, D. L. Small, D. Jundt, "Infrared corrected Sellmeier
 * coefficients for congruently grown lithium niobate and 5 mol.% magnesium
 * oxide–doped lithium niobate", JOSA B 14, 3319–3322 (1997).
 *
 *   n² − 1 = Σᵢ Bᵢ λ² / (λ² − Cᵢ)      (λ in µm, Cᵢ in µm²)
 */
export type LnAxis = "e" | "o";

interface Term {
  b: number;
  c: number;
}

export const ZELMON_TERMS: Record<LnAxis, readonly Term[]> = {
  e: [
    { b: 2.9804, c: 0.02047 },
    { b: 0.5981, c: 0.0666 },
    { b: 8.9543, c: 416.08 },
  ],
  o: [
    { b: 2.6734, c: 0.01764 },
    { b: 1.229, c: 0.05914 },
    { b: 12.614, c: 474.6 },
  ],
};

/** n² at λ (µm). */
export function zelmonIndexSquared(axis: LnAxis, lambdaUm: number): number {
  const l2 = lambdaUm * lambdaUm;
  let sum = 1;
  for (const { b, c } of ZELMON_TERMS[axis]) sum += (b * l2) / (l2 - c);
  return sum;
}

/** d(n²)/dλ, analytic: d/dλ [B λ²/(λ² − C)] = −2BCλ/(λ² − C)². Per µm. */
export function zelmonIndexSquaredSlope(axis: LnAxis, lambdaUm: number): number {
  const l2 = lambdaUm * lambdaUm;
  let sum = 0;
  for (const { b, c } of ZELMON_TERMS[axis]) {
    const d = l2 - c;
    sum += (-2 * b * c * lambdaUm) / (d * d);
  }
  return sum;
}
