import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  atanDiff,
  lorentzian,
  lorentzianIntegral,
  lorentzianProductIntegral,
  lorentzianSquaredIntegral,
} from "./lorentz";
import { integratePiecewise } from "./numeric-reference.test-util";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("Lorentzian mode response", () => {
  it("is 1 at the centre and 1/2 at ±δ/2 (definition of FWHM)", () => {
    expect(lorentzian(5, 5, 0.02)).toBe(1);
    expect(lorentzian(5.01, 5, 0.02)).toBeCloseTo(0.5, 12);
    expect(lorentzian(4.99, 5, 0.02)).toBeCloseTo(0.5, 12);
  });

  it("integrates to π·δ/2 over the whole line (∫dx/(1+x²) = π)", () => {
    expect(lorentzianIntegral(-1e9, 1e9, 0, 0.002)).toBeCloseTo((Math.PI * 0.002) / 2, 12);
    // ∫M² over the whole line = π·δ/4
    expect(lorentzianSquaredIntegral(-1e9, 1e9, 0, 0.002)).toBeCloseTo((Math.PI * 0.002) / 4, 12);
  });

  it("keeps full relative accuracy far from the mode (no arctangent cancellation)", () => {
    // 3 GHz from a 2 MHz-wide mode over 10 MHz: ∫ ≈ B·(δ/(2·3))² to first order
    const delta = 0.002;
    const exact = lorentzianIntegral(3, 3.01, 0, delta);
    const approx = integratePiecewise((x) => lorentzian(x, 0, delta), 3, 3.01, [], 1e-13);
    expect(rel(exact, approx)).toBeLessThan(1e-9);
    // the naive difference of arctangents loses digits here
    const naive = (delta / 2) * (Math.atan((2 * 3.01) / delta) - Math.atan((2 * 3) / delta));
    expect(rel(naive, approx)).toBeGreaterThan(rel(exact, approx));
  });

  it("atanDiff equals atan(u2) − atan(u1) across the branch (1 + u1·u2 < 0)", () => {
    expect(atanDiff(-2, 3)).toBeCloseTo(Math.atan(3) - Math.atan(-2), 14);
    expect(atanDiff(-1e6, 1e6)).toBeCloseTo(Math.PI, 5);
  });

  it("closed forms agree with adaptive Simpson (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -5, max: 5, noNaN: true }),
        fc.double({ min: 1e-4, max: 2, noNaN: true }),
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        (x1, width, delta, x0) => {
          const x2 = x1 + width;
          const cuts = [x0];
          const i1 = integratePiecewise((x) => lorentzian(x, x0, delta), x1, x2, cuts, 1e-12);
          const i2 = integratePiecewise((x) => lorentzian(x, x0, delta) ** 2, x1, x2, cuts, 1e-12);
          expect(rel(lorentzianIntegral(x1, x2, x0, delta), i1)).toBeLessThan(1e-6);
          expect(rel(lorentzianSquaredIntegral(x1, x2, x0, delta), i2)).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("product of two equal-width Lorentzians agrees with adaptive Simpson, including near-equal centres (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: 1e-3, max: 3, noNaN: true }),
        fc.double({ min: -2, max: 2, noNaN: true }),
        fc.oneof(fc.double({ min: -2, max: 2, noNaN: true }), fc.double({ min: -1e-9, max: 1e-9, noNaN: true })),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        (y1, width, p1, dp, hw) => {
          const y2 = y1 + width;
          const p2 = p1 + dp;
          const f = (y: number) => (1 / (1 + ((y - p1) / hw) ** 2)) * (1 / (1 + ((y - p2) / hw) ** 2));
          const ref = integratePiecewise(f, y1, y2, [p1, p2], 1e-12);
          expect(rel(lorentzianProductIntegral(y1, y2, p1, p2, hw), ref)).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("product integral with equal centres is the squared integral", () => {
    const a = lorentzianProductIntegral(-0.3, 0.7, 0.1, 0.1, 0.05);
    const b = lorentzianSquaredIntegral(-0.3, 0.7, 0.1, 0.1);
    expect(rel(a, b)).toBeLessThan(1e-13);
  });
});
