import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { channelPassbands } from "./channel-passbands";
import { formatChannelNotation } from "./format-channel-notation";
import { parseChannelNotation, type ChannelParseResult } from "./parse-channel-notation";

function value(r: ChannelParseResult) {
  if (!r.ok) throw new Error(`expected a parse, got ${r.error.part}: ${r.error.message}`);
  return r.value;
}
function error(r: ChannelParseResult) {
  if (r.ok) throw new Error(`expected an error, got ${JSON.stringify(r.value)}`);
  return r.error;
}

describe("parseChannelNotation", () => {
  it("reads the MHS channel table notation and expands the passbands", () => {
    // MHS channel 4 (channel table of the MHS instrument description):
    // 183.311 ± 3.00 GHz, 2 × 1000 MHz → passbands [179.811, 180.811] and [185.811, 186.811] GHz
    const ch = value(parseChannelNotation("183.311 ± 3.00 GHz, 2 × 1000 MHz"));
    expect(ch).toEqual({ centerGHz: 183.311, dsbOffsetGHz: 3, bandwidthMHz: 1000 });
    const [lower, upper] = channelPassbands(ch);
    expect(lower?.minGHz).toBeCloseTo(179.811, 9);
    expect(lower?.maxGHz).toBeCloseTo(180.811, 9);
    expect(upper?.minGHz).toBeCloseTo(185.811, 9);
    expect(upper?.maxGHz).toBeCloseTo(186.811, 9);
    // MHS channel 3: 183.311 ± 1.00 GHz with 2 × 500 MHz
    expect(value(parseChannelNotation("183.311 ± 1.00 GHz, 2 x 500 MHz"))).toEqual({
      centerGHz: 183.311,
      dsbOffsetGHz: 1,
      bandwidthMHz: 500,
    });
  });

  it("accepts the trade's variants", () => {
    // EUMETSAT ICI: 183.31 ± 7.0 GHz (bandwidth given separately)
    const ici = { centerGHz: 183.31, dsbOffsetGHz: 7, bandwidthMHz: 2000 };
    expect(value(parseChannelNotation("183.31 ± 7.0", { bandwidth: 2000 }))).toEqual(ici);
    expect(value(parseChannelNotation("183.31 +/- 7.0", { bandwidth: "2 × 2000 MHz" }))).toEqual(ici);
    expect(value(parseChannelNotation("183.31 ±7.0 GHz", { bandwidth: "2 GHz" }))).toEqual(ici);
    expect(value(parseChannelNotation("183.31GHz+-7GHz, 2x2GHz"))).toEqual(ici);
    // AMSU-B channel 2: 150 ± 0.9 GHz
    expect(value(parseChannelNotation("150 ± 0.9", { bandwidth: "2 x 500 MHz" }))).toEqual({
      centerGHz: 150,
      dsbOffsetGHz: 0.9,
      bandwidthMHz: 500,
    });
    // MHS channel 1: 89.0 GHz, 2800 MHz (single passband)
    const mhs1 = { centerGHz: 89, dsbOffsetGHz: null, bandwidthMHz: 2800 };
    expect(value(parseChannelNotation("89.0", { bandwidth: 2800 }))).toEqual(mhs1);
    expect(value(parseChannelNotation("89.0 GHz, 2800 MHz"))).toEqual(mhs1);
    expect(value(parseChannelNotation("89000 MHz; 2.8 GHz"))).toEqual(mhs1);
    // a bandwidth written in the notation wins over the separate one
    expect(value(parseChannelNotation("89.0 GHz, 2800 MHz", { bandwidth: 10 })).bandwidthMHz).toBe(2800);
  });

  it("names the part that did not parse", () => {
    expect(error(parseChannelNotation("abc ± 7"))).toMatchObject({ part: "centre", text: "abc" });
    expect(error(parseChannelNotation("183.31 ± seven", { bandwidth: 10 }))).toMatchObject({
      part: "offset",
      text: "seven",
    });
    expect(error(parseChannelNotation("183.31 ±", { bandwidth: 10 })).part).toBe("offset");
    expect(error(parseChannelNotation("183.31 ± 7, 2 × 1000")).message).toMatch(/needs a unit/);
    expect(error(parseChannelNotation("183.31 ± 7, 3 × 100 MHz")).message).toMatch(/2 × b/);
    expect(error(parseChannelNotation("183.31 ± 7, wide"))).toMatchObject({ part: "bandwidth", text: "wide" });
    expect(error(parseChannelNotation("183.31 ± 7")).part).toBe("bandwidth");
    expect(error(parseChannelNotation("89 GHz, 2 × 500 MHz")).message).toMatch(/double-sideband/);
    expect(error(parseChannelNotation("183.31 Hz", { bandwidth: 10 })).message).toMatch(/unknown unit “Hz”/);
    expect(error(parseChannelNotation("")).part).toBe("notation");
  });

  it("refuses quadruple-sideband channels as outside model v1", () => {
    // AMSU-A channel table: 57.290344 ± 0.3222 ± 0.048 GHz (quadruple sideband)
    const e = error(parseChannelNotation("57.290344 ± 0.3222 ± 0.048 GHz, 4 × 15 MHz"));
    expect(e.part).toBe("notation");
    expect(e.message).toMatch(/quadruple-sideband .* not in model v1/);
  });

  it("refuses overlapping or non-physical passbands (docs/plan-format.md §2.8 'Rules between fields': dsbOffsetGHz > bandwidthMHz/2000)", () => {
    expect(error(parseChannelNotation("183.31 ± 0.5 GHz, 2 × 1000 MHz")).part).toBe("offset");
    expect(error(parseChannelNotation("2 ± 1.9 GHz, 2 × 1000 MHz")).message).toMatch(/reach 0 GHz/);
    expect(error(parseChannelNotation("0 GHz, 10 MHz")).part).toBe("centre");
    expect(error(parseChannelNotation("89 GHz, 0 MHz")).part).toBe("bandwidth");
    expect(error(parseChannelNotation("89", { bandwidth: Number.NaN })).part).toBe("bandwidth");
  });

  it("round-trips formatted values exactly", () => {
    const positive = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
    const channel = fc
      .record({
        centerGHz: positive(1, 1000),
        dsb: fc.option(positive(1e-3, 50), { nil: null }),
        bandwidthMHz: positive(1e-3, 5000),
      })
      .filter(({ centerGHz, dsb, bandwidthMHz }) => {
        const half = bandwidthMHz / 2000;
        return dsb === null ? centerGHz - half > 0 : dsb > half && centerGHz - dsb - half > 0;
      })
      .map(({ centerGHz, dsb, bandwidthMHz }) => ({ centerGHz, dsbOffsetGHz: dsb, bandwidthMHz }));
    fc.assert(
      fc.property(channel, (ch) => {
        expect(value(parseChannelNotation(formatChannelNotation(ch)))).toEqual(ch);
      }),
    );
  });

  it("expands every accepted channel into passbands of the stated width around c or c ± d", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 400, noNaN: true }),
        fc.double({ min: 1, max: 20, noNaN: true }),
        fc.double({ min: 1, max: 1500, noNaN: true }),
        (c, d, b) => {
          const bands = channelPassbands({ centerGHz: c, dsbOffsetGHz: d, bandwidthMHz: b });
          expect(bands).toHaveLength(2);
          for (const band of bands) expect((band.maxGHz - band.minGHz) * 1000).toBeCloseTo(b, 6);
          expect(((bands[0]?.minGHz ?? 0) + (bands[1]?.maxGHz ?? 0)) / 2).toBeCloseTo(c, 9);
        },
      ),
    );
  });
});
