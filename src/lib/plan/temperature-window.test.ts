import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { PlanInput } from "@/schemas/plan";
import { example1, fixtureInput, mustParse } from "../../../tests/fixtures/plans/builders";
import { checkPlan } from "./check-plan";
import { chainContext } from "./internals/chain-context";
import { envelopeBox } from "./internals/envelope-box";
import { figuresAt } from "./internals/envelope-reference.test-util";
import { evaluateChain } from "./internals/evaluate-chain";
import { arbitraryEnvelopePlanInput, parseOrThrow } from "./map-plans.test-util";
import { temperatureWindow } from "./temperature-window";
import { temperatureMap } from "./temperature-map";
import { feasibilityMap } from "./feasibility-map";

function ex1v2(edit: (p: PlanInput) => void) {
  const input = fixtureInput("ex1-single-channel");
  input.format = "heterolane.plan/2";
  edit(input);
  return mustParse(input);
}

/** Every error of the chain at L over the box of one temperature t (and LO shifts within ±D). */
function errorsAtTemperature(plan: ReturnType<typeof mustParse>, chainId: string, L: number, t: number): string[] {
  const ctx = chainContext(plan, chainId);
  const ev = evaluateChain(ctx, L, { box: envelopeBox(ctx.D, t, t, ctx.phi, ctx.nStar) });
  return ev.findings.filter((f) => f.severity === "error").map((f) => f.code);
}

describe("temperatureWindow", () => {
  it("example 1 as written: its drift fails two rules at every temperature, so the window is empty (issue 11)", () => {
    expect(temperatureWindow(example1(), "A")).toEqual({ intervalsK: [], marginK: null });
  });

  it("no FSR shift: nothing moves with the temperature, the window is all of ±50 K", () => {
    const plan = ex1v2((p) => {
      p.lasers[0]!.driftMHz = 0;
      p.chains[0]!.temperatureExcursionK = 3;
    });
    expect(temperatureWindow(plan, "A")).toEqual({ intervalsK: [[-50, 50]], marginK: 47 });
  });

  it("example 1 without drift on a −6.28 MHz/K resonator: NEΔT sets the window where NEΔT(d = 6.28 MHz/K·t) = 20 K (independent bisection)", () => {
    const plan = ex1v2((p) => {
      p.lasers[0]!.driftMHz = 0;
      p.resonators[0]!.fsrShiftMHzPerK = -6.28;
      p.chains[0]!.temperatureExcursionK = 0.5;
    });
    // the detuning at which NEΔT reaches 20 K, by bisection on the reference implementation
    let a = 0;
    let b = 0.00967; // at δ/2 NEΔT is far above 20 K
    for (let i = 0; i < 60; i++) {
      const m = (a + b) / 2;
      if (figuresAt(plan, "wv1", 184.81, m, 0).nedtK > 20) b = m;
      else a = m;
    }
    const edge = a / 0.00628; // K
    // the mode-detuned edge (|k·t| = δ/2, 1.540 K) lies further out: NEΔT decides
    expect(edge).toBeLessThan(9.67 / 6.28);
    const w = temperatureWindow(plan, "A");
    expect(w.intervalsK).toHaveLength(1);
    expect(Math.abs(w.intervalsK[0]![0] + edge)).toBeLessThanOrEqual(1e-3);
    expect(Math.abs(w.intervalsK[0]![1] - edge)).toBeLessThanOrEqual(1e-3);
    expect(Math.abs(w.marginK! - (edge - 0.5))).toBeLessThanOrEqual(1.5e-3);
    // edges to 1 mK
    for (const e of w.intervalsK[0]!) expect(Math.round(e * 1000) / 1000).toBe(e);
  });

  it("mode-detuned alone, in closed form: |n*·φ·t| + D ≤ δ/2 (a wide NEΔT margin, no image)", () => {
    const plan = ex1v2((p) => {
      p.lasers[0]!.driftMHz = 2;
      p.resonators[0]!.fsrShiftMHzPerK = 5;
      p.channels[0]!.requiredNedtK = null;
      p.chains[0]!.temperatureExcursionK = 1;
    });
    const reach = (9.67 - 2) / 5; // K
    const w = temperatureWindow(plan, "A");
    expect(w.intervalsK).toEqual([[-Math.round(reach * 1000) / 1000, Math.round(reach * 1000) / 1000]]);
    expect(w.marginK).toBeCloseTo(reach - 1, 3);
  });

  it("is the result document's window", () => {
    const plan = ex1v2((p) => {
      p.lasers[0]!.driftMHz = 3;
      p.resonators[0]!.fsrShiftMHzPerK = -6.28;
      p.chains[0]!.temperatureExcursionK = 0.3;
    });
    const r = checkPlan(plan).chains[0]!;
    expect(temperatureWindow(plan, "A")).toEqual({ intervalsK: r.temperatureWindowK, marginK: r.temperatureMarginK });
  });

  it("property: inside the window every error rule holds at the chain's LO for every LO shift, just outside some fails; ±Te fits exactly when the plan as written has no error", () => {
    fc.assert(
      fc.property(arbitraryEnvelopePlanInput({ maxChannels: 3 }), (input) => {
        for (const c of input.channels) c.requiredNedtK = 2000;
        input.channels[0]!.centreToleranceMHz = 4;
        const plan = parseOrThrow(input);
        const L = plan.chains[0]!.loOffsetGHz;
        const w = temperatureWindow(plan, "A");
        const result = checkPlan(plan);
        const errorFree = result.findings.every((f) => f.severity !== "error");
        const Te = plan.chains[0]!.temperatureExcursionK;
        // the margin: ±Te fits inside one interval exactly when the plan as written passes (1 mK edges)
        if (errorFree) expect(w.marginK).not.toBeNull();
        if (errorFree) expect(w.marginK!).toBeGreaterThanOrEqual(-1e-3);
        if (errorFree) expect(w.intervalsK.some(([a, b]) => a <= -Te + 1e-3 && b >= Te - 1e-3)).toBe(true);
        if (w.marginK !== null && w.marginK > 2e-3) expect(errorFree).toBe(true);
        for (const [a, b] of w.intervalsK) {
          if (b - a > 5e-3) {
            for (const t of [a + 2e-3, (a + b) / 2, b - 2e-3]) expect(errorsAtTemperature(plan, "A", L, t)).toEqual([]);
          }
          for (const t of [a - 2e-3, b + 2e-3]) {
            if (Math.abs(t) < 50) expect(errorsAtTemperature(plan, "A", L, t).length).toBeGreaterThan(0);
          }
        }
      }),
      { numRuns: 60 },
    );
  }, 120_000);
});

