import { C_NM_THZ } from "./internals/constants";
import { requirePositive } from "./internals/errors";

/** Optical frequency (THz) of a vacuum wavelength (nm): f = c/λ, c exact. */
export function frequencyTHzFromNm(wavelengthNm: number): number {
  requirePositive("wavelengthNm", wavelengthNm);
  return C_NM_THZ / wavelengthNm;
}
