import fc from "fast-check";
import besselj0 from "@stdlib/math-base-special-besselj0";
import besselj1 from "@stdlib/math-base-special-besselj1";
import { describe, expect, it } from "vitest";
import { besselJ, besselJLog10Parts } from "./bessel";

describe("besselJ (power series, Abramowitz & Stegun 9.1.10)", () => {
  it("agrees with @stdlib besselj0/besselj1 on 0 < β < 2.4 (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 2.4, noNaN: true }), (beta) => {
        expect(Math.abs(besselJ(0, beta) - besselj0(beta))).toBeLessThan(1e-14);
        expect(Math.abs(besselJ(1, beta) - besselj1(beta))).toBeLessThan(1e-14);
      }),
      { numRuns: 500 },
    );
  });

  it("satisfies the recurrence J_{m+1} = (2m/β)·J_m − J_{m−1} (A&S 9.1.27) for m = 1..5 (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 2.4, noNaN: true }), fc.integer({ min: 1, max: 5 }), (beta, m) => {
        const lhs = besselJ(m + 1, beta);
        const rhs = ((2 * m) / beta) * besselJ(m, beta) - besselJ(m - 1, beta);
        expect(Math.abs(lhs - rhs)).toBeLessThan(1e-13);
      }),
    );
  });

  it("known values: J0(1) = 0.7651976866, J1(1) = 0.4400505857, J2(1) = 0.1149034849 (A&S Table 9.1)", () => {
    expect(besselJ(0, 1)).toBeCloseTo(0.7651976866, 10);
    expect(besselJ(1, 1)).toBeCloseTo(0.4400505857, 10);
    expect(besselJ(2, 1)).toBeCloseTo(0.1149034849, 10);
  });

  it("split form reproduces J_m and stays finite where J_m underflows", () => {
    for (const [m, beta] of [
      [0, 0.5],
      [1, 1.2],
      [3, 2.3],
    ] as const) {
      const p = besselJLog10Parts(m, beta);
      expect(10 ** p.log10Lead * p.series).toBeCloseTo(besselJ(m, beta), 14);
    }
    const tiny = besselJLog10Parts(200, 1e-3);
    expect(Number.isFinite(tiny.log10Lead)).toBe(true);
    expect(besselJ(200, 1e-3)).toBe(0);
  });
});
