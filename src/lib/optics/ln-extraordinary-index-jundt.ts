import { requireInRange } from "./internals/errors";
import { jundtIndexSquared } from "./internals/jundt";

/**
 * Temperature-dependent extraordinary index of congruent LiNbO3 (Jundt,
 * Opt. Lett. 22, 1553 (1997)). λ in µm (0.4–5), T in °C (accepted −50 to
 * 300 °C; the fit was made over roughly 20–250 °C).
 */
export function lnExtraordinaryIndexJundt(wavelengthUm: number, temperatureC: number): number {
  requireInRange("wavelengthUm", wavelengthUm, 0.4, 5);
  requireInRange("temperatureC", temperatureC, -50, 300);
  return Math.sqrt(jundtIndexSquared(wavelengthUm, temperatureC));
}
