import { H_OVER_K } from "./internals/constants";
import { requirePositive } from "./internals/errors";

/**
 * Quantum-limit noise temperature h·f/k_B (K) at f (GHz), exact SI constants.
 * The usual single-sideband heterodyne limit (e.g. Caves, Phys. Rev. D 26,
 * 1817 (1982); cited from memory).
 */
export function quantumLimitK(frequencyGHz: number): number {
  requirePositive("frequencyGHz", frequencyGHz);
  return H_OVER_K * frequencyGHz * 1e9;
}
