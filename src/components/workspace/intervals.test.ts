import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { mergedCoverage } from "./intervals";

describe("mergedCoverage", () => {
  it("merges overlapping and touching intervals", () => {
    expect(
      mergedCoverage([
        { minGHz: 160, maxGHz: 170 },
        { minGHz: 150, maxGHz: 160 },
        { minGHz: 180, maxGHz: 190 },
        { minGHz: 185, maxGHz: 186 },
      ]),
    ).toEqual([
      { minGHz: 150, maxGHz: 170 },
      { minGHz: 180, maxGHz: 190 },
    ]);
  });
  it("covers exactly the same points as the input (checked by sampling against the plain definition)", () => {
    const iv = fc
      .tuple(fc.integer({ min: 0, max: 100 }), fc.integer({ min: 0, max: 20 }))
      .map(([a, w]) => ({ minGHz: a, maxGHz: a + w }));
    fc.assert(
      fc.property(fc.array(iv, { maxLength: 10 }), (ivs) => {
        const m = mergedCoverage(ivs);
        for (let k = 1; k < m.length; k++) expect(m[k]!.minGHz).toBeGreaterThan(m[k - 1]!.maxGHz);
        for (let x = -0.5; x <= 121; x += 0.5) {
          const inInput = ivs.some((i) => i.minGHz <= x && x <= i.maxGHz);
          const inMerged = m.some((i) => i.minGHz <= x && x <= i.maxGHz);
          expect(inMerged).toBe(inInput);
        }
      }),
    );
  });
});
