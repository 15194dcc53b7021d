import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { feasibilityMap } from "./feasibility-map";
import { FRACTIONS, fullCheckCodes, interiorPoints } from "./feasibility-map.test-util";
import { buildMapModel, codesOfMask } from "./internals/map-model";
import { makePointEvaluator } from "./internals/map-point";
import { mapPieces } from "./internals/map-sweep";
import { arbitrarySmallPlan, arbitrarySmallPlanInput, parseOrThrow } from "./map-plans.test-util";
import { L_DEPENDENT_ERROR_CODES } from "./types";

describe("feasibility map: properties on random small plans", () => {
  it("agrees with the full per-offset check inside every feasible and excluded interval", () => {
    fc.assert(
      fc.property(arbitrarySmallPlan(), (plan) => {
        const pieces = mapPieces(buildMapModel(plan, "A"));
        const map = feasibilityMap(plan, "A");
        for (const { L, piece } of interiorPoints(pieces, [0, 0.5, 1])) {
          const got = fullCheckCodes(plan, "A", L);
          expect({ L, codes: got }).toEqual({ L, codes: codesOfMask(piece.mask) });
        }
        // feasible intervals: no L-dependent error anywhere inside
        for (const iv of map.feasibleGHz) {
          for (const f of [0.001, 0.5, 0.999]) {
            const L = iv[0] + f * (iv[1] - iv[0]);
            if (L - iv[0] > 3e-6 && iv[1] - L > 3e-6) expect(fullCheckCodes(plan, "A", L)).toEqual([]);
          }
        }
      }),
      { numRuns: 60 },
    );
  }, 60_000);

  it("agrees with the lean per-offset evaluation at many points", () => {
    fc.assert(
      fc.property(arbitrarySmallPlan({ maxChannels: 6 }), (plan) => {
        const model = buildMapModel(plan, "A");
        const pieces = mapPieces(model);
        const at = makePointEvaluator(model);
        for (const { L, piece } of interiorPoints(pieces, FRACTIONS)) {
          expect({ L, mask: at(L) }).toEqual({ L, mask: piece.mask });
        }
      }),
      { numRuns: 200 },
    );
  }, 60_000);

  it("agrees with the full per-offset check on plans with many Nyquist zones, wide reach and DSB channels", () => {
    const dense = fc
      .tuple(
        arbitrarySmallPlanInput({ maxChannels: 5 }),
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 40, noNaN: true }),
        fc.integer({ min: 1, max: 6 }),
        fc.boolean(),
      )
      .map(([p, fs, ext, orders, dsbAll]) => {
        const kHz = (x: number) => Math.round(x * 1e6) / 1e6;
        p.detectors[0]!.sampleRateGHz = kHz(fs);
        const r = p.lasers[0]!.reach[0]!;
        r.minGHz -= kHz(ext);
        r.maxGHz += kHz(ext);
        p.lasers[0]!.lock.orders = orders;
        if (dsbAll) for (const c of p.channels) c.dsbOffsetGHz ??= kHz(c.bandwidthMHz / 2000 + 0.3);
        return parseOrThrow(p);
      });
    fc.assert(
      fc.property(dense, (plan) => {
        const pieces = mapPieces(buildMapModel(plan, "A"));
        for (const { L, piece } of interiorPoints(pieces, [0.5])) {
          expect({ L, codes: fullCheckCodes(plan, "A", L) }).toEqual({ L, codes: codesOfMask(piece.mask) });
        }
      }),
      { numRuns: 40 },
    );
  }, 120_000);

  it("widening reach never removes a feasible offset", () => {
    fc.assert(
      fc.property(
        arbitrarySmallPlanInput(),
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        (input, wl, wh) => {
          const narrow = parseOrThrow(input);
          const wideInput = structuredClone(input);
          const r = wideInput.lasers[0]!.reach[0]!;
          r.minGHz -= wl;
          r.maxGHz += wh;
          const wide = parseOrThrow(wideInput);
          const before = feasibilityMap(narrow, "A").feasibleGHz;
          const after = feasibilityMap(wide, "A").feasibleGHz;
          for (const iv of before) {
            for (const f of [0, 0.25, 0.5, 0.75, 1]) {
              const L = iv[0] + f * (iv[1] - iv[0]);
              expect(after.some((w) => L >= w[0] - 3e-6 && L <= w[1] + 3e-6)).toBe(true);
            }
          }
        },
      ),
      { numRuns: 150 },
    );
  }, 60_000);

  it("adding a channel never adds a feasible offset", () => {
    fc.assert(
      fc.property(arbitrarySmallPlanInput({ maxChannels: 5 }), (input) => {
        fc.pre(input.channels.length >= 2);
        const fewer = structuredClone(input);
        fewer.channels.pop();
        const withAll = feasibilityMap(parseOrThrow(input), "A").feasibleGHz;
        const without = feasibilityMap(parseOrThrow(fewer), "A").feasibleGHz;
        for (const iv of withAll) {
          for (const f of [0, 0.25, 0.5, 0.75, 1]) {
            const L = iv[0] + f * (iv[1] - iv[0]);
            expect(without.some((w) => L >= w[0] - 3e-6 && L <= w[1] + 3e-6)).toBe(true);
          }
        }
      }),
      { numRuns: 150 },
    );
  }, 60_000);

  it("lists feasible intervals in increasing L, longer than 1 kHz, and excluded codes that are never empty", () => {
    fc.assert(
      fc.property(arbitrarySmallPlan(), (plan) => {
        const map = feasibilityMap(plan, "A");
        let last = -Infinity;
        for (const iv of map.feasibleGHz) {
          expect(iv[1] - iv[0]).toBeGreaterThan(1e-6);
          expect(iv[0]).toBeGreaterThanOrEqual(last);
          last = iv[1];
        }
        for (const e of map.excludedGHz) {
          expect(e.codes.length).toBeGreaterThan(0);
          expect(e.codes).toEqual(L_DEPENDENT_ERROR_CODES.filter((c) => e.codes.includes(c)));
        }
      }),
      { numRuns: 200 },
    );
  }, 60_000);
});
