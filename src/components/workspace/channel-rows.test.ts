import { describe, expect, it } from "vitest";
import fc from "fast-check";
import type { Chain, PlanResult } from "@/queries/types";
import { channelRow, EX1_WV1_RESULT } from "../../../tests/fixtures/demo-values";
import { buildChannelRows, channelCell, rfBands } from "./channel-rows";

const chain = { id: "uuid-a", key: "A" } as Chain;
const channel = channelRow;

describe("rfBands", () => {
  it("gives c ± B/2 for SSB and the two bands c ± d ± B/2 for DSB (docs/plan-format.md §3.2 'Per channel')", () => {
    expect(rfBands({ centerGHz: 183.31, bandwidthMHz: 10, dsbOffsetGHz: null })).toEqual([[183.305, 183.315]]);
    const [lo, hi] = rfBands({ centerGHz: 183.31, bandwidthMHz: 1000, dsbOffsetGHz: 3 });
    expect(lo?.[0]).toBeCloseTo(179.81, 9);
    expect(hi?.[1]).toBeCloseTo(186.81, 9);
  });
  it("every band is B wide and centred where it should be", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 400, noNaN: true }),
        fc.double({ min: 0.001, max: 2000, noNaN: true }),
        fc.option(fc.double({ min: 1.1, max: 20, noNaN: true }), { nil: null }),
        (c, b, d) => {
          const bands = rfBands({ centerGHz: c, bandwidthMHz: b, dsbOffsetGHz: d });
          expect(bands).toHaveLength(d === null ? 1 : 2);
          for (const [lo, hi] of bands) expect(hi - lo).toBeCloseTo(b / 1000, 6);
          const mid = bands.reduce((s, [lo, hi]) => s + (lo + hi) / 2, 0) / bands.length;
          expect(mid).toBeCloseTo(c, 6);
        },
      ),
    );
  });
});

describe("buildChannelRows", () => {
  const result: PlanResult = {
    format: "heterolane.result/2",
    chains: [],
    spurs: [],
    channels: [
      {
        ...EX1_WV1_RESULT,
        radiometricBandwidthMHz: 9.9999,
        envelope: {
          worstNedtK: 81.12,
          worstNedtAt: { loShiftMHz: -20, temperatureOffsetK: 0 },
          worstRadiometricBandwidthMHz: 9.99,
          worstRadiometricBandwidthAt: { loShiftMHz: -20, temperatureOffsetK: 0 },
          worstImageRejectionDB: 42.71,
          worstImageRejectionAt: { loShiftMHz: -20, temperatureOffsetK: 0 },
          worstModeResponse: 0.1895,
          worstModeResponseAt: { loShiftMHz: -20, temperatureOffsetK: 0 },
          centreErrorMHz: 19.32,
          centreErrorAt: { loShiftMHz: -20, temperatureOffsetK: 0 },
        },
      },
    ],
    findings: [
      { code: "lock-replica", severity: "warning", chain: "A", channel: "wv1", message: "m", data: {} },
      { code: "slot-overlap", severity: "error", chain: "A", channel: "wv1", message: "m", data: { other: "wv2" } },
      { code: "carrier-dominates-lo", severity: "warning", chain: "A", channel: null, message: "m", data: {} },
    ],
  };
  it("joins chain key, result and worst finding by plan key", () => {
    const rows = buildChannelRows([channel("wv1"), channel("wv2", { requiredNedtK: null })], [chain], result);
    expect(rows[0]?.chainKey).toBe("A");
    expect(rows[0]?.nedt.state).toBe("met");
    expect(rows[0]?.worst?.code).toBe("slot-overlap");
    expect(rows[0]?.findingCount).toBe(2);
    expect(rows[1]?.result).toBeNull();
    expect(rows[1]?.worst?.code).toBe("slot-overlap");
    expect(channelCell(rows[0]!, "worst")).toBe(3);
    expect(channelCell(rows[1]!, "nedt")).toBeNull();
  });
  it("works with no result yet", () => {
    const rows = buildChannelRows([channel("wv1")], [chain], null);
    expect(rows[0]?.worst).toBeNull();
    expect(rows[0]?.nedt.state).toBe("no-estimate");
  });
});
