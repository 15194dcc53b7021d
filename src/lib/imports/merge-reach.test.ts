import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { mergeReach } from "./merge-reach";

/** A simpler, independent clustering: two points share a cluster iff a chain of steps closer than the gap joins them (O(n²) union-find). */
function naiveClusters(points: number[], gap: number): number[][] {
  const parent = points.map((_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i] as number)));
  for (let i = 0; i < points.length; i++)
    for (let j = 0; j < points.length; j++) {
      const a = points[i] as number;
      const b = points[j] as number;
      // sorted-neighbour distance: i and j are neighbours if no point lies strictly between them
      const between = points.some((p) => p > Math.min(a, b) && p < Math.max(a, b));
      if (!between && Math.abs(a - b) < gap) parent[find(i)] = find(j);
    }
  const groups = new Map<number, number[]>();
  points.forEach((p, i) => {
    const r = find(i);
    groups.set(r, [...(groups.get(r) ?? []), p]);
  });
  return [...groups.values()]
    .map((g) => [Math.min(...g), Math.max(...g)])
    .sort((x, y) => (x[0] as number) - (y[0] as number));
}

const pointsArb = fc.array(fc.double({ min: -400, max: 400, noNaN: true, noDefaultInfinity: true }), { maxLength: 60 });
const gapArb = fc.double({ min: 1e-4, max: 5, noNaN: true });

describe("mergeReach", () => {
  it("joins a known sweep into the expected intervals (hand-worked example)", () => {
    // 10 MHz steps from 150 to 150.05 GHz, a hole, then 151.0–151.02 and a lone point at 160
    const pts = [150, 150.01, 150.02, 150.03, 150.04, 150.05, 151.0, 151.01, 151.02, 160];
    const m = mergeReach(pts, 0.015);
    expect(m.intervals).toEqual([
      { minGHz: 150, maxGHz: 150.05 },
      { minGHz: 151.0, maxGHz: 151.02 },
    ]);
    expect(m.isolatedGHz).toEqual([160]);
  });

  it("treats a neighbour exactly one gap away as a new interval (closer than, strictly)", () => {
    expect(mergeReach([1, 2, 3], 1).intervals).toEqual([]);
    expect(mergeReach([1, 2, 3], 1).isolatedGHz).toEqual([1, 2, 3]);
  });

  it("never produces overlapping intervals; they are sorted and separated by at least the gap", () => {
    fc.assert(
      fc.property(pointsArb, gapArb, (pts, gap) => {
        const { intervals } = mergeReach(pts, gap);
        for (const iv of intervals) expect(iv.minGHz).toBeLessThan(iv.maxGHz);
        for (let i = 1; i < intervals.length; i++)
          expect(
            (intervals[i] as { minGHz: number }).minGHz - (intervals[i - 1] as { maxGHz: number }).maxGHz,
          ).toBeGreaterThanOrEqual(gap);
      }),
      { numRuns: 300 },
    );
  });

  it("puts every point in exactly one interval or lists it as isolated", () => {
    fc.assert(
      fc.property(pointsArb, gapArb, (pts, gap) => {
        const { intervals, isolatedGHz } = mergeReach(pts, gap);
        for (const p of pts) {
          const inside = intervals.filter((iv) => p >= iv.minGHz && p <= iv.maxGHz).length;
          const lone = isolatedGHz.includes(p);
          expect(inside + (lone ? 1 : 0)).toBe(1);
        }
      }),
      { numRuns: 300 },
    );
  });

  it("agrees with a simpler union-find clustering", () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -50, max: 50 }), { maxLength: 25 }),
        fc.integer({ min: 1, max: 6 }),
        (ints, g) => {
          const { intervals, isolatedGHz } = mergeReach(ints, g);
          const fromMerge = [...intervals.map((iv) => [iv.minGHz, iv.maxGHz]), ...isolatedGHz.map((p) => [p, p])].sort(
            (x, y) => (x[0] as number) - (y[0] as number),
          );
          expect(fromMerge).toEqual(naiveClusters(ints, g));
        },
      ),
      { numRuns: 200 },
    );
  });
});
