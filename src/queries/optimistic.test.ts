import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { applyChannelEdit } from "./optimistic";
import type { Channel } from "./types";
import { channelRow } from "../../tests/fixtures/demo-values";

const ch = (id: string, centerGHz: number): Channel =>
  channelRow(id, { id, chainId: "c", centerGHz, requiredNedtK: null });

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
