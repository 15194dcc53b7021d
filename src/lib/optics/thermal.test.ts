import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fsrShiftPerKelvin } from "./fsr-shift-per-kelvin";
import { lnExtraordinaryIndexJundt } from "./ln-extraordinary-index-jundt";
import { lnThermalExpansion, LN_EXPANSION_A } from "./ln-thermal-expansion";
import { modeShiftPerKelvin } from "./mode-shift-per-kelvin";

/*
 * Independent check, with no closed-form formula: a disc of radius R(T) with
 * index n(λ, T) (Jundt 1997) holds mode m at the ν solving
 * 2π·R(T)·n(c/ν, T)·ν/c = m. Solve it by fixed-point iteration at T ± h and
 * difference the results.
 */
const C = 299_792_458;
function radiusAt(r19: number, t: number): number {
  const d = t - LN_EXPANSION_A.t0C;
  return r19 * (1 + LN_EXPANSION_A.alpha * d + LN_EXPANSION_A.beta * d * d);
}
function modeFrequencyHz(m: number, r19: number, t: number, guessHz: number): number {
  let nu = guessHz;
  for (let i = 0; i < 60; i++) {
    const n = lnExtraordinaryIndexJundt((C / nu) * 1e6, t);
    nu = (m * C) / (2 * Math.PI * radiusAt(r19, t) * n);
  }
  return nu;
}
function setup(carrierTHz: number, fsrGHz: number, t: number) {
  const ng = modeShiftPerKelvin(carrierTHz, t).ng;
  const r = C / (2 * Math.PI * fsrGHz * 1e9 * ng);
  const r19 = r / radiusAt(1, t);
  const n = lnExtraordinaryIndexJundt((C / (carrierTHz * 1e12)) * 1e6, t);
  const m = Math.round((2 * Math.PI * r * n * carrierTHz * 1e12) / C);
  return { m, r19, guess: carrierTHz * 1e12 };
}

describe("modeShiftPerKelvin / fsrShiftPerKelvin", () => {
  it("reproduces the values derived in docs/helpers.md (derived, not published)", () => {
    // derived: dν/dT ≈ −6.2 GHz/K at 193.4 THz; ∂n_e/∂T ≈ 3.75e-5 /K at 25 °C
    const mode = modeShiftPerKelvin(193.4, 25);
    expect(mode.ghzPerK).toBeCloseTo(-6.2, 1);
    expect(mode.dnDT).toBeCloseTo(3.75e-5, 6);
    // derived: dFSR/dT ≈ −6.4 MHz/K at FSR 183.31 GHz; ∂n_g/∂T ≈ 4.25e-5 /K
    const fsr = fsrShiftPerKelvin(183.31, 193.4, 25);
    expect(fsr.mhzPerK).toBeCloseTo(-6.4, 1);
    expect(fsr.dngDT).toBeCloseTo(4.25e-5, 6);
    // following the modes (adds group-velocity dispersion): ≈ −6.28 MHz/K, computed here
    expect(fsr.mhzPerKFollowingMode).toBeCloseTo(-6.28, 2);
    // a crystal supplier's datasheet: dn_e/dT ≈ 37e-6 /°C (1–4 µm), within 10 %
    expect(Math.abs(mode.dnDT - 37e-6) / 37e-6).toBeLessThan(0.1);
  });

  it("uses α_a = 1.53e-5 /K at 19 °C (Kim & Smith, J. Appl. Phys. 40, 4637 (1969))", () => {
    expect(lnThermalExpansion(19)).toBe(1.53e-5);
    // (1/L)·dL/dT of ΔL/L = α·d + β·d², d = T − 19 °C, at 29 °C
    expect(lnThermalExpansion(29)).toBeCloseTo((1.53e-5 + 2 * 5.3e-9 * 10) / (1 + 1.53e-5 * 10 + 5.3e-9 * 100), 15);
  });

  it("agrees with differencing the solved resonance condition", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 185, max: 200, noNaN: true }),
        fc.double({ min: 50, max: 350, noNaN: true }),
        fc.double({ min: 20, max: 150, noNaN: true }),
        (carrier, fsr, t) => {
          const { m, r19, guess } = setup(carrier, fsr, t);
          const h = 0.05;
          const up = modeFrequencyHz(m, r19, t + h, guess);
          const down = modeFrequencyHz(m, r19, t - h, guess);
          const numericGHzPerK = (up - down) / (2 * h) / 1e9;
          // evaluate the formula at the solved mode (within FSR/2 of the requested carrier)
          const modeTHz = modeFrequencyHz(m, r19, t, guess) / 1e12;
          expect(Math.abs(modeShiftPerKelvin(modeTHz, t).ghzPerK / numericGHzPerK - 1)).toBeLessThan(2e-5);

          const fsrUp = modeFrequencyHz(m + 1, r19, t + h, guess) - up;
          const fsrDown = modeFrequencyHz(m + 1, r19, t - h, guess) - down;
          const numericMHzPerK = (fsrUp - fsrDown) / (2 * h) / 1e6;
          const solvedFsrGHz = (modeFrequencyHz(m + 1, r19, t, guess) - modeTHz * 1e12) / 1e9;
          const formula = fsrShiftPerKelvin(solvedFsrGHz, modeTHz, t);
          // following the modes: agreement to 0.2 % (the solved FSR is a discrete difference)
          expect(Math.abs(formula.mhzPerKFollowingMode / numericMHzPerK - 1)).toBeLessThan(2e-3);
          // the fixed-wavelength reading (docs/helpers.md) overstates the magnitude by the dispersion term (≈ 1–3 %)
          expect(formula.mhzPerK / numericMHzPerK).toBeGreaterThan(1);
          expect(formula.mhzPerK / numericMHzPerK).toBeLessThan(1.05);
        },
      ),
      { numRuns: 30 },
    );
  });

  it("scales the FSR shift linearly with the FSR", () => {
    fc.assert(
      fc.property(fc.double({ min: 10, max: 400, noNaN: true }), (fsr) => {
        const a = fsrShiftPerKelvin(fsr, 193.4, 25).mhzPerK;
        const b = fsrShiftPerKelvin(2 * fsr, 193.4, 25).mhzPerK;
        expect(b / a).toBeCloseTo(2, 12);
      }),
    );
  });

  it("refuses a carrier outside the LiNbO3 fit", () => {
    expect(() => modeShiftPerKelvin(1000, 25)).toThrow(/carrierTHz/);
    expect(() => fsrShiftPerKelvin(0, 193.4, 25)).toThrow(/fsrGHz/);
  });
});
