import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { combDistanceAtLevel, combIntegral, combPeak, combResponse } from "./comb";
import { lorentzian, lorentzianIntegral } from "./lorentz";
import { integratePiecewise } from "./numeric-reference.test-util";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** Brute-force Σₙ Mₙ(x) over |n| ≤ N, plus the analytic tail Σ_{|n|>N} ≈ 2·(δ/2)²/(fsr²·N) (the sum of 1/n² tails). */
function bruteComb(x: number, fsr: number, delta: number, N = 20000): number {
  let s = 0;
  const n0 = Math.round(x / fsr);
  for (let n = n0 - N; n <= n0 + N; n++) s += lorentzian(x, n * fsr, delta);
  return s + (2 * (delta / 2) ** 2) / (fsr * fsr * N);
}

describe("comb C(x) = Σₙ Mₙ(x)", () => {
  it("closed form agrees with a brute-force sum over n (docs/plan-format.md §3.1 comb formula; common practice check)", () => {
    for (const [fsr, delta] of [
      [183.31, 0.01934],
      [118.75, 0.97],
      [10, 4],
      [1, 3],
    ] as const) {
      for (const x of [0, 0.003, 1.7, fsr / 2, -fsr / 3, 2.5 * fsr + 0.1]) {
        expect(rel(combResponse(x, { fsr, delta }), bruteComb(x, fsr, delta))).toBeLessThan(1e-7);
      }
    }
  });

  it("peak is π·a·coth(πa) and approaches 1 for a narrow mode", () => {
    const comb = { fsr: 183.31, delta: 0.01934 };
    expect(rel(combPeak(comb), combResponse(0, comb))).toBeLessThan(1e-12);
    expect(combPeak(comb)).toBeCloseTo(1, 6);
  });

  it("stays finite for a mode far wider than the FSR (C → π·a)", () => {
    const comb = { fsr: 1, delta: 1e4 };
    const a = 1e4 / 2;
    expect(rel(combResponse(0.3, comb), Math.PI * a)).toBeLessThan(1e-12);
    expect(rel(combIntegral(0, 2, comb), 2 * Math.PI * a)).toBeLessThan(1e-9);
  });

  it("integral over one period is π·δ/2 and over k periods k·π·δ/2", () => {
    const comb = { fsr: 100, delta: 0.05 };
    expect(rel(combIntegral(-50, 50, comb), (Math.PI * 0.05) / 2)).toBeLessThan(1e-12);
    expect(rel(combIntegral(13, 313, comb), (3 * Math.PI * 0.05) / 2)).toBeLessThan(1e-12);
  });

  it("closed-form integral agrees with adaptive Simpson (split at the mode centres) and with summed Lorentzian integrals (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 400, noNaN: true }),
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: 1e-4, max: 300, noNaN: true }),
        (fsr, delta, x1, width) => {
          const comb = { fsr, delta };
          const x2 = x1 + width;
          const closed = combIntegral(x1, x2, comb);
          const cuts: number[] = [];
          for (let n = Math.ceil(x1 / fsr); n * fsr < x2; n++) cuts.push(n * fsr);
          const simpson = integratePiecewise((x) => combResponse(x, comb), x1, x2, cuts, 1e-12);
          expect(rel(closed, simpson)).toBeLessThan(1e-6);
          let summed = 0;
          const n0 = Math.round(x1 / fsr);
          const N = 3000;
          for (let n = n0 - N; n <= n0 + N + Math.ceil(width / fsr); n++)
            summed += lorentzianIntegral(x1, x2, n * fsr, delta);
          // modes beyond ±N: each adds ≈ width·(δ/2)²/(n·fsr)², summed over both tails ≈ 2·width·(δ/2)²/(fsr²·N)
          summed += (2 * width * (delta / 2) ** 2) / (fsr * fsr * N);
          expect(rel(closed, summed)).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 100 },
    );
  });

  it("keeps relative accuracy far from every mode (narrow band half-way between modes)", () => {
    const comb = { fsr: 183.31, delta: 0.00193 };
    const x1 = 91.6;
    const x2 = 91.61;
    const simpson = integratePiecewise((x) => combResponse(x, comb), x1, x2, [], 1e-13);
    expect(rel(combIntegral(x1, x2, comb), simpson)).toBeLessThan(1e-9);
  });

  it("combDistanceAtLevel inverts the comb", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 400, noNaN: true }),
        fc.double({ min: 1e-3, max: 5, noNaN: true }),
        fc.double({ min: 0.001, max: 0.49, noNaN: true }),
        (fsr, delta, frac) => {
          const comb = { fsr, delta };
          const level = combResponse(frac * fsr, comb);
          expect(Math.abs(combDistanceAtLevel(level, comb) - frac * fsr)).toBeLessThan(1e-6 * fsr);
        },
      ),
    );
    const comb = { fsr: 10, delta: 1 };
    expect(combDistanceAtLevel(combPeak(comb) * 2, comb)).toBe(0);
    expect(combDistanceAtLevel(combResponse(5, comb) / 2, comb)).toBe(Infinity);
  });
});
