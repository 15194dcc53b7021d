// (Longer than most files: the known answers, the properties and the independent implementation of the noise budget are kept together, one describe block each.)
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { PlanInput } from "@/schemas/plan";
import { receiverNoise } from "@/lib/optics";
import { example1 } from "../../../../tests/fixtures/plans/builders";
import { checkPlan } from "../check-plan";
import { chainContext } from "./chain-context";
import { computedEta, optimalLoMW, pumpPhotons, quantumLimitK, throughTransmission } from "./noise-budget";
import { referenceReceiverK } from "./noise-reference.test-util";

type Doc = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** Example 1 as a version 2 plan with noise inputs (η entered = 1 unless told). */
function ex1(edit: (d: Doc) => void = () => {}) {
  return example1((p: PlanInput) => {
    const d = p as Doc;
    d.format = "heterolane.plan/2";
    d.resonators[0].conversionEfficiency = 1;
    edit(d);
  });
}

/** An ideal receiver: η = 1, no loss, no carrier (critical coupling), ideal detector, quiet lasers. */
function ideal(edit: (d: Doc) => void = () => {}) {
  return ex1((d) => {
    d.chains[0].tapFraction = 0;
    d.chains[0].pathLossDB = 0;
    d.resonators[0].intrinsicQ = 2 * d.resonators[0].loadedQ; // critical coupling: T = 0
    edit(d);
  });
}

const budgetOf = (plan: ReturnType<typeof ex1>) => chainContext(plan, "A").channels[0]!.budget!;
const term = (plan: ReturnType<typeof ex1>, name: string) => budgetOf(plan).terms.find((t) => t.term === name)!.kelvin;

