import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  absInterval,
  gap,
  insideOf,
  mergeIntervals,
  subScaled,
  addScaled,
  withinGuard,
  type Interval,
} from "./intervals";
import { foldFrequency, foldInterval, interiorNyquistEdge, nyquistZone } from "./nyquist";

const iv = fc
  .tuple(fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }))
  .map(([a, w]): Interval => [a, a + w]);

describe("interval arithmetic (docs/plan-format.md §1.3 and §5.5)", () => {
  it("gap is negative for overlapping intervals and the distance otherwise", () => {
    expect(gap([1, 2], [3, 5])).toBe(1);
    expect(gap([1, 4], [3, 5])).toBe(-1);
    expect(withinGuard([1.475, 1.525], [1.575, 1.6], 0.05)).toBe(false); // gap exactly at the guard
    expect(withinGuard([0, 1], [1.04999999999, 2], 0.05)).toBe(false); // 1e-9 allowance
    expect(withinGuard([0, 1], [1.0499, 2], 0.05)).toBe(true);
  });

  it("absolute value of a straddling interval is [0, max] and the abs image contains |x| of every point (property)", () => {
    expect(absInterval([-3, 2])).toEqual([0, 3]);
    expect(absInterval([-3, -2])).toEqual([2, 3]);
    fc.assert(
      fc.property(iv, fc.double({ min: 0, max: 1, noNaN: true }), (a, t) => {
        const x = a[0] + t * (a[1] - a[0]);
        const r = absInterval(a);
        expect(Math.abs(x)).toBeGreaterThanOrEqual(r[0] - 1e-12);
        expect(Math.abs(x)).toBeLessThanOrEqual(r[1] + 1e-12);
      }),
    );
  });

  it("a·X ± b·Y holds a·x ± b·y for every x ∈ X, y ∈ Y (property)", () => {
    fc.assert(
      fc.property(
        iv,
        iv,
        fc.integer({ min: 1, max: 5 }),
        fc.integer({ min: 1, max: 5 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (X, Y, a, b, s, t) => {
          const x = X[0] + s * (X[1] - X[0]);
          const y = Y[0] + t * (Y[1] - Y[0]);
          expect(insideOf([a * x + b * y, a * x + b * y], addScaled(a, X, b, Y))).toBe(true);
          expect(insideOf([a * x - b * y, a * x - b * y], subScaled(a, X, b, Y))).toBe(true);
        },
      ),
    );
  });

  it("IM3 of 1.0 and 1.1 GHz tones: 2f1 − f2 = 0.9 GHz, 2f2 − f1 = 1.2 GHz (derived check, docs/calculations.md)", () => {
    const f1: Interval = [1.0, 1.0];
    const f2: Interval = [1.1, 1.1];
    expect(absInterval(subScaled(2, f1, 1, f2))[0]).toBeCloseTo(0.9, 12);
    expect(absInterval(subScaled(2, f2, 1, f1))[0]).toBeCloseTo(1.2, 12);
  });

  it("merging joins overlapping and touching intervals and keeps the union (property)", () => {
    expect(
      mergeIntervals([
        [5, 6],
        [1, 2],
        [2, 3],
        [2.5, 4],
      ]),
    ).toEqual([
      [1, 4],
      [5, 6],
    ]);
    fc.assert(
      fc.property(fc.array(iv, { maxLength: 8 }), fc.double({ min: -60, max: 80, noNaN: true }), (list, x) => {
        const merged = mergeIntervals(list);
        const inList = list.some((a) => x >= a[0] && x <= a[1]);
        const inMerged = merged.some((a) => x >= a[0] && x <= a[1]);
        expect(inMerged).toBe(inList);
        for (let i = 1; i < merged.length; i++) expect(merged[i]![0]).toBeGreaterThan(merged[i - 1]![1]);
      }),
    );
  });
});

describe("Nyquist folding", () => {
  it("1.2 GHz sampled at 1 GHz aliases to 0.2 GHz in zone 3, upright (sampling theorem; derived in docs/plan-format.md §5.4)", () => {
    expect(foldFrequency(1.2, 1)).toBeCloseTo(0.2, 12);
    expect(nyquistZone(1.2, 1) + 1).toBe(3); // 1-based zone number
    // zone 3 (odd, 1-based) is upright: a rising frequency folds to a rising alias
    expect(foldFrequency(1.25, 1)).toBeGreaterThan(foldFrequency(1.2, 1));
    // zone 2 is inverted
    expect(foldFrequency(0.7, 1)).toBeCloseTo(0.3, 12);
  });

  it("the folded interval is exactly the set of folded points (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 30, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.double({ min: 0.5, max: 8, noNaN: true }),
        (lo, w, fs) => {
          const band: Interval = [lo, lo + w];
          const f = foldInterval(band, fs);
          let min = Infinity;
          let max = -Infinity;
          let outside = 0;
          for (let i = 0; i <= 500; i++) {
            const g = foldFrequency(lo + (w * i) / 500, fs);
            min = Math.min(min, g);
            max = Math.max(max, g);
            if (g < f[0] - 1e-9 || g > f[1] + 1e-9) outside++;
          }
          expect(outside).toBe(0);
          // sampled extremes approach the interval ends (within one sample step)
          const step = (w / 500) * 1.0001 + 1e-12;
          expect(min - f[0]).toBeLessThan(step);
          expect(f[1] - max).toBeLessThan(step);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("finds an interior multiple of fs/2 only beyond the 1e-9 allowance", () => {
    expect(interiorNyquistEdge([3.9, 4.1], 8)).toBe(4);
    expect(interiorNyquistEdge([4, 4.5], 8)).toBeNull();
    expect(interiorNyquistEdge([3.5, 4 + 5e-10], 8)).toBeNull();
    expect(interiorNyquistEdge([0.2, 7], 8)).toBe(4);
  });
});
