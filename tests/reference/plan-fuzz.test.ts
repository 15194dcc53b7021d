import { resultDocumentSchema } from "@/schemas/result";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { checkPlan, type ResultDocument } from "@/lib/plan";
import { parsePlan, type Plan } from "@/schemas/plan";
import { validPlanInput } from "../fixtures/valid-plan";
import { moderateMutationArb, mutate, validPlanArb } from "../fixtures/plan-arbitrary";

// Every plan the validator accepts can be checked: checkPlan never throws,
// and its result document is well-formed JSON (no NaN or Infinity, which
// JSON would silently turn into null), in input order.

function nonFinitePaths(v: unknown, path = "", out: string[] = []): string[] {
  if (typeof v === "number" && !Number.isFinite(v)) out.push(path);
  else if (Array.isArray(v)) v.forEach((x, i) => nonFinitePaths(x, `${path}[${i}]`, out));
  else if (v && typeof v === "object") for (const [k, x] of Object.entries(v)) nonFinitePaths(x, `${path}.${k}`, out);
  return out;
}

function expectWellFormed(plan: Plan, result: ResultDocument) {
  expect(result.format).toBe("heterolane.result/2");
  expect(resultDocumentSchema.safeParse(JSON.parse(JSON.stringify(result))).success).toBe(true);
  expect(nonFinitePaths(result)).toEqual([]);
  expect(result.chains.map((c) => c.id)).toEqual(plan.chains.map((c) => c.id));
  expect(result.channels.map((c) => c.id)).toEqual(plan.channels.map((c) => c.id));
  const chainIds = new Set(plan.chains.map((c) => c.id));
  const channelIds = new Set(plan.channels.map((c) => c.id));
  for (const f of result.findings) {
    expect(chainIds.has(f.chain)).toBe(true);
    if (f.channel !== null) expect(channelIds.has(f.channel)).toBe(true);
  }
  for (const chain of result.chains) {
    if (chain.placeGHz !== null) {
      const place = chain.placeGHz;
      expect(chain.feasibleGHz.some(([a, b]) => a - 1e-9 <= place && place <= b + 1e-9)).toBe(true);
    } else expect(chain.placeReason).not.toBeNull();
  }
}

describe("checkPlan on every plan the validator accepts", { timeout: 120_000 }, () => {
  it("random valid plans: never throws, well-formed result", () => {
    fc.assert(
      fc.property(validPlanArb, (doc) => {
        const r = parsePlan(doc);
        expect(r.ok).toBe(true);
        if (!r.ok) return;
        expectWellFormed(r.plan, checkPlan(r.plan));
      }),
      { numRuns: 200 },
    );
  });
  it("mutated plans that still pass validation: never throws, well-formed result", () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.constant(validPlanInput()), validPlanArb),
        fc.array(moderateMutationArb, { minLength: 1, maxLength: 3 }),
        (doc, ms) => {
          const r = parsePlan(mutate(doc, ms));
          if (!r.ok) return;
          expectWellFormed(r.plan, checkPlan(r.plan));
        },
      ),
      { numRuns: 400 },
    );
  });
  it("edge values the plan format allows: zero step, zero drift, DC-coupled detector, empty reach, no channels", () => {
    const doc = validPlanInput() as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
    doc.lasers[0].stepMHz = 0;
    doc.lasers[0].driftMHz = 0;
    doc.detectors[0].minGHz = 0;
    doc.lasers[1].reach = [];
    doc.chains[0].tapFraction = 0;
    doc.settings.guardMHz = 0;
    const r = parsePlan(doc);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const result = checkPlan(r.plan);
    expectWellFormed(r.plan, result);
    const b = result.chains.find((c) => c.id === "B")!;
    expect(b.feasibleGHz).toEqual([]);
    expect(b.placeReason).toBe("no-feasible-interval");
    const empty = parsePlan({ ...doc, channels: [] });
    expect(empty.ok).toBe(true);
    if (empty.ok) expectWellFormed(empty.plan, checkPlan(empty.plan));
  });
});
