import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { applyChannelEdit } from "./optimistic";
import type { Channel } from "./types";

const ch = (id: string, centerGHz: number): Channel => ({
  id,
  version: 1,
  key: id,
  name: id,
  chainId: "c",
  centerGHz,
  bandwidthMHz: 10,
  dsbOffsetGHz: null,
  integrationMs: 10,
  antennaK: 250,
  receiverK: 5000,
  gainStability: 0,
  requiredNedtK: null,
  ifFilter: "slot",
  centreToleranceMHz: null,
  receiverKSource: "entered",
});

describe("applyChannelEdit", () => {
  it("changes only the edited channel and keeps the stored version", () => {
    const out = applyChannelEdit([ch("a", 183.31), ch("b", 118.75)], "b", { centerGHz: 119, version: 7 });
    expect(out[0]).toEqual(ch("a", 183.31));
    expect(out[1]?.centerGHz).toBe(119);
    expect(out[1]?.version).toBe(1);
  });
  it("leaves the list unchanged for an unknown id and never changes its length", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 1, max: 400, noNaN: true }), { maxLength: 8 }), (centres) => {
        const list = centres.map((c, i) => ch(`c${i}`, c));
        const out = applyChannelEdit(list, "nope", { centerGHz: 1 });
        expect(out).toEqual(list);
        expect(applyChannelEdit(list, "c0", { centerGHz: 1 })).toHaveLength(list.length);
      }),
    );
  });
});
