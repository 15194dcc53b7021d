import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { example1 } from "../../../../tests/fixtures/plans/builders";
import { arbitrarySmallPlan } from "../map-plans.test-util";
import { imageRejectionAt } from "./image-rejection-at";
import { combIntegral, combRadius, combValue, imageRejectionDB, makeComb } from "./map-image";
import { imageFiringIntervals, imageFiringIntervalsByScan } from "./map-image-edges";
import { buildMapModel } from "./map-model";
import { slotFn } from "./map-rules";

const dbl = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/** Brute-force comb integral: the sum over modes of the Lorentzian arctangent integrals. */
function combIntegralBySum(lo: number, hi: number, delta: number, fsr: number): number {
  let s = 0;
  const n0 = Math.round((lo + hi) / 2 / fsr);
  for (let n = n0 - 200000; n <= n0 + 200000; n++) {
    s += (delta / 2) * (Math.atan((2 * (hi - n * fsr)) / delta) - Math.atan((2 * (lo - n * fsr)) / delta));
  }
  return s;
}

describe("image rule of the map", () => {
  it("comb integral: the closed form against the brute-force sum of Lorentzians", () => {
    // δ = 19.34 MHz, fsr = 183.31 GHz (example 1): 3 GHz from the mode the comb is ≈ (δ/2/3)²
    const c = makeComb(0.01934, 183.31);
    expect(combIntegral(c, 186.305, 186.315) / combIntegralBySum(186.305, 186.315, 0.01934, 183.31)).toBeCloseTo(1, 6);
    fc.assert(
      fc.property(dbl(0.01, 5), dbl(10, 200), dbl(-500, 500), dbl(1e-3, 3), (delta, fsr, lo, w) => {
        const k = makeComb(delta, fsr);
        const a = combIntegral(k, lo, lo + w);
        const b = combIntegralBySum(lo, lo + w, delta, fsr);
        // the brute-force sum is truncated at ±200 000 modes: its tail is ≈ (δ/2)²·w·2/(200 000·fsr)
        expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-6 * b + (delta * delta * w) / (2e5 * fsr));
      }),
      { numRuns: 40 },
    );
  }, 60_000);

  it("combRadius is where the comb falls to the level", () => {
    fc.assert(
      fc.property(dbl(0.001, 5), dbl(10, 200), dbl(-8, -1e-3), (delta, fsr, e) => {
        const c = makeComb(delta, fsr);
        const level = combValue(c, 0) * Math.pow(10, e);
        const r = combRadius(c, level);
        if (r >= fsr / 2) expect(combValue(c, fsr / 2)).toBeGreaterThanOrEqual(level * (1 - 1e-9));
        else expect(combValue(c, r) / level).toBeCloseTo(1, 6);
      }),
      { numRuns: 1000 },
    );
    // a level at or above the peak is never exceeded: no window at all
    const c = makeComb(0.02, 100);
    expect(combRadius(c, combValue(c, 0) * 1.01)).toBe(-1);
  });

  it("R(L) agrees with the engine's image rejection (example 1: 49.48 dB at L = 184.81)", () => {
    // expected value from the independently computed worked example (tests/fixtures/plans/ex1…expected.json)
    const plan = example1();
    const m = buildMapModel(plan, "A");
    const c = makeComb(m.linewidth, m.fsr);
    expect(imageRejectionDB(c, m, m.channels[0]!, 184.81)).toBeCloseTo(49.48171342092203, 6);
    fc.assert(
      fc.property(arbitrarySmallPlan(), dbl(0, 1), (p, f) => {
        const mm = buildMapModel(p, "A");
        const cc = makeComb(mm.linewidth, mm.fsr);
        const r = mm.reach[0]!;
        const L = r[0] + f * (r[1] - r[0]);
        for (const ch of mm.channels) {
          if (!ch.ssb || (L > ch.bands[0]![0] && L < ch.bands[0]![1])) continue;
          const mine = imageRejectionDB(cc, mm, ch, L);
          const theirs = imageRejectionAt(p, "A", ch.id, L);
          if (theirs === null || theirs === Infinity) expect(mine).toBe(Infinity);
          else expect(Math.abs(mine - theirs)).toBeLessThan(1e-9);
        }
      }),
      { numRuns: 300 },
    );
  }, 60_000);

  it("the monotone-run search finds exactly the crossings a point-by-point scan of the grid finds", () => {
    fc.assert(
      fc.property(arbitrarySmallPlan(), (p) => {
        const m = buildMapModel(p, "A");
        const c = makeComb(m.linewidth, m.fsr);
        for (const [r0, r1] of m.reach) {
          for (const ch of m.channels) {
            for (const piece of slotFn(ch, r0, r1)) {
              const fast = imageFiringIntervals(c, m, ch, piece.from, piece.to);
              const scan = imageFiringIntervalsByScan(c, m, ch, piece.from, piece.to);
              expect(fast).toEqual(scan);
            }
          }
        }
      }),
      { numRuns: 150 },
    );
  }, 60_000);

  it("the image windows of example 1 by hand: the rule fires only where X' nears the 183.31 GHz mode", () => {
    // ∫W over [183.305, 183.315] for δ = 19.34 MHz is ≈ 8.64e-3 GHz; the level
    // 10^(−2.5)·∫W/B ≈ 2.73e-3 is reached ≈ δ/2·sqrt(1/level − 1) ≈ 0.185 GHz from the mode.
    // The image X' = 2L − X is within that of 183.31 only for |L − 183.31| ≲ 0.1, so every
    // firing interval lies inside [183.2, 183.42], and the rule fires right next to the band.
    const plan = example1();
    const m = buildMapModel(plan, "A");
    const c = makeComb(m.linewidth, m.fsr);
    const ch = m.channels[0]!;
    const below = imageFiringIntervals(c, m, ch, 150, 183.305);
    const above = imageFiringIntervals(c, m, ch, 183.315, 200);
    expect(below.length).toBe(1);
    expect(above.length).toBe(1);
    expect(below[0]![0]).toBeGreaterThan(183.2);
    expect(below[0]![1]).toBe(183.305);
    expect(above[0]![0]).toBe(183.315);
    expect(above[0]![1]).toBeLessThan(183.42);
    // the edges are threshold crossings: R = 25 dB there (to the 1e-6 GHz bisection)
    expect(imageRejectionDB(c, m, ch, below[0]![0])).toBeCloseTo(25, 2);
    expect(imageRejectionDB(c, m, ch, above[0]![1])).toBeCloseTo(25, 2);
  });
});
