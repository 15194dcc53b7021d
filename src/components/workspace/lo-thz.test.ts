import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { loTHz } from "./hardware";

describe("loTHz", () => {
  it("adds the signed offset in GHz to the carrier in THz", () => {
    // docs/plan-format.md §8 "Worked example 1": carrier 193.4 THz, LO offset 184.81 GHz → laser 2 at 193.58481 THz (arithmetic)
    expect(loTHz(193.4, 184.81)).toBeCloseTo(193.58481, 9);
    expect(loTHz(193.4, -184.81)).toBeCloseTo(193.21519, 9);
  });
  it("offset back from the difference (independent: (lo − carrier) × 1000)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 180, max: 200, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        (c, o) => {
          expect((loTHz(c, o) - c) * 1000).toBeCloseTo(o, 6);
        },
      ),
    );
  });
});
