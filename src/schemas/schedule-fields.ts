import type { FieldRules } from "./fields";

/**
 * The field rules of a laser pair's observation schedule (format version 2,
 * docs/plan-format.md, "Observation schedules"), shared like the rules of
 * `fields.ts` by the plan document (`plan/document.ts`) and the workspace
 * forms (`workspace.ts`), and the one formula of the switch into a dwell,
 * shared by the plan's validation and the engine.
 */

/** Most dwells one schedule may list (a schedule visits each of its chains once per cycle; chains are at most 64). */
export const MAX_DWELLS = 64;

/**
 * The timing fields of a laser pair's observation schedule
 * (docs/plan-format.md, "Observation schedules"), in document order; the
 * list of dwells is the caller's (its chain reference and wording differ).
 */
export const scheduleShape = (r: FieldRules) => ({
  cycleMs: r.positive(),
  retuneMs: r.nonNegative(),
  retuneMsPerGHz: r.nonNegative(),
  relockMs: r.nonNegative(),
});

/** A dwell's own field after its chain reference. */
export const dwellShape = (r: FieldRules) => ({
  dwellMs: r.positive(),
});

/** The retune and relock fields of a schedule, as the switch time reads them. */
export interface SwitchTimes {
  retuneMs: number;
  retuneMsPerGHz: number;
  relockMs: number;
}

/** The time taken to switch into a dwell from the dwell before it (ms), in its two parts. */
export interface DwellSwitch {
  /** |ΔL|: how far laser 2 moves from the previous chain's LO offset (GHz). */
  loStepGHz: number;
  /** `retuneMs + retuneMsPerGHz·|ΔL|` when the LO moves, else 0. */
  retuneMs: number;
  /** `relockMs` when the two chains use different resonators, else 0. */
  relockMs: number;
  /** Retune and relock, one after the other. */
  switchMs: number;
}

/**
 * The switch into a dwell (docs/plan-format.md, "Observation schedules": the switch into a dwell): laser 2 retunes from
 * the previous chain's LO offset to this chain's (a fixed part plus a part
 * per GHz of LO change; nothing when the offset does not change), and, when
 * the two chains use different resonators, the carrier relocks first; the
 * two take place one after the other. Shared by the plan's validation (a
 * dwell must be longer than the switch into it) and the engine.
 */
export function dwellSwitch(
  s: SwitchTimes,
  from: { loOffsetGHz: number; resonator: string },
  to: { loOffsetGHz: number; resonator: string },
): DwellSwitch {
  const loStepGHz = Math.abs(to.loOffsetGHz - from.loOffsetGHz);
  const retuneMs = loStepGHz > 0 ? s.retuneMs + s.retuneMsPerGHz * loStepGHz : 0;
  const relockMs = from.resonator === to.resonator ? 0 : s.relockMs;
  return { loStepGHz, retuneMs, relockMs, switchMs: retuneMs + relockMs };
}
