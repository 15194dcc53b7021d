import { describe, expect, it } from "vitest";
import { resultDocumentSchema } from "@/schemas/result";
import { checkPlan } from "./check-plan";
import { parsed, sharedLaserInput, withDwells } from "./schedule.test-util";

// Observation schedules (docs/plan-format.md §13): timing, the effective
// integration time and its NEΔT, and the schedule findings, on the
// shared-laser demo plan (docs/examples/shared-laser.plan.json).

describe("the timing of a schedule", () => {
  it("works out each dwell's switch, usable time and duty cycle (hand-worked, §13.3)", () => {
    const s = checkPlan(parsed(sharedLaserInput())).schedules![0]!;
    // retune 2 ms + 0.01 ms/GHz; relock 5 ms between resonators R60 (A180, B240) and R80 (C320)
    // into A180 from C320: |181.5 − 321.5| = 140 GHz → 3.4 ms, and a relock: 8.4 ms of its 50 ms
    // into B240 from A180: 60 GHz → 2.6 ms, same resonator: 2.6 ms of its 60 ms
    // into C320 from B240: 80 GHz → 2.8 ms, and a relock: 7.8 ms of its 90 ms
    const want = [
      ["A180", 140, 3.4, 5, 41.6],
      ["B240", 60, 2.6, 0, 57.4],
      ["C320", 80, 2.8, 5, 82.2],
    ] as const;
    expect(s.dwells).toHaveLength(3);
    s.dwells.forEach((d, j) => {
      const [chain, step, retune, relock, usable] = want[j]!;
      expect(d.chain).toBe(chain);
      expect(d.loStepGHz).toBeCloseTo(step, 9);
      expect(d.retuneMs).toBeCloseTo(retune, 9);
      expect(d.relockMs).toBe(relock);
      expect(d.usableMs).toBeCloseTo(usable, 9);
      expect(d.dutyCycle).toBeCloseTo(usable / 200, 12);
    });
    expect([s.plannedCycleMs, s.busyMs, s.cycleMs, s.idleMs]).toEqual([200, 200, 200, 0]);
  });
  it("a cycle longer than its dwells idles; the duty cycles are over the whole cycle", () => {
    const s = checkPlan(withDwells([50, 60, 90], (d) => (d.lasers[0]!.schedule!.cycleMs = 400))).schedules![0]!;
    expect([s.busyMs, s.cycleMs, s.idleMs]).toEqual([200, 400, 200]);
    expect(s.dwells[0]!.dutyCycle).toBeCloseTo(41.6 / 400, 12);
  });
  it("the result document with schedules is valid against its schema", () => {
    const r = resultDocumentSchema.safeParse(checkPlan(parsed(sharedLaserInput())));
    expect(r.success ? [] : r.error.issues).toEqual([]);
  });
});

/** A copy of the demo plan whose modes are so wide (Q = 2·10⁴, δ ≈ 9.67 GHz) that a 20 MHz band sees a flat response. */
function flatModes(g: number) {
  const d = sharedLaserInput();
  for (const r of d.resonators) r.loadedQ = 2e4;
  for (const c of d.channels) c.gainStability = g;
  return parsed(d);
}

describe("NEΔT with the effective integration time (§13.4)", () => {
  // The total-power radiometer equation ΔT = T_sys/√(B·τ) (Skou & Le Vine, Microwave Radiometer
  // Systems, 2nd ed., 2006, ch. 2; Ulaby & Long, Microwave Radar and Radiometric Remote Sensing,
  // 2014, ch. 7 — equation numbers from memory), with the gain term
  // ΔT = T_sys·√(1/(B·τ) + (ΔG/G)²). Here T_sys = 250 + 4000 K, B = 20 MHz, τ = 100 ms × duty.
  const Tsys = 4250;
  const B = 20e6;
  it("scales as 1/√duty, as the textbook equation says (no gain drift)", () => {
    const r = checkPlan(flatModes(0));
    const s = r.schedules![0]!;
    s.dwells.forEach((d, j) => {
      const tau = 0.1 * d.dutyCycle;
      const textbook = Tsys / Math.sqrt(B * tau);
      const ch = r.channels[j]!;
      // the flat-mode plan's response differs from 1 by about (2·0.01/9.67)² ≈ 4·10⁻⁶ across the band
      expect(Math.abs(ch.nedtK! / textbook - 1)).toBeLessThan(1e-4);
      expect(s.channels[j]!.effectiveIntegrationMs).toBeCloseTo(100 * d.dutyCycle, 9);
      // exactly 1/√duty from the unshared figure, nominal and worst alike
      expect(ch.nedtK! / s.channels[j]!.unsharedNedtK!).toBeCloseTo(1 / Math.sqrt(d.dutyCycle), 12);
      expect(ch.envelope.worstNedtK! / s.channels[j]!.unsharedWorstNedtK!).toBeCloseTo(1 / Math.sqrt(d.dutyCycle), 12);
    });
  });
  it("the gain-stability term does not shrink with the shared time (ΔG/G = 10⁻⁴)", () => {
    const g = 1e-4;
    const r = checkPlan(flatModes(g));
    r.schedules![0]!.dwells.forEach((d, j) => {
      const textbook = Tsys * Math.sqrt(1 / (B * 0.1 * d.dutyCycle) + g * g);
      expect(Math.abs(r.channels[j]!.nedtK! / textbook - 1)).toBeLessThan(1e-4);
      // scaling the whole unshared figure by 1/√duty would give more: the floor is not scaled
      expect(r.channels[j]!.nedtK!).toBeLessThan((Tsys * Math.sqrt(1 / (B * 0.1) + g * g)) / Math.sqrt(d.dutyCycle));
    });
  });
  it("the channel's figures, the schedule's figures and nedt-unmet agree", () => {
    const r = checkPlan(parsed(sharedLaserInput()));
    const s = r.schedules![0]!;
    for (const c of s.channels) {
      const ch = r.channels.find((x) => x.id === c.id)!;
      expect(c.nedtK).toBe(ch.nedtK);
      expect(c.worstNedtK).toBe(ch.envelope.worstNedtK);
      const unmet = r.findings.some((f) => f.code === "nedt-unmet" && f.channel === c.id);
      expect(unmet).toBe(c.worstNedtK! > c.requiredNedtK! + 1e-9);
    }
  });
});

