import { describe, expect, it } from "vitest";
import { demoPlan } from "@db/seed/mission-demo-plan";
import { checkPlan } from "@/lib/plan";
import { parsePlan, type PlanInput } from "@/schemas/plan";

function check(edit: (p: PlanInput) => void = () => {}) {
  const input = demoPlan();
  edit(input);
  const parsed = parsePlan(input);
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; "));
  return checkPlan(parsed.plan);
}
const errorsOf = (r: ReturnType<typeof check>, chain: string) =>
  r.findings.filter((f) => f.chain === chain && f.severity === "error").map((f) => `${f.code} ${f.channel}`);

describe("the demo mission's envelope story (demo data)", () => {
  it("is a version 2 plan", () => {
    expect(demoPlan().format).toBe("heterolane.plan/2");
  });

  it("the 183 GHz chain passes only with its IF filters on the occupied band", () => {
    const r = check();
    expect(errorsOf(r, "H2O-183")).toEqual([]);
    const chain = r.chains.find((c) => c.id === "H2O-183")!;
    expect(chain.temperatureWindowK.length).toBeGreaterThan(0);
    expect(chain.temperatureMarginK!).toBeGreaterThan(0);
    const slot = check((p) => {
      for (const c of p.channels) if (c.chain === "H2O-183") c.ifFilter = "slot";
    });
    expect(errorsOf(slot, "H2O-183").sort()).toEqual(
      ["mode-detuned wv-w1", "mode-detuned wv-w2", "nedt-unmet wv-w1", "nedt-unmet wv-w2"].sort(),
    );
    expect(slot.chains.find((c) => c.id === "H2O-183")!.temperatureWindowK).toEqual([]);
  });

  it("the 243 GHz chain's temperature window is too narrow for its ±10 K temperature control", () => {
    const r = check();
    const chain = r.chains.find((c) => c.id === "WIN-243")!;
    expect(chain.temperatureWindowK).toHaveLength(1);
    const [lo, hi] = chain.temperatureWindowK[0]!;
    expect(lo).toBeGreaterThan(-10);
    expect(hi).toBeLessThan(10);
    expect(chain.temperatureMarginK!).toBeLessThan(0);
    expect(errorsOf(r, "WIN-243").sort()).toEqual(["nedt-unmet win-1", "nedt-unmet win-3"]);
    // with the control tightened inside the window the chain passes
    const tight = check((p) => {
      p.chains.find((c) => c.id === "WIN-243")!.temperatureExcursionK = Math.min(-lo, hi) - 0.5;
    });
    expect(errorsOf(tight, "WIN-243")).toEqual([]);
  });
});
