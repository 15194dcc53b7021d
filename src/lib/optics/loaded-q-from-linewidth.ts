import { requirePositive } from "./internals/errors";

/** Loaded Q from a measured FWHM linewidth (MHz) at carrier ν (THz): Q_L = ν / δν. */
export function loadedQFromLinewidth(carrierTHz: number, linewidthMHz: number): number {
  requirePositive("carrierTHz", carrierTHz);
  requirePositive("linewidthMHz", linewidthMHz);
  return (carrierTHz * 1e6) / linewidthMHz;
}
