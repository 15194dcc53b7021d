import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { PlanInput } from "@/schemas/plan";
import { example1 } from "../../../tests/fixtures/plans/builders";
import { checkPlan } from "./check-plan";
import { noiseWhatIf } from "./noise-what-if";

type Doc = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const ex1 = (edit: (d: Doc) => void = () => {}) =>
  example1((p: PlanInput) => {
    const d = p as Doc;
    d.format = "heterolane.plan/2";
    d.resonators[0].conversionEfficiency = 0.01;
    d.channels[0].receiverKSource = "computed";
    edit(d);
  });

describe("noiseWhatIf", () => {
  it("without changes gives the full check's budget, NEΔT and optimal LO power", () => {
    const plan = ex1();
    const full = checkPlan(plan);
    const w = noiseWhatIf(plan, "A");
    expect(w.channels[0]!.budget).toEqual(full.channels[0]!.noiseBudget);
    expect(w.channels[0]!.nedtK).toBe(full.channels[0]!.nedtK);
    expect(w.optimalLoPowerMW).toBe(full.chains[0]!.optimalLoPowerMW);
    expect(w.pdInputMW).toBe(full.chains[0]!.pdInputMW);
  });

  it("a change equals the full check of the changed plan", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 8, noNaN: true }),
        fc.double({ min: 1, max: 40, noNaN: true }),
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 40, noNaN: true }),
        (lo, pump, eta, notch) => {
          const w = noiseWhatIf(ex1(), "A", {
            loPowerMW: lo,
            carrierPowerMW: pump,
            conversionEfficiency: eta,
            carrierRejectionDB: notch,
          });
          const full = checkPlan(
            ex1((d) => {
              d.lasers[0].loPowerMW = lo;
              d.lasers[0].carrierPowerMW = pump;
              d.resonators[0].conversionEfficiency = eta;
              d.chains[0].carrierRejectionDB = notch;
            }),
          );
          expect(w.channels[0]!.nedtK).toBe(full.channels[0]!.nedtK);
          expect(w.channels[0]!.budget!.totalK).toBe(full.channels[0]!.noiseBudget!.totalK);
        },
      ),
      { numRuns: 20 },
    );
  });

  it("the receiver-temperature budget is where NEΔT meets the requirement", () => {
    const w = noiseWhatIf(ex1(), "A");
    const budgetK = w.channels[0]!.receiverBudgetK!;
    expect(budgetK).toBeGreaterThan(0);
    const atBudget = checkPlan(
      ex1((d) => {
        d.resonators[0].conversionEfficiency = null;
        d.channels[0].receiverKSource = "entered";
        d.channels[0].receiverK = budgetK;
      }),
    ).channels[0]!.nedtK!;
    expect(atBudget).toBeCloseTo(20, 6); // example 1 requires 20 K
  });
});
