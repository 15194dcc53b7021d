import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parsePlan, type Plan } from "@/schemas/plan";
import { checkPlan } from "@/lib/plan";
import ex2 from "../../../tests/fixtures/plans/ex2-lower-sideband-sampled.plan.json";
import { buildLaneModel } from "./build-lane-model";
import { demoPlan } from "./demo-plan";
import { laneModelByChain } from "./lane-model-by-chain";
import { laneReference } from "./lane-reference";
import { recheckAtOffset } from "./recheck-at-offset";
import type { LaneModel } from "./types";

function parsed(input: unknown): Plan {
  const p = parsePlan(input);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.plan;
}

const key = (m: LaneModel) =>
  new Map(
    m.items.map((i) => [
      i.id,
      [
        i.lane,
        i.kind,
        i.row,
        i.lo,
        i.hi,
        i.severity,
        i.codes.join(" "),
        i.label,
        i.facts.map((f) => f.join("=")).join(";"),
      ],
    ]),
  );

describe("laneModelByChain", () => {
  const ref = laneReference();
  const demo = parsed(demoPlan(12));
  const demoResult = checkPlan(demo);

  it("gives the same items, lanes and extents as buildLaneModel (example 2 and a 12-channel demo plan)", () => {
    for (const plan of [parsed(ex2), demo]) {
      const result = checkPlan(plan);
      const whole = buildLaneModel(plan, result, ref);
      const { model } = laneModelByChain(plan, result, ref);
      expect(key(model)).toEqual(key(whole));
      expect(model.items).toHaveLength(whole.items.length);
      expect(model.lanes.map((l) => l.id).sort()).toEqual(whole.lanes.map((l) => l.id).sort());
      expect(model.extentGHz).toEqual(whole.extentGHz);
      expect(model.focusGHz).toEqual(whole.focusGHz);
      expect(model.extentIF).toEqual(whole.extentIF);
    }
  });

  it("after moving one chain's LO, rebuilds only that chain and still equals a whole build", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 3 }), fc.double({ min: -6, max: 6, noNaN: true }), (k, dL) => {
        const first = laneModelByChain(demo, demoResult, ref);
        const chain = demo.chains[k]!;
        const moved = recheckAtOffset(demo, demoResult, chain.id, chain.loOffsetGHz + dL);
        const second = laneModelByChain(moved.plan, moved.result, ref, first.parts);
        for (const c of demo.chains) {
          const reused = second.parts.chains.get(c.id)?.model === first.parts.chains.get(c.id)?.model;
          expect(reused).toBe(c.id !== chain.id);
        }
        expect(key(second.model)).toEqual(key(buildLaneModel(moved.plan, moved.result, ref)));
      }),
      {
        numRuns: 12,
        // Regression: moving chain 0 by −0.7275 GHz moves an image band so that
        // the 86–92 GHz protected band comes within the reference margin; the
        // chain-by-chain build kept the old reference items.
        examples: [[0, -0.7274999999999993]],
      },
    );
  });
});
