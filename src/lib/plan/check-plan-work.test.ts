import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { type PlanInput, parsePlan } from "@/schemas/plan";
import { arbitraryPlan } from "../../../tests/fixtures/plans/builders";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";
import { checkPlan } from "./check-plan";
import { MAX_LOCK_ORDER_ENUMERATED } from "./internals/spurs";

/** Chain A of the test plan alone, both channels double-sideband and the IF not sampled: only lock orders count. */
function lockOnlyPlan(orders: number): PlanInput {
  const d = validPlanInput();
  d.chains = d.chains.filter((c) => c.id === "A");
  d.channels = d.channels.filter((c) => c.chain === "A");
  d.channels[0]!.dsbOffsetGHz = 1;
  d.lasers[0]!.lock.orders = orders;
  d.lasers[0]!.driftMHz = 20; // D = 0.02 GHz, as the hand count below assumes
  return d;
}

function stepsOf(input: unknown): number {
  const r = parsePlan(input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  const work = { steps: 0 };
  checkPlan(r.plan, { work });
  return work.steps;
}

describe("checkPlan work steps", () => {
  it("known answer: the lock orders of chain A, counted by hand from the enumeration bounds", () => {
    // fm = 0.06 GHz, D = 0.02 GHz, detector up to 6 GHz (reachIF = 6.02 GHz), LO 184.81 GHz, reach 150–200 GHz.
    // At the LO: lock-lo orders m with |L − m·fm| ≤ 6.02: m = 2980 … 3180 (201); L + m·fm: none;
    //   lock-self m·fm ≤ 6: m = 1 … 100 (100).
    // Map over the reach: k·fm in [150 − 6.02, 200 + 6.02]: k = 2400 … 3433 (1034); lock-self 100.
    // DSB channels only and no sampling: no image search, no zone edges.
    expect(stepsOf(lockOnlyPlan(10_000))).toBe(201 + 100 + 1034 + 100);
    // two orders: only the lock-self tones m = 1 … 2·2 are enumerated, at the LO and over the reach
    expect(stepsOf(lockOnlyPlan(2))).toBe(4 + 4);
  });

  it("lock orders beyond the engine's limit add no work", () => {
    expect(stepsOf(lockOnlyPlan(1e12))).toBe(stepsOf(lockOnlyPlan(MAX_LOCK_ORDER_ENUMERATED)));
  });

  it("property: counting changes nothing in the result, and the count is the same every time", () => {
    fc.assert(
      fc.property(arbitraryPlan(), (plan) => {
        const work = { steps: 0 };
        const counted = checkPlan(plan, { work });
        expect(counted).toEqual(checkPlan(plan));
        const again = { steps: 0 };
        checkPlan(plan, { work: again });
        expect(again.steps).toBe(work.steps);
        expect(Number.isInteger(work.steps) && work.steps >= 0).toBe(true);
      }),
      { numRuns: 40 },
    );
  });

  it("property: more lock orders never mean less work", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 20_000 }), fc.integer({ min: 1, max: 20_000 }), (a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        expect(stepsOf(lockOnlyPlan(lo))).toBeLessThanOrEqual(stepsOf(lockOnlyPlan(hi)));
      }),
      { numRuns: 30 },
    );
  });
});
