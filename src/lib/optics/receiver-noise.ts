import { H_OVER_K } from "./internals/constants";
import { OpticsInputError, requireNonNegative, requirePositive } from "./internals/errors";

function requireEfficiency(field: string, value: number): number {
  requirePositive(field, value);
  if (value > 1) throw new OpticsInputError(field, "must be at most 1 (a fraction, not a percentage)");
  return value;
}

export interface ReceiverNoiseInput {
  /** RF (millimetre-wave) frequency, GHz. */
  rfGHz: number;
  /** Photon-number conversion efficiency of the up-converter η_ph, 0 < η ≤ 1. */
  photonEfficiency: number;
  /** Optical path and detection efficiency after the resonator, 0 < η ≤ 1. */
  opticalEfficiency: number;
  /** Optional lossy mm-wave front end ahead of the up-converter (feed, waveguide, window). */
  frontEnd?: { lossDB: number; physicalK: number } | null;
}

export interface ReceiverNoiseResult {
  /** Receiver noise temperature referred to the antenna port, K (design estimate). */
  receiverK: number;
  /** h·f/k_B, the quantum limit, K. */
  quantumLimitK: number;
  /** η = η_ph × η_opt. */
  etaTotal: number;
  /** h·f/(k_B·η): the up-converter and readout referred to their own input, K. */
  upconverterK: number;
  /** Front-end loss as a power ratio L ≥ 1 (1 when there is no front end). */
  lossLinear: number;
  /** (L − 1)·T_phys, the front end's own noise referred to the input, K. */
  frontEndK: number;
  /** L·h·f/(k_B·η), the up-converter's noise referred through the loss, K. */
  upconverterReferredK: number;
}

/**
 * Design estimate of the receiver noise temperature of an electro-optic
 * up-conversion receiver with ideal heterodyne readout:
 *
 *   T_up = h·f / (k_B·η),   η = η_ph · η_opt        (derived, docs/helpers.md)
 *
 * With a lossy passive front end of loss L (power ratio, L = 10^(dB/10)) at
 * physical temperature T_phys ahead of it, the cascade (Friis) formula
 * T = T_1 + T_2/G_1 with a passive two-port's T_1 = (L − 1)·T_phys and
 * G_1 = 1/L gives
 *
 *   T_rec = (L − 1)·T_phys + L·h·f / (k_B·η)
 *
 * (Pozar, Microwave Engineering, 4th ed., Wiley 2012, chapter "Noise and
 * Nonlinear Distortion": noise temperature of a lossy line and of cascaded
 * stages; Skou & Le Vine, Microwave Radiometer Systems, 2nd ed., receiver
 * chapter. Section numbers cited from memory.) Rayleigh–Jeans form for the
 * front-end term; a design estimate, not a measurement.
 */
export function receiverNoise(input: ReceiverNoiseInput): ReceiverNoiseResult {
  requirePositive("rfGHz", input.rfGHz);
  requireEfficiency("photonEfficiency", input.photonEfficiency);
  requireEfficiency("opticalEfficiency", input.opticalEfficiency);
  const quantum = H_OVER_K * input.rfGHz * 1e9;
  const etaTotal = input.photonEfficiency * input.opticalEfficiency;
  const upconverterK = quantum / etaTotal;
  let lossLinear = 1;
  let frontEndK = 0;
  if (input.frontEnd) {
    const lossDB = requireNonNegative("frontEnd.lossDB", input.frontEnd.lossDB);
    const physicalK = requireNonNegative("frontEnd.physicalK", input.frontEnd.physicalK);
    lossLinear = 10 ** (lossDB / 10);
    frontEndK = (lossLinear - 1) * physicalK;
  }
  const upconverterReferredK = lossLinear * upconverterK;
  return {
    receiverK: frontEndK + upconverterReferredK,
    quantumLimitK: quantum,
    etaTotal,
    upconverterK,
    lossLinear,
    frontEndK,
    upconverterReferredK,
  };
}
