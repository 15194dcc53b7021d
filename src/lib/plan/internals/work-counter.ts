/**
 * A counter of the engine's work steps, passed in by a caller that wants
 * to know how much work a check took (`checkPlan(plan, { work })`); the
 * engine keeps no state of its own.
 *
 * One step is one item of an enumeration whose length is set by the
 * magnitudes in the plan rather than by its structure (how many chains,
 * channels, bands, reach intervals, `spurMaxOrder`): a lock order of a lock
 * spur family, a zone edge `k·fs/2` of a Nyquist fold or straddle, a mode
 * window or an image-rule evaluation of the image search. These are the
 * loops ADR 018 bounds with the engine's limits (`MAX_LOCK_ORDER_ENUMERATED`,
 * `MAX_ZONE_CROSSINGS`, `MAX_WINDOWS`, `MAX_GRID_POINTS`); the structural
 * loops around them are not counted.
 */
export interface WorkCounter {
  steps: number;
}

/** Add `n` steps to the counter, if there is one. */
export function countSteps(work: WorkCounter | undefined, n: number): void {
  if (work !== undefined && n > 0) work.steps += n;
}
