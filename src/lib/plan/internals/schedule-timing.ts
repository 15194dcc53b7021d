import type { Plan, PlanLaser, PlanSchedule } from "@/schemas/plan";
import { dwellSwitch } from "@/schemas/schedule-fields";
import type { ScheduleDwellResult } from "../schedule-types";

/**
 * The timing of one laser pair's observation schedule
 * (docs/plan-format.md §13.3 "Timing"): for each dwell the switch into it
 * from the dwell before (the last dwell's switch is from the first, as the
 * cycle repeats), the usable time left, and the chain's duty cycle; the
 * time one cycle takes and its idle part.
 */
export interface ScheduleTiming {
  laser: string;
  schedule: PlanSchedule;
  plannedCycleMs: number;
  busyMs: number;
  cycleMs: number;
  idleMs: number;
  dwells: ScheduleDwellResult[];
}

/** The switch into each dwell: from the previous dwell's chain (cyclically). */
export function switchesOf(
  plan: Plan,
  schedule: PlanSchedule,
): { loStepGHz: number; retuneMs: number; relockMs: number; switchMs: number }[] {
  const chains = new Map(plan.chains.map((c) => [c.id, c]));
  const n = schedule.dwells.length;
  return schedule.dwells.map((d, j) => {
    const prev = schedule.dwells[(j - 1 + n) % n] as (typeof schedule.dwells)[number];
    const to = chains.get(d.chain);
    const from = chains.get(prev.chain);
    if (!to || !from || prev.chain === d.chain) return { loStepGHz: 0, retuneMs: 0, relockMs: 0, switchMs: 0 };
    return dwellSwitch(schedule, from, to);
  });
}

export function scheduleTiming(plan: Plan, laser: PlanLaser & { schedule: PlanSchedule }): ScheduleTiming {
  const schedule = laser.schedule;
  const switches = switchesOf(plan, schedule);
  let busyMs = 0;
  for (const d of schedule.dwells) busyMs += d.dwellMs;
  const cycleMs = Math.max(schedule.cycleMs, busyMs);
  const dwells = schedule.dwells.map((d, j): ScheduleDwellResult => {
    const sw = switches[j] as (typeof switches)[number];
    const usableMs = Math.max(0, d.dwellMs - sw.switchMs);
    return {
      chain: d.chain,
      dwellMs: d.dwellMs,
      loStepGHz: sw.loStepGHz,
      retuneMs: sw.retuneMs,
      relockMs: sw.relockMs,
      usableMs,
      // a chain alone on its laser pair for the whole cycle keeps exactly its own integration time
      dutyCycle: usableMs === cycleMs ? 1 : usableMs / cycleMs,
    };
  });
  return {
    laser: laser.id,
    schedule,
    plannedCycleMs: schedule.cycleMs,
    busyMs,
    cycleMs,
    idleMs: cycleMs - busyMs,
    dwells,
  };
}

/** The lasers of a plan that carry a schedule. */
export function scheduledLasers(plan: Plan): (PlanLaser & { schedule: PlanSchedule })[] {
  return plan.lasers.filter((l): l is PlanLaser & { schedule: PlanSchedule } => l.schedule != null);
}
