import { C_NM_THZ } from "./internals/constants";
import { requireInRange, requirePositive } from "./internals/errors";
import { jundtIndexSquared, jundtIndexSquaredSlope, jundtIndexSquaredTemperatureSlope } from "./internals/jundt";
import { lnThermalExpansion } from "./ln-thermal-expansion";

export interface ModeShiftResult {
  /** dν_q/dT in GHz per kelvin (negative: modes move down as the disc warms). */
  ghzPerK: number;
  n: number;
  ng: number;
  /** ∂n_e/∂T per kelvin (Jundt 1997, analytic). */
  dnDT: number;
  /** α_a per kelvin (Kim & Smith 1969). */
  alphaA: number;
}

/**
 * Thermal shift of one resonator mode of a z-cut LiNbO3 disc (e-ray), at
 * fixed azimuthal number m. From 2πR·n·ν/c = m:
 *
 *   dν_q/dT = −ν·[ (n/n_g)·α_a + (∂n/∂T)/n_g ]
 *
 * (derivation in docs/helpers.md, Thermal tuning; n, n_g and ∂n/∂T from
 * Jundt, Opt. Lett. 22, 1553 (1997); α_a from Kim & Smith, J. Appl. Phys. 40,
 * 4637 (1969)).
 */
export function modeShiftPerKelvin(carrierTHz: number, temperatureC: number): ModeShiftResult {
  requirePositive("carrierTHz", carrierTHz);
  const lambdaUm = C_NM_THZ / carrierTHz / 1000;
  requireInRange("carrierTHz (as wavelength, µm)", lambdaUm, 0.4, 5);
  requireInRange("temperatureC", temperatureC, -50, 300);
  const n = Math.sqrt(jundtIndexSquared(lambdaUm, temperatureC));
  const ng = n - (lambdaUm * jundtIndexSquaredSlope(lambdaUm, temperatureC)) / (2 * n);
  const dnDT = jundtIndexSquaredTemperatureSlope(lambdaUm, temperatureC) / (2 * n);
  const alphaA = lnThermalExpansion(temperatureC);
  const ghzPerK = -carrierTHz * 1000 * ((n / ng) * alphaA + dnDT / ng);
  return { ghzPerK, n, ng, dnDT, alphaA };
}
