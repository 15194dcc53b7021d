import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import { chainContext } from "@/lib/plan/internals/chain-context";
import { imageRejectionAt } from "@/lib/plan/internals/image-rejection-at";
import { lockOrderWeightDB } from "@/lib/plan/internals/lock-replica";
import { foldFrequency, nyquistZone } from "@/lib/plan/internals/nyquist";
import { LINE_CENTRES, PROTECTED_BANDS } from "@/lib/reference";
import { example1 } from "../fixtures/plans/builders";

/**
 * Published check values and values derived in docs/calculations.md (Derived check
 * values), run through the engine itself, each with its source beside the
 * value.
 */
describe("known answers through the plan engine", () => {
  it("linewidth δν = ν/Q_L: 193.4 THz at Q_L = 1e8 → 1.934 MHz (definition of the loaded Q; derived check, docs/calculations.md)", () => {
    const r = checkPlan(example1((p) => (p.resonators[0]!.loadedQ = 1e8)));
    expect(r.chains[0]!.linewidthMHz).toBeCloseTo(1.934, 6);
    // and Q_L = 1e7 → 19.34 MHz, the worked plan of docs/plan-format.md §8.2 "Chain figures"
    expect(checkPlan(example1()).chains[0]!.linewidthMHz).toBeCloseTo(19.34, 6);
  });

  it("Lorentzian image rejection 1 + (4·f_IF/δν)²: δν = 2 MHz, f_IF = 1 GHz → 66.0 dB (Lorentzian mode response; derived check, docs/calculations.md)", () => {
    // δ = 2 MHz at 193.4 THz needs Q_L = 9.67e7; a 1 kHz channel at the mode centre with the LO 1 GHz above it
    const plan = example1((p) => {
      p.resonators[0]!.loadedQ = 193.4e3 / 0.002;
      p.channels[0]!.bandwidthMHz = 0.001;
    });
    const R = imageRejectionAt(plan, "A", "wv1", 183.31 + 1);
    expect(R).not.toBeNull();
    expect(R!).toBeCloseTo(66.0, 1);
    expect(Math.abs(R! - 10 * Math.log10(1 + (4 * 1) ** 2 / 0.002 ** 2))).toBeLessThan(0.01);
  });

  it("radiometer equation NEΔT = T_sys/√(Bτ): T_sys = 1000 K, B = 100 MHz, τ = 1 s → 0.100 K (Skou & Le Vine, Microwave Radiometer Systems, 2nd ed., ch. 10, K = 1)", () => {
    // a mode far wider than the channel makes W ≡ 1 across the 100 MHz passband
    const r = checkPlan(
      example1((p) => {
        p.resonators[0]!.loadedQ = 1;
        p.channels[0]!.bandwidthMHz = 100;
        p.channels[0]!.antennaK = 300;
        p.channels[0]!.receiverK = 700;
        p.channels[0]!.integrationMs = 1000;
        p.channels[0]!.gainStability = 0;
      }),
    );
    expect(r.channels[0]!.nedtK).toBeCloseTo(0.1, 9);
    expect(r.channels[0]!.radiometricBandwidthMHz).toBeCloseTo(100, 6);
  });

  it("with gain fluctuations T_sys·√(1/(Bτ) + (ΔG/G)²): T_sys = 1250 K, B = 1 GHz, τ = 10 ms, ΔG/G = 1e-4 → 0.415 K (derived check, docs/calculations.md; gain term after Ulaby & Long 2014, from memory: equation to be checked in that edition)", () => {
    const r = checkPlan(
      example1((p) => {
        p.resonators[0]!.loadedQ = 1;
        p.channels[0]!.bandwidthMHz = 1000;
        p.channels[0]!.antennaK = 250;
        p.channels[0]!.receiverK = 1000;
        p.channels[0]!.integrationMs = 10;
        p.channels[0]!.gainStability = 1e-4;
      }),
    );
    expect(r.channels[0]!.nedtK).toBeCloseTo(0.415, 3);
  });

  it("USB, high-side LO, f_RF = 183.31 GHz, f_IF = 1.5 GHz → Δ = 184.81 GHz, image 186.31 GHz, IF inverted (derived check, docs/calculations.md)", () => {
    const r = checkPlan(example1());
    const ch = r.channels[0]!;
    const imageCentre = (ch.imageGHz![0] + ch.imageGHz![1]) / 2;
    expect(imageCentre).toBeCloseTo(186.31, 9);
    const slotCentre = (ch.ifSlotGHz![0] + ch.ifSlotGHz![1]) / 2;
    expect(slotCentre).toBeCloseTo(1.5, 9);
    // inverted: the low RF edge 183.305 GHz beats to the high IF edge
    expect(184.81 - 183.305).toBeCloseTo(ch.ifSlotGHz![1], 9);
  });

  it("sounder channel expansion 183.311 ± 3.00 GHz, 2 × 1000 MHz → passbands 179.811–180.811 and 185.811–186.811 GHz, IF 2.5–3.5 GHz (channel table of the MHS instrument description)", () => {
    const plan = example1((p) => {
      p.channels[0]!.centerGHz = 183.311;
      p.channels[0]!.dsbOffsetGHz = 3;
      p.channels[0]!.bandwidthMHz = 1000;
      p.chains[0]!.loOffsetGHz = 183.311;
    });
    const ctx = chainContext(plan, "A");
    const pb = ctx.channels[0]!.passbands;
    expect(pb[0]![0]).toBeCloseTo(179.811, 9);
    expect(pb[0]![1]).toBeCloseTo(180.811, 9);
    expect(pb[1]![0]).toBeCloseTo(185.811, 9);
    expect(pb[1]![1]).toBeCloseTo(186.811, 9);
    const slot = checkPlan(plan).channels[0]!.ifSlotGHz!;
    expect(slot[0]).toBeCloseTo(2.5, 9);
    expect(slot[1]).toBeCloseTo(3.5, 9);
  });

  it("IM3 of 1.0 and 1.1 GHz: 2f1 − f2 = 0.9 GHz and 2f2 − f1 = 1.2 GHz appear as order-3 intermod spurs (derived check, docs/calculations.md)", () => {
    // two 1 kHz channels whose slots sit at 1.0 and 1.1 GHz, no drift
    const plan = example1((p) => {
      p.lasers[0]!.driftMHz = 0;
      p.resonators[0]!.loadedQ = 1e4;
      p.channels[0]!.bandwidthMHz = 0.001;
      p.channels[0]!.centerGHz = 183.81;
      p.channels.push({ ...p.channels[0]!, id: "wv2", centerGHz: 183.71 });
    });
    const spurs = checkPlan(plan).spurs.filter((s) => s.family === "intermod" && s.order === 3);
    const near = (f: number) => spurs.find((s) => Math.abs((s.bandGHz[0] + s.bandGHz[1]) / 2 - f) < 1e-6);
    // slots: wv1 at 184.81 − 183.81 = 1.0 GHz, wv2 at 1.1 GHz
    expect(near(0.9)?.source).toBe("2·wv1−1·wv2");
    expect(near(1.2)?.source).toBe("1·wv1−2·wv2");
  });

  it("ADC alias f = 1.2 GHz at f_s = 1.0 GHz → 0.2 GHz, zone 3 (sampling theorem; derived in docs/plan-format.md §5.4)", () => {
    expect(foldFrequency(1.2, 1.0)).toBeCloseTo(0.2, 12);
    expect(nyquistZone(1.2, 1.0) + 1).toBe(3);
  });

  it("lock sideband weight: β = 1.08, δν = 2 MHz, f_PDH = 20 MHz → about −30 dB (derived check, docs/calculations.md)", () => {
    expect(lockOrderWeightDB(1, 0.02, 1.08, 0.002)).toBeCloseTo(-29.9, 1);
  });
});

describe("reference tables", () => {
  it("line centres: H2O 183.310087, 325.152888, 22.23508 GHz; O2 118.750343 GHz (ITU-R P.676 tables; JPL catalogue 183310.087 MHz)", () => {
    const at = (f: number) => LINE_CENTRES.find((l) => Math.abs(l.centreGHz - f) < 1e-9);
    expect(at(183.310087)?.species).toBe("H2O");
    expect(at(325.152888)?.species).toBe("H2O");
    expect(at(22.23508)?.species).toBe("H2O");
    expect(at(118.750343)?.species).toBe("O2");
    for (const l of LINE_CENTRES) expect(l.source.length).toBeGreaterThan(10);
  });

  it("RR No. 5.340 bands are listed with their source and marked from memory, and do not overlap", () => {
    for (const b of PROTECTED_BANDS) {
      expect(b.source).toContain("5.340");
      expect(b.fromMemory).toBe(true);
      expect(b.bandGHz[0]).toBeLessThan(b.bandGHz[1]);
    }
    for (let i = 1; i < PROTECTED_BANDS.length; i++)
      expect(PROTECTED_BANDS[i]!.bandGHz[0]).toBeGreaterThan(PROTECTED_BANDS[i - 1]!.bandGHz[1]);
  });
});
