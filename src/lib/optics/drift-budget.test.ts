import fc from "fast-check";
import { norm } from "mathjs";
import { describe, expect, it } from "vitest";
import { driftBudget, type DriftBudgetInput } from "./drift-budget";

const nonNeg = (max: number) => fc.double({ min: 0, max, noNaN: true });
const input = fc.record({
  laser2MHz: nonNeg(1000),
  resonatorMilliK: nonNeg(100),
  modeShiftGHzPerK: fc.double({ min: -20, max: 20, noNaN: true }),
  lockOffsetMHz: nonNeg(100),
  stepMHz: nonNeg(1000),
});

describe("driftBudget", () => {
  it("adds the terms of the drift bookkeeping (docs/helpers.md, Drift budget)", () => {
    // Worked by hand: laser 2 ±10 MHz, 1 mK at −6.2 GHz/K (= 6.2 MHz), lock 0.5 MHz, step 10 MHz (half = 5)
    const base: Omit<DriftBudgetInput, "combine"> = {
      laser2MHz: 10,
      resonatorMilliK: 1,
      modeShiftGHzPerK: -6.2,
      lockOffsetMHz: 0.5,
      stepMHz: 10,
    };
    const worst = driftBudget({ ...base, combine: "worst-case" });
    expect(worst.driftMHz).toBeCloseTo(10 + 6.2 + 0.5 + 5, 12);
    expect(worst.terms.find((t) => t.key === "resonator")?.mhz).toBeCloseTo(6.2, 12);
    const rss = driftBudget({ ...base, combine: "rss" });
    expect(rss.driftMHz).toBeCloseTo(Math.sqrt(100 + 6.2 ** 2 + 0.25 + 25), 12);
    // derived (docs/helpers.md, Drift budget): 6.2 MHz per mK of resonator temperature error
    expect(
      driftBudget({ ...base, laser2MHz: 0, lockOffsetMHz: 0, stepMHz: 0, combine: "worst-case" }).driftMHz,
    ).toBeCloseTo(6.2, 12);
  });

  it("root-sum-square never exceeds the worst case", () => {
    fc.assert(
      fc.property(input, (i) => {
        const worst = driftBudget({ ...i, combine: "worst-case" }).driftMHz;
        const rss = driftBudget({ ...i, combine: "rss" }).driftMHz;
        expect(rss).toBeLessThanOrEqual(worst * (1 + 1e-12));
        // and is at least the largest single term
        const largest = Math.max(...driftBudget({ ...i, combine: "rss" }).terms.map((t) => t.mhz));
        expect(rss).toBeGreaterThanOrEqual(largest * (1 - 1e-12));
      }),
    );
  });

  it("agrees with the generic 1-norm and 2-norm of the term vector (mathjs)", () => {
    fc.assert(
      fc.property(input, (i) => {
        const terms = driftBudget({ ...i, combine: "rss" }).terms.map((t) => t.mhz);
        expect(driftBudget({ ...i, combine: "rss" }).driftMHz).toBeCloseTo(norm(terms, 2) as number, 9);
        expect(driftBudget({ ...i, combine: "worst-case" }).driftMHz).toBeCloseTo(norm(terms, 1) as number, 9);
      }),
    );
  });

  it("ignores the sign of the mode shift", () => {
    fc.assert(
      fc.property(input, (i) => {
        const a = driftBudget({ ...i, combine: "worst-case" }).driftMHz;
        const b = driftBudget({ ...i, modeShiftGHzPerK: -i.modeShiftGHzPerK, combine: "worst-case" }).driftMHz;
        expect(a).toBe(b);
      }),
    );
  });

  it("refuses negative or non-finite terms, naming the field", () => {
    const ok: DriftBudgetInput = {
      laser2MHz: 1,
      resonatorMilliK: 1,
      modeShiftGHzPerK: -6.2,
      lockOffsetMHz: 0,
      stepMHz: 0,
      combine: "rss",
    };
    expect(() => driftBudget({ ...ok, laser2MHz: -1 })).toThrow(/laser2MHz/);
    expect(() => driftBudget({ ...ok, resonatorMilliK: Number.NaN })).toThrow(/resonatorMilliK/);
    expect(() => driftBudget({ ...ok, combine: "max" as "rss" })).toThrow(/combine/);
  });
});
