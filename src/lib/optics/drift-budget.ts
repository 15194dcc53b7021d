import { OpticsInputError, requireFinite, requireNonNegative } from "./internals/errors";

export type DriftCombination = "worst-case" | "rss";

export interface DriftBudgetInput {
  /** ± stability of laser 2 (the optical LO) over an observation, MHz. */
  laser2MHz: number;
  /** ± temperature stability of the resonator, mK. */
  resonatorMilliK: number;
  /** Mode shift per kelvin, GHz/K (sign ignored; e.g. modeShiftPerKelvin). */
  modeShiftGHzPerK: number;
  /** ± residual offset of the carrier lock from the mode centre, MHz. */
  lockOffsetMHz: number;
  /** Tuning step of the laser-pair offset, MHz (half of it enters the budget). */
  stepMHz: number;
  combine: DriftCombination;
}

export interface DriftTerm {
  key: "laser2" | "resonator" | "lock" | "halfStep";
  label: string;
  mhz: number;
}

export interface DriftBudgetResult {
  driftMHz: number;
  combine: DriftCombination;
  terms: DriftTerm[];
}

/**
 * Drift budget for the laser-pair offset relative to the carrier (the plan's
 * `driftMHz`), following the bookkeeping derived in docs/helpers.md (Drift budget): the
 * IF centre moves by laser-2 drift plus the resonator's thermal mode shift
 * (laser 1 follows the mode, laser 2 does not), plus the lock's residual
 * offset and half the tuning step.
 *
 * - worst-case: the sum of the magnitudes (every term at its limit, same sign);
 * - rss: root-sum-square, for terms that are independent and random (treat
 *   the half-step as a bound, so the rss figure is optimistic about it).
 *
 * Resonator term: |dν/dT| [GHz/K] × δT [mK] = MHz.
 */
export function driftBudget(input: DriftBudgetInput): DriftBudgetResult {
  const laser2 = requireNonNegative("laser2MHz", input.laser2MHz);
  const milliK = requireNonNegative("resonatorMilliK", input.resonatorMilliK);
  const shift = Math.abs(requireFinite("modeShiftGHzPerK", input.modeShiftGHzPerK));
  const lock = requireNonNegative("lockOffsetMHz", input.lockOffsetMHz);
  const step = requireNonNegative("stepMHz", input.stepMHz);
  if (input.combine !== "worst-case" && input.combine !== "rss") {
    throw new OpticsInputError("combine", 'must be "worst-case" or "rss"');
  }
  const terms: DriftTerm[] = [
    { key: "laser2", label: "Laser 2 stability", mhz: laser2 },
    { key: "resonator", label: "Resonator temperature × mode shift", mhz: shift * milliK },
    { key: "lock", label: "Lock offset", mhz: lock },
    { key: "halfStep", label: "Half the tuning step", mhz: step / 2 },
  ];
  let driftMHz: number;
  if (input.combine === "worst-case") {
    driftMHz = terms.reduce((sum, t) => sum + t.mhz, 0);
  } else {
    // Scaled to avoid overflow/underflow for extreme inputs.
    const largest = Math.max(...terms.map((t) => t.mhz));
    driftMHz = largest === 0 ? 0 : largest * Math.sqrt(terms.reduce((sum, t) => sum + (t.mhz / largest) ** 2, 0));
  }
  return { driftMHz, combine: input.combine, terms };
}
