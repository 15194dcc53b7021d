import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { example1, example2, fixtureExpected } from "../../../tests/fixtures/plans/builders";
import { feasibilityMap } from "./feasibility-map";
import { arbitrarySmallPlan } from "./map-plans.test-util";
import { placeLo } from "./place-lo";

/** Example 1 with another tuning step (MHz). */
const withStep = (stepMHz: number) => example1((p) => void (p.lasers[0]!.stepMHz = stepMHz));

describe("placeLo", () => {
  it("reproduces the place of both worked examples", () => {
    for (const [name, plan, chain] of [
      ["ex1-single-channel", example1(), "A"],
      ["ex2-lower-sideband-sampled", example2(), "O2"],
    ] as const) {
      const want = fixtureExpected(name).chains[0]!;
      const got = placeLo(plan, chain, feasibilityMap(plan, chain).feasibleGHz);
      expect(got.placeReason).toBe(want.placeReason);
      expect(got.placeGHz).toBeCloseTo(want.placeGHz!, 6);
    }
  });

  it("example 1 by hand: equal widths go to the smaller |midpoint|, a half step to the smaller |L|", () => {
    // [177.335, 182.995] and [183.625, 189.285] are both 5.66 GHz wide; midpoints 180.165 and
    // 186.455, so the first wins. 180.165 lies exactly half-way between the 10 MHz multiples
    // 180.16 and 180.17: the one with the smaller |L|, 180.16, is chosen.
    const plan = example1();
    expect(
      placeLo(plan, "A", [
        [177.335, 182.995],
        [183.625, 189.285],
      ]),
    ).toEqual({ placeGHz: 180.16, placeReason: null });
    // on the negative side the smaller |L| is the upper multiple
    expect(placeLo(plan, "A", [[-182.995, -177.335]])).toEqual({ placeGHz: -180.16, placeReason: null });
  });

  it("takes the widest interval (after rounding widths to 1 kHz) and rounds to the nearest multiple", () => {
    const plan = withStep(10);
    // widths 2 GHz and 2.0000004 GHz: equal at 1 kHz, the smaller |midpoint| (11) wins
    expect(
      placeLo(plan, "A", [
        [10, 12],
        [20, 22.0000004],
      ]).placeGHz,
    ).toBe(11);
    // 3 GHz beats 2 GHz; midpoint 21.5013 → nearest 10 MHz multiple 21.5
    expect(
      placeLo(plan, "A", [
        [10, 12],
        [20.0013, 23.0013],
      ]).placeGHz,
    ).toBe(21.5);
  });

  it("a narrow interval holding one multiple places on it, not on the nearest multiple outside", () => {
    // [1.004, 1.012] holds only 1.01 (step 10 MHz); the midpoint 1.008 would round to 1.01 anyway,
    // but [1.0095, 1.0101] (midpoint 1.0098) must give 1.01 as well, the only multiple inside.
    const plan = withStep(10);
    expect(placeLo(plan, "A", [[1.0095, 1.0101]]).placeGHz).toBe(1.01);
  });

  it("skips intervals with no multiple of the step; none left is no-grid-point", () => {
    const plan = withStep(100);
    expect(
      placeLo(plan, "A", [
        [1.01, 1.09],
        [2.05, 2.15],
      ]).placeGHz,
    ).toBe(2.1);
    expect(placeLo(plan, "A", [[1.01, 1.09]])).toEqual({ placeGHz: null, placeReason: "no-grid-point" });
    expect(placeLo(plan, "A", [])).toEqual({ placeGHz: null, placeReason: "no-feasible-interval" });
  });

  it("a zero step places at the midpoint of the widest interval", () => {
    expect(
      placeLo(withStep(0), "A", [
        [1.0001, 1.0003],
        [2, 2.00033],
      ]).placeGHz,
    ).toBeCloseTo(2.000165, 12);
  });

  it("on random plans: lands on a step multiple inside a feasible interval of the greatest width", () => {
    fc.assert(
      fc.property(arbitrarySmallPlan(), (plan) => {
        const feasible = feasibilityMap(plan, "A").feasibleGHz;
        const step = plan.lasers[0]!.stepMHz / 1000;
        const got = placeLo(plan, "A", feasible);
        // independent candidate list: intervals holding a multiple k·step (any point for step 0)
        const holds = (iv: [number, number]) =>
          step === 0 || Math.floor(iv[1] / step + 1e-7) >= Math.ceil(iv[0] / step - 1e-7);
        const candidates = feasible.filter(holds);
        if (candidates.length === 0) {
          expect(got.placeGHz).toBeNull();
          expect(got.placeReason).toBe(feasible.length === 0 ? "no-feasible-interval" : "no-grid-point");
          return;
        }
        expect(got.placeReason).toBeNull();
        const L = got.placeGHz!;
        const home = candidates.find((iv) => L >= iv[0] - 1e-9 && L <= iv[1] + 1e-9);
        expect(home).toBeDefined();
        if (step > 0) expect(Math.abs(L / step - Math.round(L / step))).toBeLessThan(1e-6);
        const widest = Math.max(...candidates.map((iv) => Math.round((iv[1] - iv[0]) * 1e6)));
        expect(Math.round((home![1] - home![0]) * 1e6)).toBe(widest);
        // no other multiple inside the chosen interval is closer to its midpoint
        const mid = (home![0] + home![1]) / 2;
        if (step > 0) {
          for (const k of [Math.floor(mid / step), Math.ceil(mid / step)]) {
            const v = k * step;
            if (v >= home![0] && v <= home![1]) expect(Math.abs(L - mid)).toBeLessThanOrEqual(Math.abs(v - mid) + 1e-9);
          }
        } else expect(L).toBeCloseTo(mid, 12);
      }),
      { numRuns: 300 },
    );
  }, 60_000);
});
