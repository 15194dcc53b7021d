import { requirePositive } from "./internals/errors";

/**
 * Loaded linewidth (FWHM, MHz) of a resonance at carrier frequency ν (THz)
 * with loaded quality factor Q_L: δν = ν / Q_L (definition of Q; e.g. Saleh &
 * Teich, Fundamentals of Photonics, resonator chapter).
 */
export function linewidthFromQ(carrierTHz: number, loadedQ: number): number {
  requirePositive("carrierTHz", carrierTHz);
  requirePositive("loadedQ", loadedQ);
  return (carrierTHz * 1e6) / loadedQ;
}