describe("temperatureMap", () => {
  it("rows at the given temperatures; the row at 0 K of a plan without excursion is its feasibility map", () => {
    const plan = example1();
    const m = temperatureMap(plan, "A", { rows: 5, spanK: 2 });
    expect(m.rows.map((r) => r.temperatureOffsetK)).toEqual([-2, -1, 0, 1, 2]);
    expect(m.excursionK).toBe(0);
    expect(m.reachGHz).toEqual([[150, 200]]);
    const row0 = m.rows[2]!;
    const map = feasibilityMap(plan, "A");
    expect(row0.feasibleGHz).toEqual(map.feasibleGHz);
    expect(row0.excludedGHz).toEqual(map.excludedGHz);
    // example 1 as written: its ±20 MHz drift detunes the channel at every temperature
    for (const r of m.rows) expect(r.temperatureCodes).toEqual(["mode-detuned"]);
  });

  it("a row is the map of the same plan with its resonator's FSR moved by t·φ (and no excursion)", () => {
    fc.assert(
      fc.property(
        arbitraryEnvelopePlanInput({ maxChannels: 3 }),
        fc.double({ min: -2, max: 2, noNaN: true }),
        (input, t) => {
          const plan = parseOrThrow(input);
          const rows = temperatureMap(plan, "A", { rows: 2, spanK: Math.abs(t) || 1 }).rows;
          const row = t >= 0 ? rows[1]! : rows[0]!;
          const moved = structuredClone(input);
          moved.resonators[0]!.fsrGHz =
            input.resonators[0]!.fsrGHz + ((input.resonators[0]!.fsrShiftMHzPerK ?? 0) / 1000) * row.temperatureOffsetK;
          moved.resonators[0]!.fsrShiftMHzPerK = 0;
          moved.chains[0]!.temperatureExcursionK = 0;
          const map = feasibilityMap(parseOrThrow(moved), "A");
          // the same sets, away from the image edges (bisected to 1e-6 GHz)
          const codesAt = (L: number, list: typeof map.excludedGHz, feasible: typeof map.feasibleGHz) => {
            if (feasible.some(([a, b]) => L > a && L < b)) return "feasible";
            const e = list.find((x) => L > x.bandGHz[0] && L < x.bandGHz[1]);
            return e ? e.codes.join(",") : "none";
          };
          for (const e of map.excludedGHz) {
            const w = e.bandGHz[1] - e.bandGHz[0];
            if (w < 1e-5) continue;
            const L = (e.bandGHz[0] + e.bandGHz[1]) / 2;
            expect(codesAt(L, row.excludedGHz, row.feasibleGHz)).toBe(e.codes.join(","));
          }
        },
      ),
      { numRuns: 30 },
    );
  }, 120_000);
});
