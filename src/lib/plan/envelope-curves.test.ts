import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { PlanInput } from "@/schemas/plan";
import { example1, fixtureInput, mustParse } from "../../../tests/fixtures/plans/builders";
import { checkPlan } from "./check-plan";
import { envelopeCurves } from "./envelope-curves";
import { figuresAt } from "./internals/envelope-reference.test-util";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function ex1v2(edit: (p: PlanInput) => void) {
  const input = fixtureInput("ex1-single-channel");
  input.format = "heterolane.plan/2";
  edit(input);
  return mustParse(input);
}

describe("envelopeCurves", () => {
  it("example 1 against the LO shift: the nominal figures at 0, the envelope's worst at its ends (issue 11: 81.123 K, 0.1895)", () => {
    const plan = example1();
    const c = envelopeCurves(plan, "wv1", { axis: "lo", points: 81 });
    expect(c.unit).toBe("MHz");
    expect(c.envelope).toEqual([-20, 20]);
    expect(c.requiredNedtK).toBe(20);
    expect(c.modeResponseLimit).toBe(0.5);
    expect(c.points).toHaveLength(81);
    // default span: twice the drift
    expect(c.points[0]!.x).toBe(-40);
    expect(c.points.at(-1)!.x).toBe(40);
    const at = (x: number) => c.points.find((p) => Math.abs(p.x - x) < 1e-9)!;
    const result = checkPlan(plan).channels[0]!;
    expect(at(0).nedtK).toBe(result.nedtK);
    expect(at(0).modeResponse).toBe(1);
    expect(at(0).imageRejectionDB).toBe(result.imageRejectionDB);
    expect(at(20).nedtK).toBeCloseTo(81.123, 3);
    expect(at(-20).nedtK).toBeCloseTo(result.envelope.worstNedtK!, 9);
    expect(at(-20).modeResponse).toBeCloseTo(0.1895, 4);
    expect(at(-20).imageRejectionDB).toBeCloseTo(result.envelope.worstImageRejectionDB!, 9);
    // inside the envelope no point is worse than the envelope's worst value
    for (const p of c.points.filter((q) => Math.abs(q.x) <= 20)) {
      expect(p.nedtK!).toBeLessThanOrEqual(result.envelope.worstNedtK! * (1 + 1e-12));
      expect(p.modeResponse).toBeGreaterThanOrEqual(result.envelope.worstModeResponse * (1 - 1e-12));
    }
  });

  it("against the temperature: the wanted mode moves by n*·φ per kelvin, so NEΔT at t is NEΔT at the LO shift −n*·φ·t", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -20, max: 20, noNaN: true }).filter((v) => Math.abs(v) > 0.1),
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.boolean(),
        (phi, te, upper) => {
          const plan = ex1v2((p) => {
            p.resonators[0]!.fsrShiftMHzPerK = phi;
            p.chains[0]!.temperatureExcursionK = te;
            p.chains[0]!.sideband = upper ? "upper" : "lower";
            p.chains[0]!.loOffsetGHz = upper ? 184.81 : -184.81;
            p.lasers[0]!.reach = [{ minGHz: -200, maxGHz: 200 }];
          });
          const byT = envelopeCurves(plan, "wv1", { axis: "temperature", points: 11, span: 2 });
          expect(byT.unit).toBe("K");
          expect(byT.envelope).toEqual([-te + 0, te]); // (+ 0: the result writes no −0)
          const nStar = upper ? 1 : -1;
          for (const p of byT.points) {
            const u = -nStar * phi * p.x; // MHz
            const byU = envelopeCurves(plan, "wv1", { axis: "lo", points: 3, span: Math.abs(u) || 1 });
            const q = u === 0 ? byU.points[1]! : u > 0 ? byU.points[2]! : byU.points[0]!;
            expect(rel(p.nedtK!, q.nedtK!)).toBeLessThan(1e-9);
            expect(Math.abs(p.modeResponse - q.modeResponse)).toBeLessThan(1e-12);
          }
        },
      ),
      { numRuns: 40 },
    );
  });

  it("agrees with the independent implementation at every point (both axes, both IF filters)", () => {
    for (const filter of ["slot", "occupied"] as const) {
      const plan = ex1v2((p) => {
        p.resonators[0]!.fsrShiftMHzPerK = -6.28;
        p.chains[0]!.temperatureExcursionK = 1;
        p.channels[0]!.ifFilter = filter;
        p.channels[0]!.centerGHz = 183.312;
      });
      for (const axis of ["lo", "temperature"] as const) {
        const c = envelopeCurves(plan, "wv1", { axis, points: 7 });
        for (const p of c.points) {
          const ref = figuresAt(plan, "wv1", 184.81, axis === "lo" ? p.x / 1000 : 0, axis === "lo" ? 0 : p.x);
          expect(rel(p.nedtK!, ref.nedtK)).toBeLessThan(1e-8);
          expect(Math.abs(p.modeResponse - ref.modeResponse)).toBeLessThan(1e-9);
          expect(Math.abs(p.imageRejectionDB! - ref.imageDB!)).toBeLessThan(1e-6);
        }
      }
    }
  });

  it("a channel without a slot has no NEΔT or image curve, but its mode response is given", () => {
    const plan = example1();
    const c = envelopeCurves(plan, "wv1", { axis: "lo", points: 5, loOffsetGHz: 183.31 });
    for (const p of c.points) {
      expect(p.nedtK).toBeNull();
      expect(p.imageRejectionDB).toBeNull();
      expect(p.modeResponse).toBeGreaterThan(0);
    }
    expect(() => envelopeCurves(plan, "nope", { axis: "lo" })).toThrow(/no channel "nope"/);
  });
});
