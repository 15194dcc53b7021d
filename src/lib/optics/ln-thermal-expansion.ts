import { requireInRange } from "./internals/errors";

/**
 * Linear thermal-expansion coefficient of LiNbO3 perpendicular to the c axis
 * (the radius of a z-cut disc), per kelvin. Kim & Smith, "Thermal expansion
 * of lithium tantalate and lithium niobate single crystals", J. Appl. Phys.
 * 40, 4637–4641 (1969): ΔL/L = α·(T − T0) + β·(T − T0)², α = 1.53e-5 /K,
 * β = 5.3e-9 /K², T0 = 19 °C. Reading: the local coefficient is
 * α_a(T) = (1/L)·dL/dT = (α + 2β·(T − T0)) / (1 + α·(T − T0) + β·(T − T0)²).
 */
export const LN_EXPANSION_A = { alpha: 1.53e-5, beta: 5.3e-9, t0C: 19 } as const;

export function lnThermalExpansion(temperatureC: number): number {
  requireInRange("temperatureC", temperatureC, -50, 300);
  const { alpha, beta, t0C } = LN_EXPANSION_A;
  const d = temperatureC - t0C;
  return (alpha + 2 * beta * d) / (1 + alpha * d + beta * d * d);
}
