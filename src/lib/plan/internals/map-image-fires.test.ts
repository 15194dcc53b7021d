import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { example1 } from "../../../../tests/fixtures/plans/builders";
import { arbitrarySmallPlan } from "../map-plans.test-util";
import { imageFires, imageRejectionDB, makeComb, makeImageFires } from "./map-image";
import { buildMapModel } from "./map-model";

const dbl = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

describe("image rule without the logarithm (makeImageFires)", () => {
  it("answers exactly as imageFires at random offsets of random plans", () => {
    fc.assert(
      fc.property(arbitrarySmallPlan(), dbl(0, 1), (p, f) => {
        const m = buildMapModel(p, "A");
        const c = makeComb(m.linewidth, m.fsr);
        const r = m.reach[0]!;
        const L = r[0] + f * (r[1] - r[0]);
        for (const ch of m.channels) {
          expect(makeImageFires(c, m, ch)(L)).toBe(imageFires(c, m, ch, L));
        }
      }),
      { numRuns: 300 },
    );
  }, 60_000);

  it("answers exactly as imageFires with the threshold set right at the rejection (the logarithm decides)", () => {
    // example 1 at L = 184.81 GHz: R = 49.4817 dB (tests/fixtures/plans/ex1-single-channel.expected.json)
    const plan = example1();
    const base = buildMapModel(plan, "A");
    const c = makeComb(base.linewidth, base.fsr);
    const ch = base.channels[0]!;
    const R = imageRejectionDB(c, base, ch, 184.81);
    expect(R).toBeCloseTo(49.48171342092203, 6);
    for (const shift of [-1e-6, -1.1e-9, -1e-9, -0.9e-9, 0, 0.9e-9, 1e-9, 1.1e-9, 1e-6]) {
      const m = { ...base, imageRejectionDB: R + shift };
      const fast = makeImageFires(c, m, ch)(184.81);
      expect(fast).toBe(imageFires(c, m, ch, 184.81));
      expect(fast).toBe(R < R + shift - 1e-9);
    }
    // absurd thresholds (the ratio overflows or underflows): still the same answers
    for (const t of [-1e6, -400, 400, 1e6]) {
      const m = { ...base, imageRejectionDB: t };
      expect(makeImageFires(c, m, ch)(184.81)).toBe(imageFires(c, m, ch, 184.81));
    }
  });
});
