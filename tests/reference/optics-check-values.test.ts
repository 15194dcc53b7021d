/**
 * Published and derived check values for the optics helpers. Each value
 * names its source; the derived ones are worked out in docs/helpers.md
 * (Derived check values).
 */
import { describe, expect, it } from "vitest";
import {
  channelPassbands,
  flexGridSlot,
  freeSpectralRange,
  fsrShiftPerKelvin,
  groupIndex,
  linewidthFromQ,
  lnExtraordinaryIndexJundt,
  lnIndexZelmon,
  modeShiftPerKelvin,
  nearestGridChannel,
  parseChannelNotation,
  planckRadiationTemperature,
  quantumLimitK,
  radiusForFsr,
  wavelengthNmFromTHz,
} from "@/lib/optics";

describe("published check values", () => {
  it("ITU-T G.694.1 grid", () => {
    // ITU-T G.694.1 anchor: 193.1 THz → 1552.524 nm (±0.001 nm), c = 299 792 458 m/s
    expect(Math.abs(wavelengthNmFromTHz(193.1) - 1552.524)).toBeLessThanOrEqual(0.001);
    // ITU-T G.694.1 fixed grid, 50 GHz, N = +1 → 193.15 THz → 1552.122 nm
    const n1 = nearestGridChannel(193.15, 50);
    expect(n1.index).toBe(1);
    expect(Math.abs(wavelengthNmFromTHz(n1.centreTHz) - 1552.122)).toBeLessThanOrEqual(0.001);
    // ITU-T G.694.1 (2012) flexible grid: n = −5, m = 3 → 193.06875 THz, 37.5 GHz slot
    const slot = flexGridSlot(-5, 3);
    expect(slot.centreTHz).toBeCloseTo(193.06875, 9);
    expect(slot.widthGHz).toBe(37.5);
  });

  it("LiNbO3 Sellmeier fits", () => {
    // Zelmon, Small & Jundt, JOSA B 14, 3319 (1997), 21 °C: n_e(1.550 µm) = 2.1376, n_e(1.064 µm) = 2.1555 (±2e-4)
    expect(Math.abs(lnIndexZelmon(1.55, "e") - 2.1376)).toBeLessThanOrEqual(2e-4);
    expect(Math.abs(lnIndexZelmon(1.064, "e") - 2.1555)).toBeLessThanOrEqual(2e-4);
    // same paper, ordinary ray: n_o(1.550 µm) = 2.2111
    expect(Math.abs(lnIndexZelmon(1.55, "o") - 2.2111)).toBeLessThanOrEqual(2e-4);
    // Jundt, Opt. Lett. 22, 1553 (1997): n_e(1.55 µm, 24.5 °C) = 2.1379 (±2e-4)
    expect(Math.abs(lnExtraordinaryIndexJundt(1.55, 24.5) - 2.1379)).toBeLessThanOrEqual(2e-4);
  });

  it("quantum limit and Planck radiation temperature", () => {
    // exact SI constants: h·f/k at 183.31 GHz = 8.797 K (±0.001 K)
    expect(Math.abs(quantumLimitK(183.31) - 8.797)).toBeLessThanOrEqual(0.001);
    // Planck law: J(300 K, 183.31 GHz) = 295.62 K
    expect(planckRadiationTemperature(300, 183.31)).toBeCloseTo(295.62, 2);
  });

  it("sounder channel expansion", () => {
    // MHS channel table: "183.311 ± 3.00 GHz, 2 × 1000 MHz" → [179.811, 180.811] and [185.811, 186.811] GHz
    const parsed = parseChannelNotation("183.311 ± 3.00 GHz, 2 × 1000 MHz");
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const bands = channelPassbands(parsed.value).map((b) => [b.minGHz, b.maxGHz]);
    expect(bands).toHaveLength(2);
    const expected = [
      [179.811, 180.811],
      [185.811, 186.811],
    ];
    bands.forEach((band, i) => {
      expect(band[0]).toBeCloseTo(expected[i]?.[0] ?? NaN, 9);
      expect(band[1]).toBeCloseTo(expected[i]?.[1] ?? NaN, 9);
    });
  });
});

describe("derived check values (docs/helpers.md, not published)", () => {
  it("group index, FSR and radius", () => {
    // derived from Jundt 1997: n_g(e, 1.55 µm) = 2.1824
    expect(groupIndex(1.55, { fit: "jundt", temperatureC: 24.5 }).ng).toBeCloseTo(2.18, 2);
    // derived: R = 1 mm, n_g = 2.1824 → 21.86 GHz; R = 119.27 µm → 183.31 GHz
    expect(freeSpectralRange(1000, 2.1824)).toBeCloseTo(21.86, 2);
    expect(freeSpectralRange(119.27, 2.1824)).toBeCloseTo(183.31, 2);
    expect(radiusForFsr(183.31, 2.1824)).toBeCloseTo(119.3, 1);
  });

  it("linewidth and thermal tuning", () => {
    // derived: ν = 193.4 THz, Q_L = 1e8 → 1.934 MHz
    expect(linewidthFromQ(193.4, 1e8)).toBeCloseTo(1.934, 6);
    // derived: −6.2 GHz/K per mode at 193.4 THz; −6.4 MHz/K on a 183.31 GHz FSR
    expect(modeShiftPerKelvin(193.4, 25).ghzPerK).toBeCloseTo(-6.2, 1);
    expect(fsrShiftPerKelvin(183.31, 193.4, 25).mhzPerK).toBeCloseTo(-6.4, 1);
  });
});