describe("the schedule findings (§13.7)", () => {
  it("shared-nedt-unmet: a channel that meets its requirement alone but not with its share", () => {
    const r = checkPlan(parsed(sharedLaserInput()));
    const f = r.findings.filter((x) => x.code === "shared-nedt-unmet");
    expect(f.map((x) => [x.chain, x.channel, x.severity])).toEqual([["A180", "a1", "warning"]]);
    const s = r.schedules![0]!.channels[0]!;
    expect(f[0]!.data).toMatchObject({
      laser: "LP1",
      nedtK: s.worstNedtK,
      unsharedNedtK: s.unsharedWorstNedtK,
      requiredNedtK: 6,
    });
    // no gain drift: the duty cycle needed is (unshared worst / required)²
    expect(f[0]!.data.neededDutyCycle as number).toBeCloseTo((s.unsharedWorstNedtK! / 6) ** 2, 12);
    expect(f[0]!.message).toContain("20.8 % of each cycle");
    // and the requirement's own error is still there, just before it
    const codes = r.findings.filter((x) => x.channel === "a1").map((x) => x.code);
    expect(codes).toEqual(["nedt-unmet", "shared-nedt-unmet"]);
  });
  it("no shared-nedt-unmet when the channel fails even alone", () => {
    const r = checkPlan(withDwells([50, 60, 90], (d) => (d.channels[0]!.requiredNedtK = 3)));
    expect(r.findings.filter((x) => x.channel === "a1").map((x) => x.code)).toEqual(["nedt-unmet"]);
  });
  it("schedule-overrun: the dwells add up to more than the cycle", () => {
    const r = checkPlan(withDwells([50, 60, 100]));
    const f = r.findings.filter((x) => x.code === "schedule-overrun");
    expect(f.map((x) => [x.chain, x.channel, x.severity])).toEqual([["A180", null, "error"]]);
    expect(f[0]!.data).toEqual({ laser: "LP1", busyMs: 210, plannedCycleMs: 200, overrunMs: 10 });
    expect(r.schedules![0]!.cycleMs).toBe(210);
    expect(r.schedules![0]!.dwells[0]!.dutyCycle).toBeCloseTo(41.6 / 210, 12);
    expect(checkPlan(withDwells([50, 60, 90])).findings.some((x) => x.code === "schedule-overrun")).toBe(false);
  });
  it("retune-blocked: the LO path between two chains leaves the laser's reach", () => {
    // a gap 250–300 GHz in the reach: C320 (321.5 GHz) is reached from B240 (241.5 GHz) and A180 only across it
    const r = checkPlan(
      withDwells([50, 60, 90], (d) => {
        d.lasers[0]!.reach = [
          { minGHz: 170, maxGHz: 250 },
          { minGHz: 300, maxGHz: 330 },
        ];
      }),
    );
    const f = r.findings.filter((x) => x.code === "retune-blocked");
    expect(f.map((x) => [x.chain, x.severity, x.data.fromChain])).toEqual([
      ["A180", "error", "C320"],
      ["C320", "error", "B240"],
    ]);
    expect(f[1]!.message).toContain("not inside one reach interval (170–250 GHz, 300–330 GHz)");
    expect(checkPlan(parsed(sharedLaserInput())).findings.some((x) => x.code === "retune-blocked")).toBe(false);
  });
});
