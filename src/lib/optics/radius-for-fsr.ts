import { SPEED_OF_LIGHT_M_PER_S } from "./internals/constants";
import { requirePositive } from "./internals/errors";

/** Radius (µm) giving a free spectral range (GHz): R = c / (2π·FSR·n_g). */
export function radiusForFsr(fsrGHz: number, groupIndex: number): number {
  requirePositive("fsrGHz", fsrGHz);
  requirePositive("groupIndex", groupIndex);
  return (SPEED_OF_LIGHT_M_PER_S / (2 * Math.PI * fsrGHz * 1e9 * groupIndex)) * 1e6;
}
