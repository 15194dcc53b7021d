import { C_NM_THZ } from "./internals/constants";
import { requirePositive } from "./internals/errors";

/**
 * Vacuum wavelength (nm) of an optical frequency (THz): λ = c/f with the
 * exact c = 299 792 458 m/s, as ITU-T G.694.1 does for its grid tables.
 */
export function wavelengthNmFromTHz(frequencyTHz: number): number {
  requirePositive("frequencyTHz", frequencyTHz);
  return C_NM_THZ / frequencyTHz;
}
