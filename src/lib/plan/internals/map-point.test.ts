import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { example1, example2 } from "../../../../tests/fixtures/plans/builders";
import { checkChainAtOffset } from "../check-chain-at-offset";
import { arbitrarySmallPlan } from "../map-plans.test-util";
import { L_DEPENDENT_ERROR_CODES } from "../types";
import { buildMapModel, codesOfMask } from "./map-model";
import { makePointEvaluator } from "./map-point";

const dbl = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/** The L-dependent error codes of the full per-offset check, in rules-table order. */
function fullCodes(plan: Parameters<typeof checkChainAtOffset>[0], chain: string, L: number): string[] {
  const seen = new Set<string>();
  for (const f of checkChainAtOffset(plan, chain, L))
    if (f.severity === "error" && L_DEPENDENT_ERROR_CODES.includes(f.code)) seen.add(f.code);
  return L_DEPENDENT_ERROR_CODES.filter((c) => seen.has(c));
}

describe("lean per-offset evaluation (the benchmark's grid reference)", () => {
  it("example 1 at the plan's own LO (184.81 GHz) and at hand-picked offsets", () => {
    const plan = example1();
    const at = makePointEvaluator(buildMapModel(plan, "A"));
    // 184.81: O = [1.475, 1.525] inside [0.05, 6], image 49.5 dB ≥ 25 dB, lock tones ≤ 0.24 far below
    expect(codesOfMask(at(184.81))).toEqual([]);
    // 183.31: the LO inside the band [183.305, 183.315]
    expect(codesOfMask(at(183.31))).toEqual(["lo-in-band"]);
    // 183.5: O = [0.165, 0.215], the lock-self tones 0.18 and 0.24 come within the 50 MHz guard;
    // and with the LO 20 MHz low (its drift) the image band 0.36 GHz above the mode is rejected
    // by only 24.4 dB (the image rule over the operating envelope, docs/plan-format.md §12.5)
    expect(codesOfMask(at(183.5))).toEqual(["image-response", "spur-in-slot"]);
    // 150: drift window leaves the reach; IF ≈ 33 GHz
    expect(codesOfMask(at(150))).toEqual(["lo-uncovered", "if-outside-detector"]);
    // a tie: at L = 189.285 O.hi = 6 exactly (within rounding), which passes
    expect(codesOfMask(at(189.285))).toEqual([]);
  });

  it("agrees with the full per-offset check at random offsets of random small plans", () => {
    fc.assert(
      fc.property(
        arbitrarySmallPlan({ maxChannels: 5 }),
        fc.array(dbl(0, 1), { minLength: 5, maxLength: 5 }),
        (plan, fs) => {
          const m = buildMapModel(plan, "A");
          const at = makePointEvaluator(m);
          const lo = m.reach[0]![0] - 0.5;
          const hi = m.reach[m.reach.length - 1]![1] + 0.5;
          for (const f of fs) {
            const L = lo + f * (hi - lo);
            expect({ L, codes: codesOfMask(at(L)) }).toEqual({ L, codes: fullCodes(plan, "A", L) });
          }
        },
      ),
      { numRuns: 120 },
    );
  }, 60_000);

  it("agrees with the full check on example 2 on a 5 MHz grid", () => {
    const plan = example2();
    const at = makePointEvaluator(buildMapModel(plan, "O2"));
    for (let k = 0; k <= 6000; k += 7) {
      const L = -130 + k * 0.005;
      expect({ L, codes: codesOfMask(at(L)) }).toEqual({ L, codes: fullCodes(plan, "O2", L) });
    }
  }, 60_000);
});
