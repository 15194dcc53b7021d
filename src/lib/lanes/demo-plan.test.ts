import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parsePlan } from "@/schemas/plan";
import { demoPlan } from "./demo-plan";

describe("demoPlan", () => {
  it("is a valid plan document with the asked number of channels, spread over four chains", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 256 }), (n) => {
        const parsed = parsePlan(demoPlan(n));
        if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues.slice(0, 3)));
        expect(parsed.plan.channels).toHaveLength(n);
        expect(parsed.plan.chains).toHaveLength(4);
        expect(parsed.plan.name).toMatch(/^Demo data/);
      }),
      { numRuns: 30 },
    );
  });
  it("puts 16 channels per chain for 64, all within half a linewidth of the wanted mode", () => {
    const plan = demoPlan(64);
    for (const chain of plan.chains) {
      const res = plan.resonators.find((r) => r.id === chain.resonator)!;
      const delta = (193.4 * 1000) / res.loadedQ; // δ = carrierTHz·1000/loadedQ (docs/plan-format.md §3.1 "Per chain")
      const chs = plan.channels.filter((c) => c.chain === chain.id);
      expect(chs).toHaveLength(16);
      for (const c of chs) expect(Math.abs(c.centerGHz - chain.mode * res.fsrGHz)).toBeLessThanOrEqual(delta / 2);
    }
  });
});