describe("known answers", () => {
  it("h·f/k = 8.7975 K at 183.31 GHz with η = 1, no loss, no carrier, a noiseless detector and quiet lasers", () => {
    // Caves, Phys. Rev. D 26, 1817 (1982): the heterodyne quantum limit h·f/k;
    // exact SI constants (BIPM 2019): 6.62607015e-34·183.31e9/1.380649e-23 = 8.79750 K.
    const b = budgetOf(ideal());
    expect(b.totalK).toBeCloseTo(8.7975, 4);
    expect(quantumLimitK(183.31)).toBeCloseTo(8.7975, 4);
    expect(b.terms.filter((t) => t.kelvin > 0).map((t) => t.term)).toEqual(["quantum-limit"]);
  });

  it("the front end follows the Friis cascade (Pozar, Microwave Engineering): (L − 1)·T_phys + L·T_rest", () => {
    const plan = ideal((d) => {
      d.chains[0].frontEndLossDB = 3;
      d.chains[0].frontEndTemperatureK = 290;
      d.resonators[0].conversionEfficiency = 0.25;
    });
    const b = budgetOf(plan);
    // the optics helper's cascade, an implementation written for another screen
    const friis = receiverNoise({
      rfGHz: 183.31,
      photonEfficiency: 0.25,
      opticalEfficiency: 1,
      frontEnd: { lossDB: 3, physicalK: 290 },
    });
    expect(rel(b.totalK, friis.receiverK)).toBeLessThan(1e-12);
    // 3 dB at 290 K: (1.99526 − 1)·290 = 288.63 K (Pozar's lossy-line noise temperature)
    expect(term(plan, "front-end-loss")).toBeCloseTo((10 ** 0.3 - 1) * 290, 9);
  });

  it("the residual carrier of ex1-single-channel raises the shot noise ×3.48 (+5.4 dB)", () => {
    // P_c = 10 mW·0.99·10^(−0.3) = 4.962 mW, P_LO = 2 mW: (P_c + P_LO)/P_LO = 3.481 (issue 12, worked by hand)
    const plan = ex1();
    const b = budgetOf(plan);
    const shot = term(plan, "quantum-limit") + term(plan, "conversion-loss");
    expect((shot + term(plan, "carrier-shot-noise")) / shot).toBeCloseTo(3.481, 3);
    const f = checkPlan(plan).findings.find((x) => x.code === "carrier-dominates-lo")!;
    expect(f.message).toContain("×3.48 (+5.4 dB)");
    expect(f.data).toEqual({ carrierMW: chainContext(plan, "A").carrierMW, loMW: 2 });
    // docs/plan-format.md §14.8, worked by hand: T_Q = 8.7975/(0.99·10^(−0.3)) = 17.7306 K, total 61.718 K
    expect(b.totalK).toBeCloseTo(61.718, 3);
    expect(b.source).toBe("entered");
    expect(b.enteredK).toBe(5000);
    expect(b.ratio).toBeCloseTo(5000 / b.totalK, 12);
  });

  it("through-port transmission at resonance, T = ((κ₀ − κ_ex)/κ)² (Gorodetsky & Ilchenko, JOSA B 16, 147 (1999))", () => {
    expect(throughTransmission(1e7, 2e7)).toBe(0); // critical coupling
    expect(throughTransmission(1e7, 1.5e7)).toBeCloseTo(1 / 9, 15); // under-coupled: κ₀/κ = 2/3
    expect(throughTransmission(1e7, 1e12)).toBeCloseTo(1, 4); // very over-coupled: all passes
    expect(throughTransmission(1e7, 1.1e7)).toBeCloseTo((2 / 1.1 - 1) ** 2, 15);
    // the carrier reaching the detector uses it: 10 dB below the bound at T = 0.1
    const q0 = 2e7 / (1 + Math.sqrt(0.1)); // 2Q_L/Q₀ − 1 = √0.1
    const bound = chainContext(ex1(), "A").carrierMW;
    const withT = chainContext(
      ex1((d) => (d.resonators[0].intrinsicQ = q0)),
      "A",
    ).carrierMW;
    expect(10 * Math.log10(bound / withT)).toBeCloseTo(10, 9);
  });

  it("computed η: at cooperativity C = 1 it is the product of the coupling shares (Tsang, Phys. Rev. A 81, 063837 (2010))", () => {
    const base = {
      pumpPhotons: 1e9,
      carrierHz: 193.4e12,
      loadedQ: 1e7,
      intrinsicQ: 2e7,
      mmWaveHz: 183.31e9,
      mmWaveQ: 200,
      mmWaveCouplingRatio: 0.5,
    };
    const g0 = Math.sqrt(((193.4e12 / 1e7) * (183.31e9 / 200)) / (4 * 1e9)); // C = 1
    expect(computedEta({ ...base, g0Hz: g0 })).toBeCloseTo(0.5 * 0.5, 12);
    // and below it elsewhere: 4C/(1 + C)² < 1 for C ≠ 1
    expect(computedEta({ ...base, g0Hz: g0 * 2 })).toBeCloseTo((0.25 * (4 * 4)) / 25, 12);
    // n = 4·(κ_ex/κ)·P·Q_L/(ħω²): 10 mW at 193.4 THz, Q_L = 1e7 critically coupled
    const hbar = 6.62607015e-34 / (2 * Math.PI);
    const w = 2 * Math.PI * 193.4e12;
    expect(rel(pumpPhotons(0.01, 193.4e12, 1e7, 2e7), (4 * 0.5 * 0.01 * 1e7) / (hbar * w * w))).toBeLessThan(1e-12);
  });

  it("a computed receiver temperature is used in NEΔT; an entered one is kept and shown beside it", () => {
    const entered = checkPlan(ex1()).channels[0]!;
    const computed = checkPlan(ex1((d) => (d.channels[0].receiverKSource = "computed"))).channels[0]!;
    const plain = checkPlan(example1()).channels[0]!;
    expect(entered.nedtK).toBe(plain.nedtK);
    expect(computed.noiseBudget!.source).toBe("computed");
    expect(computed.noiseBudget!.enteredK).toBeNull();
    const asTyped = checkPlan(
      ex1((d) => {
        d.resonators[0].conversionEfficiency = null;
        d.channels[0].receiverK = computed.noiseBudget!.totalK;
      }),
    ).channels[0]!;
    expect(computed.nedtK).toBe(asTyped.nedtK);
  });
});

