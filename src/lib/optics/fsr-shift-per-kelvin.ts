import { C_NM_THZ } from "./internals/constants";
import { requireInRange, requirePositive } from "./internals/errors";
import { centralDifference } from "./internals/finite-difference";
import { jundtIndexSquared, jundtIndexSquaredSlope } from "./internals/jundt";
import { lnThermalExpansion } from "./ln-thermal-expansion";
import { modeShiftPerKelvin } from "./mode-shift-per-kelvin";

export interface FsrShiftResult {
  /**
   * dFSR/dT in MHz per kelvin by the formula derived in docs/helpers.md (Thermal
   * tuning), with n_g taken at a fixed wavelength: −FSR·[α_a + (∂n_g/∂T)/n_g].
   */
  mhzPerK: number;
  /**
   * dFSR/dT in MHz per kelvin for the same pair of modes as they move with
   * temperature (laser 1 follows its mode): adds the change of n_g with the
   * mode's wavelength, (∂n_g/∂λ)·(dλ/dT). About 1.6 % smaller in magnitude
   * than `mhzPerK` at 1550 nm, 25 °C.
   */
  mhzPerKFollowingMode: number;
  ng: number;
  /** ∂n_g/∂T per kelvin at fixed wavelength. */
  dngDT: number;
  /** ∂n_g/∂λ per µm at fixed temperature (group-velocity dispersion term). */
  dngDlambdaPerUm: number;
  alphaA: number;
}

function jundtGroupIndex(lambdaUm: number, temperatureC: number): number {
  const n = Math.sqrt(jundtIndexSquared(lambdaUm, temperatureC));
  return n - (lambdaUm * jundtIndexSquaredSlope(lambdaUm, temperatureC)) / (2 * n);
}

/**
 * Thermal shift of the free spectral range of a z-cut LiNbO3 disc (e-ray),
 * from FSR = c/(2πR·n_g):
 *
 *   dFSR/dT = −FSR·[ α_a + (dn_g/dT)/n_g ]                (derived, docs/helpers.md)
 *
 * with dn_g/dT = ∂n_g/∂T (fixed wavelength, `mhzPerK`) or
 * ∂n_g/∂T + (∂n_g/∂λ)·(dλ/dT), dλ/dT = −(λ/ν)·dν/dT from modeShiftPerKelvin
 * (the modes followed as they move, `mhzPerKFollowingMode`). n_g(λ, T) from
 * Jundt, Opt. Lett. 22, 1553 (1997); α_a from Kim & Smith, J. Appl. Phys. 40,
 * 4637 (1969). Both partial derivatives of n_g are five-point central
 * differences of the analytic n_g (h = 1 K and 1e-3 µm).
 */
export function fsrShiftPerKelvin(fsrGHz: number, carrierTHz: number, temperatureC: number): FsrShiftResult {
  requirePositive("fsrGHz", fsrGHz);
  requirePositive("carrierTHz", carrierTHz);
  const lambdaUm = C_NM_THZ / carrierTHz / 1000;
  requireInRange("carrierTHz (as wavelength, µm)", lambdaUm, 0.4, 5);
  requireInRange("temperatureC", temperatureC, -50, 300);
  const ng = jundtGroupIndex(lambdaUm, temperatureC);
  const dngDT = centralDifference((t) => jundtGroupIndex(lambdaUm, t), temperatureC, 1);
  const dngDlambdaPerUm = centralDifference((l) => jundtGroupIndex(l, temperatureC), lambdaUm, 1e-3);
  const alphaA = lnThermalExpansion(temperatureC);
  const mhzPerK = -fsrGHz * 1000 * (alphaA + dngDT / ng);
  const dnuDT = modeShiftPerKelvin(carrierTHz, temperatureC).ghzPerK / 1000; // THz per K
  const dlambdaDT = -(lambdaUm / carrierTHz) * dnuDT; // µm per K
  const mhzPerKFollowingMode = -fsrGHz * 1000 * (alphaA + (dngDT + dngDlambdaPerUm * dlambdaDT) / ng);
  return { mhzPerK, mhzPerKFollowingMode, ng, dngDT, dngDlambdaPerUm, alphaA };
}
