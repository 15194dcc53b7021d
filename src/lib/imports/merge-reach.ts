export interface ReachMerge {
  /** Maximal runs of measured offsets whose neighbours lie closer than the gap, as [minGHz, maxGHz] with min < max, increasing. */
  intervals: { minGHz: number; maxGHz: number }[];
  /** Offsets with no neighbour closer than the gap (a single point is not a reachable interval), increasing, distinct. */
  isolatedGHz: number[];
}

/**
 * Turns measured laser-pair offsets (GHz) into reach intervals: sorts them
 * and joins neighbours closer than `gapGHz` (strictly) into one interval.
 * Intervals are disjoint and separated by at least `gapGHz`; every finite
 * point lies in exactly one interval or is listed as isolated.
 */
export function mergeReach(pointsGHz: readonly number[], gapGHz: number): ReachMerge {
  const sorted = pointsGHz.filter((p) => Number.isFinite(p)).sort((a, b) => a - b);
  const intervals: ReachMerge["intervals"] = [];
  const isolatedGHz: number[] = [];
  let i = 0;
  while (i < sorted.length) {
    const lo = sorted[i] as number;
    let hi = lo;
    let j = i + 1;
    while (j < sorted.length && (sorted[j] as number) - hi < gapGHz) {
      hi = sorted[j] as number;
      j++;
    }
    if (hi > lo) intervals.push({ minGHz: lo, maxGHz: hi });
    else isolatedGHz.push(lo);
    i = j;
  }
  return { intervals, isolatedGHz };
}
