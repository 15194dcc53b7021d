import { requireInRange } from "./internals/errors";
import { type LnAxis, zelmonIndexSquared } from "./internals/zelmon";

export type { LnAxis };

/**
 * Refractive index of congruent LiNbO3 at 21 °C, extraordinary ("e") or
 * ordinary ("o") ray, from the Sellmeier fit of Zelmon, Small & Jundt,
 * JOSA B 14, 3319 (1997). λ in µm, within the fit's 0.4–5 µm range.
 */
export function lnIndexZelmon(wavelengthUm: number, axis: LnAxis): number {
  requireInRange("wavelengthUm", wavelengthUm, 0.4, 5);
  return Math.sqrt(zelmonIndexSquared(axis, wavelengthUm));
}