describe("findings", () => {
  it("thermal-noise-limited: 2q·R·P_LO < 3·i_n²", () => {
    // 2q·0.8 A/W·2 mW = 5.13e-22 A²/Hz; i_n = 20 pA/√Hz gives 4e-22: ratio 0.78 > 1/3
    const loud = checkPlan(
      ex1((d) => {
        d.detectors[0].responsivityAPerW = 0.8;
        d.detectors[0].noiseCurrentPAPerRtHz = 20;
      }),
    );
    const f = loud.findings.find((x) => x.code === "thermal-noise-limited");
    expect(f?.severity).toBe("warning");
    expect(f?.data.ratio).toBeCloseTo(20e-12 ** 2 / (2 * 1.602176634e-19 * 0.8 * 2e-3), 12);
    const quiet = checkPlan(
      ex1((d) => {
        d.detectors[0].responsivityAPerW = 0.8;
        d.detectors[0].noiseCurrentPAPerRtHz = 10; // ratio 0.195 < 1/3
      }),
    );
    expect(quiet.findings.some((x) => x.code === "thermal-noise-limited")).toBe(false);
  });

  it("laser-noise-dominates names the laser and the offset", () => {
    const r = checkPlan(
      ex1((d) => {
        d.detectors[0].responsivityAPerW = 0.8;
        d.lasers[0].carrierFloorDBcPerHz = -150;
      }),
    );
    const f = r.findings.filter((x) => x.code === "laser-noise-dominates");
    expect(f).toHaveLength(1);
    expect(f[0]!.data).toMatchObject({ laser: "LP1", source: "carrier", term: "carrier-floor", offsetGHz: 183.31 });
    expect(f[0]!.message).toContain("carrier laser of pair LP1 at 183.31 GHz from the carrier");
    // a 40 dB pre-filter puts the floor well below the shot noise
    const filtered = checkPlan(
      ex1((d) => {
        d.detectors[0].responsivityAPerW = 0.8;
        d.lasers[0].carrierFloorDBcPerHz = -150;
        d.lasers[0].carrierPreFilterDB = 40;
      }),
    );
    expect(filtered.findings.some((x) => x.code === "laser-noise-dominates")).toBe(false);
  });
});

/** Random noise inputs on example 1 (consistent R and η_QE, as the reference assumes). */
const hardwareArb = fc.record({
  eta: fc.double({ min: 1e-4, max: 1, noNaN: true }),
  qe: fc.double({ min: 0.05, max: 1, noNaN: true }),
  lossDB: fc.double({ min: 0, max: 10, noNaN: true }),
  tPhys: fc.double({ min: 0, max: 400, noNaN: true }),
  q0Factor: fc.option(fc.double({ min: 1.001, max: 100, noNaN: true }), { nil: null }),
  rejectionDB: fc.double({ min: 0, max: 60, noNaN: true }),
  inPA: fc.option(fc.double({ min: 0, max: 100, noNaN: true }), { nil: null }),
  cmrr: fc.option(fc.double({ min: 0, max: 60, noNaN: true }), { nil: null }),
  rinC: fc.option(fc.double({ min: -180, max: -100, noNaN: true }), { nil: null }),
  rinL: fc.option(fc.double({ min: -180, max: -100, noNaN: true }), { nil: null }),
  floorC: fc.option(fc.double({ min: -200, max: -120, noNaN: true }), { nil: null }),
  floorL: fc.option(fc.double({ min: -200, max: -120, noNaN: true }), { nil: null }),
  loMW: fc.double({ min: 0.01, max: 20, noNaN: true }),
  carrierMW: fc.double({ min: 0.01, max: 50, noNaN: true }),
});
type Hw = typeof hardwareArb extends fc.Arbitrary<infer T> ? T : never;

function withHardware(hw: Hw) {
  return ex1((d) => {
    d.resonators[0].conversionEfficiency = hw.eta;
    d.resonators[0].intrinsicQ = hw.q0Factor === null ? null : hw.q0Factor * d.resonators[0].loadedQ;
    d.detectors[0].quantumEfficiency = hw.qe;
    d.detectors[0].responsivityAPerW = (hw.qe * 1.602176634e-19) / (6.62607015e-34 * 193.4e12);
    d.detectors[0].noiseCurrentPAPerRtHz = hw.inPA;
    d.detectors[0].cmrrDB = hw.cmrr;
    d.lasers[0].carrierRinDBcPerHz = hw.rinC;
    d.lasers[0].loRinDBcPerHz = hw.rinL;
    d.lasers[0].carrierFloorDBcPerHz = hw.floorC;
    d.lasers[0].loFloorDBcPerHz = hw.floorL;
    d.lasers[0].loPowerMW = hw.loMW;
    d.lasers[0].carrierPowerMW = hw.carrierMW;
    d.chains[0].carrierRejectionDB = hw.rejectionDB;
    d.chains[0].frontEndLossDB = hw.lossDB;
    d.chains[0].frontEndTemperatureK = hw.tPhys;
  });
}

