import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parsePlan, type Plan } from "@/schemas/plan";
import { checkChainAtOffset, checkPlan, RESULT_FORMAT, type ResultDocument } from "@/lib/plan";
import sharedLaser from "../../../docs/examples/shared-laser.plan.json";
import ex1 from "../../../tests/fixtures/plans/ex1-single-channel.plan.json";
import { demoPlan } from "./demo-plan";
import { recheckAtOffset } from "./recheck-at-offset";

function parsed(input: unknown): Plan {
  const p = parsePlan(input);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.plan;
}

/** A result document built chain by chain with recheckAtOffset from an empty one. */
function assembled(plan: Plan): ResultDocument {
  let result: ResultDocument = {
    format: RESULT_FORMAT,
    chains: [],
    channels: plan.channels.map((c) => ({
      id: c.id,
      ifSlotGHz: null,
      occupiedGHz: null,
      imageGHz: null,
      imageRejectionDB: null,
      radiometricBandwidthMHz: null,
      nedtK: null,
      lockReplicaDB: 0,
      envelope: {
        worstNedtK: null,
        worstNedtAt: null,
        worstRadiometricBandwidthMHz: null,
        worstRadiometricBandwidthAt: null,
        worstImageRejectionDB: null,
        worstImageRejectionAt: null,
        worstModeResponse: 1,
        worstModeResponseAt: { loShiftMHz: 0, temperatureOffsetK: 0 },
        centreErrorMHz: null,
        centreErrorAt: null,
      },
    })),
    spurs: [],
    findings: [],
  };
  for (const c of plan.chains) result = recheckAtOffset(plan, result, c.id, c.loOffsetGHz).result;
  return result;
}

describe("recheckAtOffset", () => {
  const plan = parsed(ex1);

  it("known answer: example 1 at L = 184.81 GHz gives the IF slot 1.495–1.505 GHz (docs/plan-format.md §8.3 'Channel figures at L = 184.81')", () => {
    const r = assembled(plan);
    const ch = r.channels.find((c) => c.id === "wv1");
    expect(ch?.ifSlotGHz?.[0]).toBeCloseTo(1.495, 9);
    expect(ch?.ifSlotGHz?.[1]).toBeCloseTo(1.505, 9);
    expect(ch?.occupiedGHz?.[0]).toBeCloseTo(1.475, 9);
    // NEΔT 17.92 K (docs/plan-format.md §8.3, rounded there to 0.01 K)
    expect(ch?.nedtK).toBeCloseTo(17.92, 1);
  });

  it("gives the findings the engine's checkChainAtOffset gives, for any LO of any demo chain", () => {
    const demo = parsed(demoPlan(12));
    const base = assembled(demo);
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 3 }), fc.double({ min: -8, max: 8, noNaN: true }), (k, dL) => {
        const chain = demo.chains[k]!;
        const L = chain.loOffsetGHz + dL;
        const { plan: moved, result } = recheckAtOffset(demo, base, chain.id, L);
        expect(moved.chains[k]?.loOffsetGHz).toBe(L);
        expect(result.findings.filter((f) => f.chain === chain.id)).toEqual(checkChainAtOffset(demo, chain.id, L));
        // the other chains are untouched
        for (const other of demo.chains) {
          if (other.id === chain.id) continue;
          expect(result.findings.filter((f) => f.chain === other.id)).toEqual(
            base.findings.filter((f) => f.chain === other.id),
          );
          expect(result.spurs.filter((s) => s.chain === other.id)).toEqual(
            base.spurs.filter((s) => s.chain === other.id),
          );
        }
        // the findings stay grouped by chain in input order
        const order = result.findings.map((f) => demo.chains.findIndex((c) => c.id === f.chain));
        expect([...order].sort((a, b) => a - b)).toEqual(order);
      }),
      { numRuns: 40 },
    );
  });
});

describe("recheckAtOffset with an observation schedule", () => {
  it("equals checkPlan of the moved plan, schedules included (the retunes change with the LO)", () => {
    const plan = parsed(sharedLaser);
    const moved = recheckAtOffset(plan, checkPlan(plan), "B240", 242.5);
    expect(moved.plan.chains[1]!.loOffsetGHz).toBe(242.5);
    expect(moved.result).toEqual(checkPlan(moved.plan));
    expect(moved.result.schedules![0]!.dwells[1]!.loStepGHz).toBeCloseTo(61, 9);
  });
});
