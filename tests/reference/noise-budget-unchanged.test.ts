import { readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import { resultDocumentSchema } from "@/schemas/result";
import { parsePlan, type Plan } from "@/schemas/plan";
import { arbitraryPlan } from "../fixtures/plans/builders";
import { digest, resultDigests, TODAY_RUNS } from "../fixtures/noise-budget/digest";

// A plan with none of the noise-budget inputs gives exactly today's results
// (issue 12; docs/plan-format.md §14.7): tests/fixtures/noise-budget/today-results.json
// holds the SHA-256 of the full result JSON (every field and message) of the
// two worked examples and of 120 seeded generated plans, written by
// record-today.ts in that folder on the engine before the noise budget (commit 157dd27).

const today = JSON.parse(
  readFileSync(join(__dirname, "../fixtures/noise-budget/today-results.json"), "utf8"),
) as string[];

describe("a plan without the noise inputs gives exactly today's results", () => {
  it("on the recorded sample: every result is the same, to the byte", () => {
    expect(today).toHaveLength(TODAY_RUNS + 2);
    expect(resultDigests()).toEqual(today);
  }, 60_000);

  it("property: an entered η alone adds the budget and the optimal LO power and changes nothing else", () => {
    fc.assert(
      fc.property(arbitraryPlan(), fc.double({ min: 1e-3, max: 1, noNaN: true }), (plan, eta) => {
        const before = checkPlan(plan);
        const doc = structuredClone(plan) as Plan;
        for (const r of doc.resonators) r.conversionEfficiency = eta;
        const parsed = parsePlan(doc);
        expect(parsed.ok).toBe(true);
        if (!parsed.ok) return;
        const after = checkPlan(parsed.plan);
        expect(resultDocumentSchema.safeParse(after).success).toBe(true);
        const stripped = {
          ...after,
          chains: after.chains.map(({ optimalLoPowerMW: _o, ...c }) => c),
          channels: after.channels.map(({ noiseBudget: _b, ...c }) => c),
          // the one wording a budget adds to: carrier-dominates-lo states its penalty
          findings: after.findings.map((f) => (f.code === "carrier-dominates-lo" ? { ...f, message: "" } : f)),
        };
        const base = {
          ...before,
          findings: before.findings.map((f) => (f.code === "carrier-dominates-lo" ? { ...f, message: "" } : f)),
        };
        expect(digest(stripped as typeof before)).toBe(digest(base));
        for (const c of after.channels) expect(c.noiseBudget?.source).toBe("entered");
      }),
      { numRuns: 30 },
    );
  }, 120_000);
});
