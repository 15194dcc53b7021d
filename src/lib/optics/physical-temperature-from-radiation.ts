import { H_OVER_K } from "./internals/constants";
import { requireNonNegative, requirePositive } from "./internals/errors";

/**
 * Inverse of the Planck radiation temperature: T = (hf/k) / ln(1 + (hf/k)/J)
 * (K), for J ≥ 0 (K) at f (GHz). J = 0 gives T = 0.
 */
export function physicalTemperatureFromRadiation(radiationK: number, frequencyGHz: number): number {
  requireNonNegative("radiationK", radiationK);
  requirePositive("frequencyGHz", frequencyGHz);
  if (radiationK === 0) return 0;
  const hfk = H_OVER_K * frequencyGHz * 1e9;
  return hfk / Math.log1p(hfk / radiationK);
}
