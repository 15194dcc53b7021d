import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkPlan, evaluateAtOffset, prepareChain } from "@/lib/plan";
import { arbitraryEnvelopePlan, arbitrarySmallPlan } from "@/lib/plan/map-plans.test-util";
import { parsePlan, parsePlanText } from "./plan";
import { channelResultSchema, resultDocumentSchema } from "./result";
import { validPlanArb } from "../../tests/fixtures/plan-arbitrary";
import { fixtureInput, mustParse } from "../../tests/fixtures/plans/builders";

// The result document's zod schema (docs/plan-format.md §12.7) parses, strictly, every result the
// engine gives: the worked examples, the example plans, the zero-envelope corpus and generated plans.

function expectParses(doc: unknown) {
  const r = resultDocumentSchema.safeParse(JSON.parse(JSON.stringify(doc)));
  expect(r.success ? [] : r.error.issues.slice(0, 5)).toEqual([]);
}

describe("the result document schema", () => {
  it("parses the worked examples' and the example plans' results", () => {
    for (const name of ["ex1-single-channel", "ex2-lower-sideband-sampled"])
      expectParses(checkPlan(mustParse(fixtureInput(name))));
    const dir = join(__dirname, "../../docs/examples");
    for (const f of readdirSync(dir).filter((x) => x.endsWith(".plan.json"))) {
      const r = parsePlanText(readFileSync(join(dir, f), "utf8"));
      if (!r.ok) throw new Error(f);
      expectParses(checkPlan(r.plan));
    }
  });

  it("parses the results of the zero-envelope corpus (80 generated plans)", () => {
    const corpus = JSON.parse(
      readFileSync(join(__dirname, "../../tests/fixtures/zero-envelope/v1-results.json"), "utf8"),
    );
    for (const c of corpus.cases as { plan: unknown }[]) {
      const r = parsePlan(c.plan);
      if (!r.ok) throw new Error("corpus plan invalid");
      expectParses(checkPlan(r.plan));
    }
  }, 60_000);

  it("parses the results of generated plans, with and without an operating envelope (property)", () => {
    fc.assert(
      fc.property(
        fc.oneof(
          validPlanArb.map((p) => parsePlan(p)),
          arbitrarySmallPlan().map((p) => ({ ok: true as const, plan: p })),
        ),
        (r) => {
          if (!r.ok) return;
          expectParses(checkPlan(r.plan));
        },
      ),
      { numRuns: 80 },
    );
    fc.assert(
      fc.property(arbitraryEnvelopePlan(), (plan) => {
        expectParses(checkPlan(plan));
        const chain = prepareChain(plan, "A");
        for (const c of evaluateAtOffset(chain, plan.chains[0]!.loOffsetGHz + 0.013).channels) {
          expect(channelResultSchema.safeParse(c).success).toBe(true);
        }
      }),
      { numRuns: 60 },
    );
  }, 120_000);

  it("refuses a key the format does not list, a missing envelope and the old format line", () => {
    const doc = JSON.parse(JSON.stringify(checkPlan(mustParse(fixtureInput("ex1-single-channel")))));
    expect(resultDocumentSchema.safeParse(doc).success).toBe(true);
    expect(resultDocumentSchema.safeParse({ ...doc, extra: 1 }).success).toBe(false);
    const noEnvelope = structuredClone(doc);
    delete noEnvelope.channels[0].envelope;
    expect(resultDocumentSchema.safeParse(noEnvelope).success).toBe(false);
    expect(resultDocumentSchema.safeParse({ ...doc, format: "heterolane.result/1" }).success).toBe(false);
    const extraInEnvelope = structuredClone(doc);
    extraInEnvelope.channels[0].envelope.worstFoo = 1;
    expect(resultDocumentSchema.safeParse(extraInEnvelope).success).toBe(false);
  });
});
