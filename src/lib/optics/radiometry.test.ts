import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { physicalTemperatureFromRadiation } from "./physical-temperature-from-radiation";
import { planckRadiationTemperature } from "./planck-radiation-temperature";
import { quantumLimitK } from "./quantum-limit-k";
import { receiverNoise } from "./receiver-noise";

const H = 6.626_070_15e-34; // exact, 2019 SI
const K = 1.380_649e-23; // exact, 2019 SI

// Generic Friis cascade in noise temperatures, T = T1 + T2/G1 + T3/(G1·G2) + …
function friis(stages: { tK: number; gain: number }[]): number {
  let total = 0;
  let gain = 1;
  for (const s of stages) {
    total += s.tK / gain;
    gain *= s.gain;
  }
  return total;
}

describe("quantumLimitK", () => {
  it("matches h·f/k with exact SI constants", () => {
    // h·f/k_B with the exact SI (2019) constants: 183.31 GHz → 8.797 K (derived)
    expect(quantumLimitK(183.31)).toBeCloseTo(8.797, 3);
    // derived (docs/helpers.md, Derived check values): 0.04799 K/GHz; 1.07 K at 22.235 GHz; 15.6 K at 325.153 GHz
    expect(quantumLimitK(1)).toBeCloseTo(0.04799, 5);
    expect(quantumLimitK(22.235)).toBeCloseTo(1.07, 2);
    expect(quantumLimitK(325.153)).toBeCloseTo(15.6, 1);
  });
});

describe("planckRadiationTemperature", () => {
  it("matches the Planck-law values", () => {
    // Planck's law with the exact SI constants: J(300 K, 183.31 GHz) = 295.62 K (derived)
    expect(planckRadiationTemperature(300, 183.31)).toBeCloseTo(295.62, 2);
    // derived (docs/helpers.md, Derived check values): J(2.725 K, 183.31 GHz) = 0.363 K
    expect(planckRadiationTemperature(2.725, 183.31)).toBeCloseTo(0.363, 3);
    expect(planckRadiationTemperature(0, 183.31)).toBe(0);
  });

  it("agrees with the textbook form written with exp", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        (t, f) => {
          const x = (H * f * 1e9) / (K * t);
          const direct = (H * f * 1e9) / K / (Math.exp(x) - 1);
          expect(planckRadiationTemperature(t, f) / direct).toBeCloseTo(1, 6);
        },
      ),
    );
  });

  it("lies below T and approaches T − hf/2k when hf ≪ kT", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 5000, noNaN: true }),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        (t, f) => {
          expect(planckRadiationTemperature(t, f)).toBeLessThan(t);
        },
      ),
    );
    fc.assert(
      fc.property(
        fc.double({ min: 200, max: 5000, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (t, f) => {
          const hfk = quantumLimitK(f);
          // next term of the expansion is (hf/k)²/(12T)
          expect(Math.abs(planckRadiationTemperature(t, f) - (t - hfk / 2))).toBeLessThan(
            ((hfk * hfk) / (12 * t)) * 1.01 + 1e-9,
          );
        },
      ),
    );
  });

  it("round-trips through its inverse", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5000, noNaN: true }),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        (t, f) => {
          expect(physicalTemperatureFromRadiation(planckRadiationTemperature(t, f), f) / t).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  it("refuses negative temperatures", () => {
    expect(() => planckRadiationTemperature(-1, 183.31)).toThrow(/physicalK/);
    expect(() => physicalTemperatureFromRadiation(-1, 183.31)).toThrow(/radiationK/);
  });
});

describe("receiverNoise (design estimate)", () => {
  it("is h·f/(k·η) without a front end", () => {
    // derived (docs/helpers.md, Receiver noise): T ≈ hf/(k·η); η = 1 % × 0.5 at 183.31 GHz → 8.797/0.005 = 1759.5 K
    const r = receiverNoise({ rfGHz: 183.31, photonEfficiency: 0.01, opticalEfficiency: 0.5 });
    expect(r.etaTotal).toBeCloseTo(0.005, 15);
    expect(r.receiverK).toBeCloseTo(8.7975 / 0.005, 0);
    expect(r.quantumLimitK).toBeCloseTo(8.797, 3);
    expect(r.frontEndK).toBe(0);
  });

  it("adds a lossy front end by the cascade formula", () => {
    // Worked by hand: 1 dB at 290 K → L = 1.2589, (L − 1)·290 = 75.09 K; then L × 1759.5 K
    const r = receiverNoise({
      rfGHz: 183.31,
      photonEfficiency: 0.01,
      opticalEfficiency: 0.5,
      frontEnd: { lossDB: 1, physicalK: 290 },
    });
    expect(r.lossLinear).toBeCloseTo(1.258925, 6);
    expect(r.frontEndK).toBeCloseTo(75.09, 2);
    expect(r.receiverK).toBeCloseTo(75.0883 + 1.258925 * 1759.498, 0);
  });

  it("agrees with a generic Friis cascade and never beats the quantum limit", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 400, noNaN: true }),
        fc.double({ min: 1e-6, max: 1, noNaN: true }),
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 400, noNaN: true }),
        (f, ph, opt, lossDB, tPhys) => {
          const r = receiverNoise({
            rfGHz: f,
            photonEfficiency: ph,
            opticalEfficiency: opt,
            frontEnd: { lossDB, physicalK: tPhys },
          });
          const loss = 10 ** (lossDB / 10);
          const cascade = friis([
            { tK: (loss - 1) * tPhys, gain: 1 / loss },
            { tK: (H * f * 1e9) / (K * ph * opt), gain: 1 },
          ]);
          expect(r.receiverK / cascade).toBeCloseTo(1, 9);
          expect(r.receiverK).toBeGreaterThanOrEqual(r.quantumLimitK * (1 - 1e-12));
        },
      ),
    );
  });

  it("refuses efficiencies outside (0, 1] and negative loss, naming the field", () => {
    expect(() => receiverNoise({ rfGHz: 183.31, photonEfficiency: 0, opticalEfficiency: 1 })).toThrow(
      /photonEfficiency/,
    );
    expect(() => receiverNoise({ rfGHz: 183.31, photonEfficiency: 0.1, opticalEfficiency: 50 })).toThrow(
      /opticalEfficiency: must be at most 1/,
    );
    expect(() =>
      receiverNoise({
        rfGHz: 183.31,
        photonEfficiency: 0.1,
        opticalEfficiency: 1,
        frontEnd: { lossDB: -1, physicalK: 290 },
      }),
    ).toThrow(/frontEnd.lossDB/);
  });
});
