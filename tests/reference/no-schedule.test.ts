import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import { parsePlan, type PlanInput } from "@/schemas/plan";

// A plan without observation schedules gives exactly the result it gave
// before schedules existed (docs/plan-format.md §13.8): the corpus of
// tests/fixtures/no-schedule (40 generated version 2 plans, with LO drift,
// temperature excursions, FSR shifts and both IF filters) holds the result
// documents the engine of commit fd21cfc gave for them.

interface Case {
  plan: PlanInput;
  result: unknown;
}
const corpus = JSON.parse(readFileSync(join(__dirname, "../fixtures/no-schedule/results.json"), "utf8")) as {
  cases: Case[];
};

describe("plans without schedules keep their results", () => {
  it("the corpus holds 40 plans, none with a schedule", () => {
    expect(corpus.cases).toHaveLength(40);
    for (const c of corpus.cases) for (const l of c.plan.lasers) expect(l).not.toHaveProperty("schedule");
  });
  it.each(corpus.cases.map((c, i) => [i, c] as const))(
    "plan %i gives exactly its stored result",
    (_i, c) => {
      const r = parsePlan(c.plan);
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      expect(JSON.parse(JSON.stringify(checkPlan(r.plan)))).toEqual(c.result);
      // a few generated plans take seconds to check (many spur products); the time is not what is tested
    },
    60_000,
  );
  it("an explicit schedule: null is the same as none", () => {
    const c = corpus.cases[0]!;
    const doc = structuredClone(c.plan);
    for (const l of doc.lasers) (l as { schedule?: null }).schedule = null;
    const r = parsePlan(doc);
    expect(r.ok).toBe(true);
    if (r.ok) expect(JSON.parse(JSON.stringify(checkPlan(r.plan)))).toEqual(c.result);
  });
});
