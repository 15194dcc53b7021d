import type { Interval } from "@/queries/types";

/**
 * The union of closed intervals as sorted, disjoint intervals, merging those
 * that overlap or touch (docs/plan-format.md §1.3 "Intervals, gap and
 * guard": reach intervals are merged where they overlap or touch before any
 * rule). Used to draw the current reach.
 */
export function mergedCoverage(intervals: readonly Interval[]): Interval[] {
  const sorted = [...intervals].filter((i) => i.minGHz <= i.maxGHz).sort((a, b) => a.minGHz - b.minGHz);
  const out: Interval[] = [];
  for (const i of sorted) {
    const last = out[out.length - 1];
    if (last && i.minGHz <= last.maxGHz) last.maxGHz = Math.max(last.maxGHz, i.maxGHz);
    else out.push({ ...i });
  }
  return out;
}
