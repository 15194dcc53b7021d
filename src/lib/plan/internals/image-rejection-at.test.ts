import { describe, expect, it } from "vitest";
import { example1, example2 } from "../../../../tests/fixtures/plans/builders";
import { chainContext } from "./chain-context";
import { imageRejectionAt, imageRejectionWithContext } from "./image-rejection-at";

describe("imageRejectionAt", () => {
  it("reproduces example 1 at the written LO (49.48 dB) and agrees with the prepared-context form", () => {
    const plan = example1();
    const R = imageRejectionAt(plan, "A", "wv1", 184.81)!;
    expect(R).toBeCloseTo(49.4817, 3);
    expect(imageRejectionWithContext(chainContext(plan, "A"), "wv1", 184.81)).toBe(R);
  });

  it("is +Infinity when the image lies wholly outside the RF input (∫Wᵢ = 0), and null without a slot", () => {
    const plan = example1();
    // LO 6 GHz above: image at 195.31 ± 0.005 GHz, beyond the 195 GHz RF input edge
    expect(imageRejectionAt(plan, "A", "wv1", 183.31 + 6)).toBe(Infinity);
    expect(imageRejectionAt(plan, "A", "wv1", 183.31)).toBeNull();
  });

  it("counts only the part of the image band inside the RF input (kink at the rfInput edge)", () => {
    const plan = example1((p) => (p.channels[0]!.bandwidthMHz = 19.34));
    // with L half-way between 183.31 and 195 GHz the image band 2L − X is centred on the 195 GHz RF input edge
    const L = (183.31 + 195) / 2;
    const half = imageRejectionAt(plan, "A", "wv1", L)!;
    const planWide = example1((p) => {
      p.channels[0]!.bandwidthMHz = 19.34;
      p.chains[0]!.rfInput.maxGHz = 196;
    });
    const whole = imageRejectionAt(planWide, "A", "wv1", L)!;
    // half the (nearly flat) image response is cut off: about 3 dB more rejection
    expect(half - whole).toBeGreaterThan(2.9);
    expect(half - whole).toBeLessThan(3.1);
  });

  it("is null for a DSB channel and throws for an unknown channel id", () => {
    const plan = example2((p) => {
      p.channels[0]!.dsbOffsetGHz = 1;
    });
    expect(imageRejectionAt(plan, "O2", "o2-core", -121)).toBeNull();
    expect(() => imageRejectionAt(plan, "O2", "nope", -121)).toThrow(/no channel "nope"/);
  });
});
