import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ARG_TOL, maximise, minimise } from "./extremum";

describe("minimise and maximise (scan, then Brent's method)", () => {
  it("finds the vertex of a parabola inside the interval to the argument tolerance", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -5, max: 5, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        (x0, a, stepFrac) => {
          const lo = x0 - 3;
          const hi = x0 + 4;
          const r = minimise((x) => a * (x - x0) ** 2 + 1, lo, hi, stepFrac);
          // the value to rounding; the argument as far as values can tell it (a parabola is flat to
          // double precision within about sqrt(2.2e-16/a) of its vertex), never worse than the tolerance asks
          expect(r.fx - 1).toBeLessThan(1e-14 * (1 + a));
          expect(Math.abs(r.x - x0)).toBeLessThan(Math.max(10 * ARG_TOL, 3 * Math.sqrt(2.2e-16 / a)));
        },
      ),
      { numRuns: 200 },
    );
  });
  it("an extremum at an end is the end itself; equal extrema go to the smaller argument", () => {
    expect(minimise((x) => x, 2, 5, 0.5)).toEqual({ x: 2, fx: 2 });
    expect(maximise((x) => x, 2, 5, 0.5)).toEqual({ x: 5, fx: 5 });
    // cos has equal maxima at 0 and 2π
    const m = maximise(Math.cos, 0, 2 * Math.PI, 0.1);
    expect(m.x).toBe(0);
    // a function falling just inside its first step: the minimum is inside, not at the end
    const r = minimise((x) => (x - 0.01) ** 2, 0, 1, 0.5);
    expect(r.x).toBeCloseTo(0.01, 8);
  });
  it("a degenerate interval is one evaluation", () => {
    let n = 0;
    const r = minimise(
      (x) => {
        n++;
        return x * 2;
      },
      3,
      3,
      1,
    );
    expect(r).toEqual({ x: 3, fx: 6 });
    expect(n).toBe(1);
  });
  it("+∞ is never preferred to a finite value, also on a scale where 1e-12 relative of ∞ is ∞ (regression)", () => {
    // the image rejection is +∞ where nothing of the image gets in; with one scan step the finite
    // end must win (the map once found −2.24 dB there by an early stop while the full search said +∞)
    expect(minimise((x) => (x < 0 ? Infinity : -2.24), -0.04, 0.04, 1.2)).toEqual({ x: 0.04, fx: -2.24 });
    expect(maximise((x) => (x < 0 ? -Infinity : 3), -1, 1, 5).fx).toBe(3);
  });
  it("stops at the first value below stopBelow", () => {
    let n = 0;
    const r = minimise(
      (x) => {
        n++;
        return x;
      },
      0,
      10,
      1,
      { stopBelow: 0.5 },
    );
    expect(r.fx).toBeLessThan(0.5);
    expect(n).toBe(1);
  });
  it("finds the global minimum of a function with several dips (each bracketed one is refined)", () => {
    const f = (x: number) => Math.sin(3 * x) + 0.1 * x;
    const r = minimise(f, -3, 3, 0.05);
    let best = Infinity;
    for (let i = 0; i <= 600000; i++) best = Math.min(best, f(-3 + (6 * i) / 600000));
    expect(r.fx).toBeLessThanOrEqual(best + 1e-12);
    expect(best - r.fx).toBeLessThan(1e-9);
  });
});
