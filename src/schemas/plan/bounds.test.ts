import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";
import { validPlanArb } from "../../../tests/fixtures/plan-arbitrary";
import { formatPath } from "../issues";
import { PLAN_BOUNDS, planBoundIssues, REACH_REASON, type Bound } from "./bounds";
import { parsePlan } from "./parse";
import type { Plan } from "./document";

const base = (): Plan => {
  const r = parsePlan(validPlanInput());
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.plan;
};

/** The plan with one field of the first row of `b.entity` set to `v`. */
function withValue(b: Bound, v: number): { plan: Plan; path: string } {
  const plan = structuredClone(base());
  const row = (b.entity === "settings" ? plan.settings : plan[b.entity][0]) as Record<string, unknown>;
  let o = row;
  for (const k of b.field.slice(0, -1)) o = o[k] as Record<string, unknown>;
  o[b.field.at(-1)!] = v;
  const path = formatPath(b.entity === "settings" ? ["settings", ...b.field] : [b.entity, 0, ...b.field]);
  return { plan, path };
}

const step = (x: number) => Math.max(Math.abs(x) * 1e-9, 1e-9);

describe("hard ranges of the plan's numbers", () => {
  it("the example plans and the test plan are inside every range", () => {
    expect(planBoundIssues(base())).toEqual([]);
    const dir = join(__dirname, "../../../docs/examples");
    for (const f of readdirSync(dir).filter((n) => n.endsWith(".plan.json"))) {
      const r = parsePlan(JSON.parse(readFileSync(join(dir, f), "utf8")));
      expect(r.ok, f).toBe(true);
      if (r.ok) expect(planBoundIssues(r.plan), f).toEqual([]);
    }
  });

  for (const b of PLAN_BOUNDS) {
    const name = `${b.entity}.${b.field.join(".")}`;
    it(`${name}: refused just outside, accepted just inside, with its path and reason`, () => {
      for (const [edge, open, dir] of [
        [b.max, b.below, +1],
        [b.min, b.above, -1],
      ] as const) {
        if (edge === undefined) continue;
        const inside = open ? edge - dir * step(edge) : edge;
        const outside = open ? edge : edge + dir * step(edge);
        const ok = withValue(b, inside);
        expect(
          planBoundIssues(ok.plan).filter((i) => i.path === ok.path),
          `${name} = ${inside}`,
        ).toEqual([]);
        const bad = withValue(b, outside);
        const issues = planBoundIssues(bad.plan);
        expect(issues, `${name} = ${outside}`).toEqual([
          { path: bad.path, message: expect.stringContaining(b.reason) as unknown as string },
        ]);
        expect(issues[0]!.message).toContain(String(edge));
      }
    });
  }

  it("reach edges: ±20 000 GHz accepted, just beyond refused with the path", () => {
    const plan = structuredClone(base());
    plan.lasers[0]!.reach = [{ minGHz: -20_000, maxGHz: 20_000 }];
    expect(planBoundIssues(plan)).toEqual([]);
    plan.lasers[0]!.reach = [
      { minGHz: 1, maxGHz: 2 },
      { minGHz: -20_000.001, maxGHz: 20_000.001 },
    ];
    expect(planBoundIssues(plan)).toEqual([
      { path: "lasers[0].reach[1].minGHz", message: expect.stringContaining(REACH_REASON) as unknown as string },
      { path: "lasers[0].reach[1].maxGHz", message: expect.stringContaining(REACH_REASON) as unknown as string },
    ]);
  });

  it("refuses the issue's absurd values, each by its path", () => {
    const plan = structuredClone(base());
    plan.resonators[0]!.fsrGHz = 1_000_000;
    plan.resonators[0]!.loadedQ = 1e30;
    plan.lasers[0]!.carrierTHz = 99_999;
    plan.lasers[0]!.carrierPowerMW = 1e6; // 1 kW
    plan.lasers[0]!.driftMHz = 1e12;
    plan.channels[0]!.receiverK = 1e15;
    expect(planBoundIssues(plan).map((i) => i.path)).toEqual([
      "lasers[0].carrierTHz",
      "lasers[0].carrierPowerMW",
      "lasers[0].driftMHz",
      "resonators[0].fsrGHz",
      "resonators[0].loadedQ",
      "channels[0].receiverK",
    ]);
  });

  it("property: the generated plans of the other property tests are inside every range", () => {
    fc.assert(
      fc.property(validPlanArb, (doc) => {
        const r = parsePlan(doc);
        if (r.ok) expect(planBoundIssues(r.plan)).toEqual([]);
      }),
      { numRuns: 60 },
    );
  });

  it("property: agrees with a plain per-field comparison (the simpler reading) on random values of each field", () => {
    fc.assert(
      fc.property(fc.constantFrom(...PLAN_BOUNDS), fc.double({ min: -1e13, max: 1e13, noNaN: true }), (b, v) => {
        const { plan, path } = withValue(b, v);
        const low = b.min === undefined ? false : b.above ? v <= b.min : v < b.min;
        const high = b.max === undefined ? false : b.below ? v >= b.max : v > b.max;
        expect(planBoundIssues(plan).some((i) => i.path === path)).toBe(low || high);
      }),
    );
  });
});
