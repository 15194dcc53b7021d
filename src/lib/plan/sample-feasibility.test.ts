import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { example1 } from "../../../tests/fixtures/plans/builders";
import { buildMapModel, codesOfMask } from "./internals/map-model";
import { mapPieces, type MapPiece } from "./internals/map-sweep";
import { arbitrarySmallPlan } from "./map-plans.test-util";
import { sampleFeasibility } from "./sample-feasibility";

/** The map piece holding L and its distance to the nearest edge of that piece. */
function pieceAt(pieces: readonly MapPiece[], L: number): { piece: MapPiece; margin: number } | null {
  for (const piece of pieces) {
    if (L >= piece.lo && L <= piece.hi) return { piece, margin: Math.min(L - piece.lo, piece.hi - L) };
  }
  return null;
}

describe("sampleFeasibility (brute-force reference)", () => {
  it("samples every merged reach interval from edge to edge with the full per-offset check", () => {
    const samples = sampleFeasibility(example1(), "A", 0.5);
    expect(samples[0]!.L).toBe(150);
    expect(samples[samples.length - 1]!.L).toBe(200);
    expect(samples.length).toBe(101);
    // 150: drift window [149.98, 150.02] leaves the reach, and the IF (≈ 33 GHz) is outside the detector
    expect(samples[0]!.codes).toEqual(["lo-uncovered", "if-outside-detector"]);
    // 180.0: O = [3.285, 3.335] inside [0.05, 6], far from every error spur
    expect(samples.find((s) => s.L === 180)!.codes).toEqual([]);
  });

  it("refuses a non-positive step", () => {
    expect(() => sampleFeasibility(example1(), "A", 0)).toThrow(/stepGHz/);
  });

  it("agrees with the exact map on random small plans", () => {
    fc.assert(
      fc.property(arbitrarySmallPlan({ maxChannels: 3 }), (plan) => {
        const model = buildMapModel(plan, "A");
        const span = model.reach.reduce((s, r) => s + r[1] - r[0], 0);
        const step = span / 200;
        const samples = sampleFeasibility(plan, "A", step);
        const pieces = mapPieces(model);
        // away from the map's edges by more than a step, the sampler sees exactly the map's codes
        for (const s of samples) {
          const at = pieceAt(pieces, s.L);
          expect(at).not.toBeNull();
          if (at!.margin > step)
            expect({ L: s.L, codes: s.codes }).toEqual({ L: s.L, codes: codesOfMask(at!.piece.mask) });
        }
        // every edge between two pieces longer than a step lies within a step of a sampler transition
        for (let i = 0; i + 1 < pieces.length; i++) {
          const a = pieces[i]!;
          const b = pieces[i + 1]!;
          if (a.hi !== b.lo || a.hi - a.lo <= 2 * step || b.hi - b.lo <= 2 * step) continue;
          const x = a.hi;
          const near = samples.filter((s) => Math.abs(s.L - x) <= step * (1 + 1e-6));
          const kinds = new Set(near.map((s) => s.codes.join()));
          expect({ edge: x, transition: kinds.size > 1 }).toEqual({ edge: x, transition: true });
        }
      }),
      { numRuns: 20 },
    );
  }, 120_000);
});