describe("properties", () => {
  it("agrees with the independent photocurrent implementation to 1e-9 relative", () => {
    fc.assert(
      fc.property(hardwareArb, (hw) => {
        const plan = withHardware(hw);
        const b = budgetOf(plan);
        expect(rel(b.totalK, referenceReceiverK(plan, "A", "wv1", hw.eta))).toBeLessThan(1e-9);
      }),
    );
  });

  it("every term is ≥ 0, the terms sum to totalK, and the sum is never below h·f/k", () => {
    fc.assert(
      fc.property(hardwareArb, (hw) => {
        const b = budgetOf(withHardware(hw));
        let sum = 0;
        for (const t of b.terms) {
          expect(t.kelvin).toBeGreaterThanOrEqual(0);
          sum += t.kelvin;
        }
        expect(b.totalK).toBe(sum);
        expect(b.totalK).toBeGreaterThanOrEqual(quantumLimitK(183.31));
      }),
    );
  });

  it("each term is monotone in its input", () => {
    const cases: [string, (hw: Hw, x: number) => Hw, [number, number], 1 | -1][] = [
      ["front-end-loss", (hw, x) => ({ ...hw, lossDB: x }), [0, 10], 1],
      ["conversion-loss", (hw, x) => ({ ...hw, eta: x }), [1e-3, 1], -1],
      ["carrier-shot-noise", (hw, x) => ({ ...hw, rejectionDB: x }), [0, 60], -1],
      ["carrier-shot-noise", (hw, x) => ({ ...hw, carrierMW: x }), [0.01, 50], 1],
      ["detector-noise", (hw, x) => ({ ...hw, inPA: x }), [0, 100], 1],
      ["detector-noise", (hw, x) => ({ ...hw, loMW: x }), [0.01, 20], -1],
      ["carrier-floor", (hw, x) => ({ ...hw, floorC: x }), [-200, -120], 1],
      ["lo-floor", (hw, x) => ({ ...hw, floorL: x }), [-200, -120], 1],
      ["carrier-rin", (hw, x) => ({ ...hw, rinC: x }), [-180, -100], 1],
      ["lo-rin", (hw, x) => ({ ...hw, rinL: x }), [-180, -100], 1],
    ];
    for (const [name, set, [lo, hi], sign] of cases) {
      fc.assert(
        fc.property(
          hardwareArb,
          fc.double({ min: lo, max: hi, noNaN: true }),
          fc.double({ min: lo, max: hi, noNaN: true }),
          (hw, a, b) => {
            const [x, y] = a <= b ? [a, b] : [b, a];
            const tx = term(withHardware(set(hw, x)), name);
            const ty = term(withHardware(set(hw, y)), name);
            if (sign === 1) expect(ty).toBeGreaterThanOrEqual(tx * (1 - 1e-12));
            else expect(ty).toBeLessThanOrEqual(tx * (1 + 1e-12));
          },
        ),
        { numRuns: 30 },
      );
    }
  });

  it("the optimal LO power is never beaten by a scan of LO powers without pd-overload", () => {
    fc.assert(
      fc.property(hardwareArb, (hw) => {
        const plan = withHardware(hw);
        const ctx = chainContext(plan, "A");
        const best = optimalLoMW(ctx.noise!, ctx.detector.maxInputMW);
        const upper = 2 * ctx.detector.maxInputMW - ctx.carrierMW;
        if (upper <= 0) {
          expect(best).toBeNull();
          return;
        }
        expect(best).not.toBeNull();
        const at = (p: number) => {
          const other = structuredClone(plan);
          other.lasers[0]!.loPowerMW = p;
          return budgetOf(other).totalK;
        };
        const tBest = at(best!);
        // the scan: 400 log-spaced powers from 1e-4 of the bound to the bound
        for (let i = 0; i <= 400; i++) {
          const p = upper * 10 ** (-4 + (4 * i) / 400);
          expect(tBest).toBeLessThanOrEqual(at(p) * (1 + 1e-12));
        }
        expect((ctx.carrierMW + best!) / 2).toBeLessThanOrEqual(ctx.detector.maxInputMW * (1 + 1e-12));
      }),
      { numRuns: 20 },
    );
  }, 30_000);
});
