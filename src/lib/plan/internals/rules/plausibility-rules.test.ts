import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parsePlan, type Plan } from "@/schemas/plan";
import { validPlanArb } from "../../../../../tests/fixtures/plan-arbitrary";
import { validPlanInput } from "../../../../../tests/fixtures/valid-plan";
import { checkPlan } from "../../check-plan";
import { LITHIUM_NIOBATE_MAX_Q, PLAUSIBLE_RECEIVER_MAX_K, TELECOM_BAND_THZ } from "./plausibility-rules";

const CODES = ["carrier-outside-telecom", "q-beyond-lithium-niobate", "receiver-noise-implausible"];
const base = (): Plan => {
  const r = parsePlan(validPlanInput());
  if (!r.ok) throw new Error("fixture");
  return structuredClone(r.plan);
};
const plausibility = (p: Plan) => checkPlan(p).findings.filter((f) => CODES.includes(f.code));

describe("plausibility rules", () => {
  it("the telecom bands' edges: 1675 nm = 178.98 THz and 1260 nm = 237.93 THz (ITU-T G Suppl. 39 band table, from memory; c exact, SI 2019)", () => {
    expect(TELECOM_BAND_THZ[0]).toBeCloseTo(178.9806, 4);
    expect(TELECOM_BAND_THZ[1]).toBeCloseTo(237.9305, 4);
    // Independent: λ = c/f back to the band edges in nm.
    expect(299_792_458 / (TELECOM_BAND_THZ[0] * 1e12) / 1e-9).toBeCloseTo(1675, 9);
    expect(299_792_458 / (TELECOM_BAND_THZ[1] * 1e12) / 1e-9).toBeCloseTo(1260, 9);
  });

  it("the test plan (193.4 THz, Q ≤ 1e7, receivers of a few thousand K) is plausible", () => {
    expect(plausibility(base())).toEqual([]);
  });

  it("an absurd resonator, a carrier outside the bands and a hot receiver each give one warning in words", () => {
    const p = base();
    p.lasers[0]!.carrierTHz = 282; // 1064 nm: a bench laser, but no telecom band
    p.resonators[0]!.loadedQ = 5e10;
    p.channels[0]!.receiverK = 2e6;
    const f = plausibility(p);
    const chainOfLaser0 = p.chains.find((c) => c.laser === p.lasers[0]!.id)!.id;
    const chainsOfR0 = p.chains.filter((c) => c.resonator === p.resonators[0]!.id).map((c) => c.id);
    expect(f.filter((x) => x.code === "carrier-outside-telecom").map((x) => x.chain)).toEqual([chainOfLaser0]);
    expect(f.filter((x) => x.code === "q-beyond-lithium-niobate").map((x) => x.chain)).toEqual(chainsOfR0);
    expect(f.filter((x) => x.code === "receiver-noise-implausible").map((x) => x.channel)).toEqual([p.channels[0]!.id]);
    for (const x of f) {
      expect(x.severity).toBe("warning");
      expect(x.message).not.toMatch(/from memory|docs\//);
    }
    expect(f.find((x) => x.code === "q-beyond-lithium-niobate")!.message).toContain("lithium niobate");
  });

  it("the edges themselves are plausible; just beyond them is not", () => {
    const at = (edit: (p: Plan) => void) => {
      const p = base();
      edit(p);
      return plausibility(p).map((f) => f.code);
    };
    expect(at((p) => (p.lasers[0]!.carrierTHz = TELECOM_BAND_THZ[1]))).toEqual([]);
    expect(at((p) => (p.lasers[0]!.carrierTHz = TELECOM_BAND_THZ[1] * (1 + 1e-9)))).toContain(
      "carrier-outside-telecom",
    );
    expect(at((p) => (p.resonators[0]!.loadedQ = LITHIUM_NIOBATE_MAX_Q))).toEqual([]);
    expect(at((p) => (p.resonators[0]!.loadedQ = LITHIUM_NIOBATE_MAX_Q * 1.01))).toContain("q-beyond-lithium-niobate");
    expect(at((p) => (p.channels[0]!.receiverK = PLAUSIBLE_RECEIVER_MAX_K))).toEqual([]);
    expect(at((p) => (p.channels[0]!.receiverK = PLAUSIBLE_RECEIVER_MAX_K + 1))).toContain(
      "receiver-noise-implausible",
    );
  });

  it("property: agrees with a direct reading of the three thresholds on generated plans", () => {
    fc.assert(
      fc.property(validPlanArb, fc.double({ min: 150, max: 400, noNaN: true }), (doc, carrier) => {
        const r = parsePlan(doc);
        if (!r.ok) return;
        const p = structuredClone(r.plan);
        p.lasers[0]!.carrierTHz = carrier;
        const got = plausibility(p)
          .filter((f) => f.code === "carrier-outside-telecom")
          .map((f) => f.chain)
          .sort();
        const want = p.chains
          .filter((c) => {
            const f = p.lasers.find((l) => l.id === c.laser)!.carrierTHz;
            return f < TELECOM_BAND_THZ[0] || f > TELECOM_BAND_THZ[1];
          })
          .map((c) => c.id)
          .sort();
        expect(got).toEqual(want);
      }),
      { numRuns: 15 },
    );
  }, 60_000);
});
