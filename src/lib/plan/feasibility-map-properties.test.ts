// (Longer than most files: each property of the exact map is checked against the sampled full check here, with the shared generators at the top; one describe block per property.)
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { feasibilityMap } from "./feasibility-map";
import { FRACTIONS, fullCheckCodes, interiorPoints } from "./feasibility-map.test-util";
import { buildMapModel, codesOfMask } from "./internals/map-model";
import { makePointEvaluator } from "./internals/map-point";
import { mapPieces } from "./internals/map-sweep";
import {
  arbitraryEnvelopePlan,
  arbitraryEnvelopePlanInput,
  arbitrarySmallPlan,
  arbitrarySmallPlanInput,
  parseOrThrow,
} from "./map-plans.test-util";
import { L_DEPENDENT_ERROR_CODES } from "./types";
import type { Plan } from "@/schemas/plan";

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

describe("feasibility map: properties over an operating envelope (LO drift and resonator temperature)", () => {
  it("agrees with the full per-offset check inside every feasible and excluded interval (D > 0, Te ≥ 0, either IF filter)", () => {
    fc.assert(
      fc.property(arbitraryEnvelopePlan(), (plan) => {
        const pieces = mapPieces(buildMapModel(plan, "A"));
        for (const { L, piece } of interiorPoints(pieces, [0, 0.5, 1])) {
          expect({ L, codes: fullCheckCodes(plan, "A", L) }).toEqual({ L, codes: codesOfMask(piece.mask) });
        }
      }),
      { numRuns: 60 },
    );
  }, 120_000);

  it("agrees with the lean per-offset evaluation at many points", () => {
    fc.assert(
      fc.property(arbitraryEnvelopePlan({ maxChannels: 6 }), (plan) => {
        const model = buildMapModel(plan, "A");
        const pieces = mapPieces(model);
        const at = makePointEvaluator(model);
        for (const { L, piece } of interiorPoints(pieces, FRACTIONS)) {
          expect({ L, mask: at(L) }).toEqual({ L, mask: piece.mask });
        }
      }),
      { numRuns: 150 },
    );
  }, 120_000);

  it("agrees with the full per-offset check on plans with many Nyquist zones, wide reach and DSB channels", () => {
    const dense = fc
      .tuple(
        arbitraryEnvelopePlanInput({ maxChannels: 5 }),
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 40, noNaN: true }),
        fc.boolean(),
      )
      .map(([p, fs, ext, dsbAll]) => {
        const kHz = (x: number) => Math.round(x * 1e6) / 1e6;
        p.detectors[0]!.sampleRateGHz = kHz(fs);
        const r = p.lasers[0]!.reach[0]!;
        r.minGHz -= kHz(ext);
        r.maxGHz += kHz(ext);
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
      { numRuns: 30 },
    );
  }, 120_000);

  it("a larger envelope never adds a feasible offset (more drift or more temperature excursion)", () => {
    fc.assert(
      fc.property(arbitraryEnvelopePlanInput(), fc.double({ min: 0, max: 1, noNaN: true }), (input, f) => {
        const small = structuredClone(input);
        small.lasers[0]!.driftMHz = Math.round(input.lasers[0]!.driftMHz * f * 1000) / 1000;
        small.chains[0]!.temperatureExcursionK =
          Math.round((input.chains[0]!.temperatureExcursionK ?? 0) * f * 1000) / 1000;
        // the occupied-band filter widens with the drift, which can move its occupied band into the detector
        fc.pre(input.channels.every((c) => c.ifFilter !== "occupied"));
        const wide = feasibilityMap(parseOrThrow(input), "A").feasibleGHz;
        const narrow = feasibilityMap(parseOrThrow(small), "A").feasibleGHz;
        for (const iv of wide) {
          for (const x of [0.25, 0.5, 0.75]) {
            const L = iv[0] + x * (iv[1] - iv[0]);
            expect(narrow.some((w) => L >= w[0] - 3e-6 && L <= w[1] + 3e-6)).toBe(true);
          }
        }
      }),
      { numRuns: 80 },
    );
  }, 120_000);
});

/**
 * Regression examples of the map against the per-offset check (ADR 020):
 * a lower-sideband DSB channel centred on the LO at L = −20 GHz whose IF
 * slot starts exactly on the Nyquist edge 3·fs/2 = 0.3 GHz. At L = −20
 * the slot edge is 0.3 − 2.8e-15 GHz (rounding): a tie the per-offset
 * check decides with its allowance (no straddle); a hair off −20 the hull
 * of the two band images straddles. The map once reported the straddle at
 * −20 itself (seed 1439680817), and then, with a second channel on the
 * same edge, missed the alias-overlap that only the tie lets in. One tie
 * rule (docs/plan-format.md §6.2) now leaves the same 2·1e-9 GHz hole in
 * the map's sets as in the check.
 */
