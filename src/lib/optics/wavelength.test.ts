import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { frequencyTHzFromNm } from "./frequency-thz-from-nm";
import { OpticsInputError } from "./internals/errors";
import { wavelengthNmFromTHz } from "./wavelength-nm-from-thz";

// Simpler independent form: SI units throughout, λ[m] = c / f[Hz].
const lambdaNmSi = (fTHz: number) => (299_792_458 / (fTHz * 1e12)) * 1e9;

describe("wavelengthNmFromTHz / frequencyTHzFromNm", () => {
  it("matches the ITU-T G.694.1 grid values", () => {
    // ITU-T G.694.1 anchor 193.1 THz ↔ 1552.524 nm (vacuum, c exact)
    expect(wavelengthNmFromTHz(193.1)).toBeCloseTo(1552.524, 3);
    // ITU-T G.694.1, 50 GHz grid N = +1: 193.15 THz ↔ 1552.122 nm
    expect(wavelengthNmFromTHz(193.15)).toBeCloseTo(1552.122, 3);
    // derived, λ = c/f with the exact c: 193.4 THz ↔ 1550.116 nm; 1550 nm ↔ 193.4145 THz
    expect(wavelengthNmFromTHz(193.4)).toBeCloseTo(1550.116, 3);
    expect(frequencyTHzFromNm(1550)).toBeCloseTo(193.4145, 4);
  });

  it("agrees with the SI-unit form", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1000, noNaN: true }), (f) => {
        expect(wavelengthNmFromTHz(f)).toBeCloseTo(lambdaNmSi(f), 9);
      }),
    );
  });

  it("round-trips nm → THz → nm and THz → nm → THz", () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 10_000, noNaN: true }), (nm) => {
        expect(wavelengthNmFromTHz(frequencyTHzFromNm(nm)) / nm).toBeCloseTo(1, 12);
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 30, max: 3000, noNaN: true }), (thz) => {
        expect(frequencyTHzFromNm(wavelengthNmFromTHz(thz)) / thz).toBeCloseTo(1, 12);
      }),
    );
  });

  it("refuses non-positive and non-finite input, naming the field", () => {
    expect(() => wavelengthNmFromTHz(0)).toThrow(OpticsInputError);
    expect(() => wavelengthNmFromTHz(Number.NaN)).toThrow(/frequencyTHz/);
    expect(() => frequencyTHzFromNm(-1550)).toThrow(/wavelengthNm: must be greater than 0/);
  });
});
