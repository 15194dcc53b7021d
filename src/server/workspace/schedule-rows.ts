import "server-only";
import type { StoredSchedule } from "@db/schema";
import type { PlanSchedule } from "@/schemas/plan";

/**
 * A laser's observation schedule between its stored form (dwells name
 * chain row ids) and the plan document's (dwells name chain keys).
 */

/** The plan document's schedule of a stored one; a dwell whose chain row is gone is left out (null when none is left). */
export function scheduleOfRow(s: StoredSchedule | null, chainKey: ReadonlyMap<string, string>): PlanSchedule | null {
  if (!s) return null;
  const dwells = s.dwells.flatMap((d) => {
    const chain = chainKey.get(d.chainId);
    return chain === undefined ? [] : [{ chain, dwellMs: d.dwellMs }];
  });
  if (dwells.length === 0) return null;
  return { cycleMs: s.cycleMs, retuneMs: s.retuneMs, retuneMsPerGHz: s.retuneMsPerGHz, relockMs: s.relockMs, dwells };
}

/** The stored form of a plan document's schedule, with chain keys resolved to row ids. */
export function scheduleRowOf(s: PlanSchedule | null, chainId: ReadonlyMap<string, string>): StoredSchedule | null {
  if (!s) return null;
  return {
    cycleMs: s.cycleMs,
    retuneMs: s.retuneMs,
    retuneMsPerGHz: s.retuneMsPerGHz,
    relockMs: s.relockMs,
    dwells: s.dwells.map((d) => ({ chainId: chainId.get(d.chain)!, dwellMs: d.dwellMs })),
  };
}