describe("feasibility map: the tie at a joint of linear pieces (regression examples, seed 1439680817)", () => {
  const base = {
    format: "heterolane.plan/1",
    name: "Demo data: generated small plan",
    settings: { guardMHz: 0, imageRejectionDB: 0, spurMaxOrder: 3, replicaLimitDB: -20 },
    lasers: [
      {
        id: "LP",
        carrierTHz: 193.4,
        carrierPowerMW: 5,
        loPowerMW: 5,
        reach: [{ minGHz: -100, maxGHz: 60.5 }],
        stepMHz: 0,
        driftMHz: 0,
        lock: { modulationMHz: 10, modulationIndex: 0.5, orders: 1 },
      },
    ],
    resonators: [{ id: "R", fsrGHz: 20, loadedQ: 100000 }],
    detectors: [{ id: "D", minGHz: 0, maxGHz: 0.5, maxInputMW: 10, sampleRateGHz: 0.2 }],
    chains: [
      {
        id: "A",
        laser: "LP",
        resonator: "R",
        detector: "D",
        mode: 1,
        sideband: "lower",
        loOffsetGHz: -20,
        rfInput: { minGHz: 19.5, maxGHz: 20.5 },
        tapFraction: 0.01,
        pathLossDB: 3,
        carrierRejectionDB: 0,
        sharedIf: false,
      },
    ],
  };
  const channel = (id: string, bandwidthMHz: number, dsbOffsetGHz: number) => ({
    id,
    name: `demo channel ${id}`,
    chain: "A",
    centerGHz: 20,
    bandwidthMHz,
    dsbOffsetGHz,
    integrationMs: 10,
    antennaK: 250,
    receiverK: 3000,
    gainStability: 0,
    requiredNedtK: null,
  });
  const cases: [string, unknown[]][] = [
    ["one channel: no nyquist-straddle at the tie", [channel("ch0", 5, 0.3025)]],
    [
      "three channels: the alias-overlap the tie lets in",
      [channel("ch0", 18.790000000000003, 0.309395), channel("ch1", 37.731, 0.318865), channel("ch2", 5, 0.478711)],
    ],
  ];
  it.each(cases)("%s", (_name, channels) => {
    const plan = parseOrThrow({ ...base, channels });
    const pieces = mapPieces(buildMapModel(plan, "A"));
    // the map at L = −20 itself (the piece holding it) and at every interior point
    const holding =
      pieces.find((p) => p.lo <= -20 && -20 <= p.hi && p.hi - p.lo < 1e-8) ??
      pieces.find((p) => p.lo <= -20 && -20 <= p.hi)!;
    expect(codesOfMask(holding.mask)).toEqual(fullCheckCodes(plan, "A", -20));
    for (const { L, piece } of interiorPoints(pieces, [0, 0.5, 1])) {
      expect({ L, codes: fullCheckCodes(plan, "A", L) }).toEqual({ L, codes: codesOfMask(piece.mask) });
    }
    const at = makePointEvaluator(buildMapModel(plan, "A"));
    expect(codesOfMask(at(-20))).toEqual(fullCheckCodes(plan, "A", -20));
  });
});

/**
 * Regression examples of the map over an operating envelope (found by the
 * envelope properties above while they were written):
 * - an occupied-band filter whose image rule fires from the very offset
 *   where the filter becomes possible (slot.lo = D): the search must take
 *   the rule's value there from inside, not "no figure";
 * - a box over which the image band enters ±rfInput only at one end (+∞
 *   rejection at the other): the full search and the map's early stop
 *   must agree that the finite end is the worst.
 */
describe("feasibility map over an envelope: regression examples", () => {
  const plan = (filter: "slot" | "occupied", driftMHz: number, loadedQ: number, centerGHz: number, te: number) =>
    parseOrThrow({
      format: "heterolane.plan/2",
      name: "Demo data: generated small plan",
      settings: { guardMHz: 0, imageRejectionDB: 0, spurMaxOrder: 3, replicaLimitDB: -20 },
      lasers: [
        {
          id: "LP",
          carrierTHz: 193.4,
          carrierPowerMW: 5,
          loPowerMW: 5,
          reach: [{ minGHz: -20, maxGHz: -19.5 }],
          stepMHz: 0,
          driftMHz,
          lock: { modulationMHz: 10, modulationIndex: 0.5, orders: 1 },
        },
      ],
      resonators: [{ id: "R", fsrGHz: 20, loadedQ, fsrShiftMHzPerK: 0 }],
      detectors: [{ id: "D", minGHz: 0, maxGHz: 0.5, maxInputMW: 10, sampleRateGHz: null }],
      chains: [
        {
          id: "A",
          laser: "LP",
          resonator: "R",
          detector: "D",
          mode: 1,
          sideband: "lower",
          loOffsetGHz: -20,
          rfInput: { minGHz: 19.5, maxGHz: 20.5 },
          tapFraction: 0.01,
          pathLossDB: 3,
          carrierRejectionDB: 0,
          sharedIf: false,
          temperatureExcursionK: te,
        },
      ],
      channels: [
        {
          id: "ch0",
          name: "demo channel 0",
          chain: "A",
          centerGHz,
          bandwidthMHz: 5,
          dsbOffsetGHz: null,
          integrationMs: 10,
          antennaK: 250,
          receiverK: 3000,
          gainStability: 0,
          requiredNedtK: null,
          ifFilter: filter,
          centreToleranceMHz: null,
        },
      ],
    });
  const cases: [string, Plan][] = [
    [
      "the occupied-band filter at the offset where it becomes possible",
      plan("occupied", 0.5, 41735.66289232095, 20, 0),
    ],
    ["an image band that meets ±rfInput at one end of the box only", plan("slot", 40, 10000, 19.537494, 0.001)],
  ];
  it.each(cases)("%s", (_name, p) => {
    const model = buildMapModel(p, "A");
    const pieces = mapPieces(model);
    const at = makePointEvaluator(model);
    for (const { L, piece } of interiorPoints(pieces, FRACTIONS)) {
      expect({ L, codes: fullCheckCodes(p, "A", L) }).toEqual({ L, codes: codesOfMask(piece.mask) });
      expect({ L, mask: at(L) }).toEqual({ L, mask: piece.mask });
    }
  });
});
