import { H_OVER_K } from "./internals/constants";
import { requireNonNegative, requirePositive } from "./internals/errors";

/**
 * Planck radiation temperature J(T) = (hf/k)/(exp(hf/kT) − 1) (K) of a
 * blackbody at physical temperature T (K), at frequency f (GHz): the noise
 * power per unit bandwidth it delivers, divided by k_B (Planck's law; e.g.
 * Ulaby & Long, Microwave Radar and Radiometric Remote Sensing (2014),
 * radiometry chapter, cited from memory). J(0) = 0.
 */
export function planckRadiationTemperature(physicalK: number, frequencyGHz: number): number {
  requireNonNegative("physicalK", physicalK);
  requirePositive("frequencyGHz", frequencyGHz);
  if (physicalK === 0) return 0;
  const hfk = H_OVER_K * frequencyGHz * 1e9;
  return hfk / Math.expm1(hfk / physicalK);
}
