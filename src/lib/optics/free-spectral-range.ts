import { SPEED_OF_LIGHT_M_PER_S } from "./internals/constants";
import { requirePositive } from "./internals/errors";

/**
 * Free spectral range (GHz) of a whispering-gallery resonator of major radius
 * R (µm) with group index n_g: FSR ≈ c / (2π·R·n_g) (light circulating near
 * the rim; e.g. Matsko & Ilchenko, IEEE JSTQE 12, 3 (2006), cited from memory).
 */
export function freeSpectralRange(radiusUm: number, groupIndex: number): number {
  requirePositive("radiusUm", radiusUm);
  requirePositive("groupIndex", groupIndex);
  return SPEED_OF_LIGHT_M_PER_S / (2 * Math.PI * radiusUm * 1e-6 * groupIndex) / 1e9;
}
