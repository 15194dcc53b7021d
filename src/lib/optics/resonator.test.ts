import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { freeSpectralRange } from "./free-spectral-range";
import { linewidthFromQ } from "./linewidth-from-q";
import { loadedQFromLinewidth } from "./loaded-q-from-linewidth";
import { radiusForFsr } from "./radius-for-fsr";

const radius = fc.double({ min: 10, max: 10_000, noNaN: true });
const ng = fc.double({ min: 1.3, max: 4, noNaN: true });

describe("freeSpectralRange / radiusForFsr", () => {
  it("gives the derived check values of docs/helpers.md (derived, not published)", () => {
    // derived: R = 1 mm, n_g = 2.1824 → FSR = 21.86 GHz
    expect(freeSpectralRange(1000, 2.1824)).toBeCloseTo(21.86, 2);
    // derived: R = 0.25 mm → 87.5 GHz
    expect(freeSpectralRange(250, 2.1824)).toBeCloseTo(87.45, 1);
    // derived: FSR = 183.31 GHz → R ≈ 119.3 µm (119.27 µm)
    expect(radiusForFsr(183.31, 2.1824)).toBeCloseTo(119.27, 2);
  });

  it("agrees with FSR = c / (n_g · circumference) written independently", () => {
    fc.assert(
      fc.property(radius, ng, (r, g) => {
        const circumferenceM = 2 * Math.PI * (r / 1e6);
        const fsrHz = 299_792_458 / g / circumferenceM;
        expect(freeSpectralRange(r, g) / (fsrHz / 1e9)).toBeCloseTo(1, 12);
      }),
    );
  });

  it("falls as the radius grows", () => {
    fc.assert(
      fc.property(radius, radius, ng, (a, b, g) => {
        fc.pre(Math.abs(a - b) > 1e-9 * Math.max(a, b));
        const [small, large] = a < b ? [a, b] : [b, a];
        expect(freeSpectralRange(large, g)).toBeLessThan(freeSpectralRange(small, g));
      }),
    );
  });

  it("round-trips radius → FSR → radius", () => {
    fc.assert(
      fc.property(radius, ng, (r, g) => {
        expect(radiusForFsr(freeSpectralRange(r, g), g) / r).toBeCloseTo(1, 12);
      }),
    );
  });

  it("refuses zero or negative radius and group index, naming the field", () => {
    expect(() => freeSpectralRange(0, 2.18)).toThrow(/radiusUm/);
    expect(() => radiusForFsr(183.31, -1)).toThrow(/groupIndex/);
  });
});

describe("linewidthFromQ / loadedQFromLinewidth", () => {
  it("matches δν = ν/Q at 193.4 THz", () => {
    // derived in docs/helpers.md (Derived check values): Q_L = 1e8 → 1.934 MHz, 1e7 → 19.34 MHz, 1e6 → 193.4 MHz
    expect(linewidthFromQ(193.4, 1e8)).toBeCloseTo(1.934, 6);
    expect(linewidthFromQ(193.4, 1e7)).toBeCloseTo(19.34, 6);
    expect(linewidthFromQ(193.4, 1e6)).toBeCloseTo(193.4, 6);
    // photon lifetime τ = 1/(2π δν) ≈ 82 ns at Q_L = 1e8 (derived, docs/helpers.md)
    expect(1 / (2 * Math.PI * linewidthFromQ(193.4, 1e8) * 1e6)).toBeCloseTo(82.3e-9, 10);
  });

  it("round-trips Q → linewidth → Q and is inversely proportional", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 1000, noNaN: true }),
        fc.double({ min: 1e3, max: 1e11, noNaN: true }),
        (nu, q) => {
          expect(loadedQFromLinewidth(nu, linewidthFromQ(nu, q)) / q).toBeCloseTo(1, 12);
          expect(linewidthFromQ(nu, 2 * q) * 2).toBeCloseTo(linewidthFromQ(nu, q), 9);
        },
      ),
    );
  });

  it("refuses Q ≤ 0", () => {
    expect(() => linewidthFromQ(193.4, 0)).toThrow(/loadedQ/);
    expect(() => loadedQFromLinewidth(193.4, Number.POSITIVE_INFINITY)).toThrow(/linewidthMHz/);
  });
});
