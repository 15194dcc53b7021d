import { describe, expect, it } from "vitest";
import fc from "fast-check";
import ex1 from "../../../tests/fixtures/plans/ex1-single-channel.plan.json";
import ex2 from "../../../tests/fixtures/plans/ex2-lower-sideband-sampled.plan.json";
import { EX1_WV1_RESULT } from "../../../tests/fixtures/demo-values";
import { SPUR_FAMILIES } from "@/lib/plan";
import { buildLaneModel } from "./build-lane-model";
import { IF_ROWS } from "./internals/rows";
import { laneTableRows } from "./lane-table-rows";
import type { LanePlanInput, LaneResultInput } from "./types";

const plan1 = ex1 as unknown as LanePlanInput;
const plan2 = ex2 as unknown as LanePlanInput;

// Result numbers for example 1 are those of docs/plan-format.md §8 "Worked example 1",
// cut to what the lane view reads.
const result1: LaneResultInput = {
  chains: [
    {
      id: "A",
      linewidthMHz: 19.34,
      feasibleGHz: [
        [177.335, 182.995],
        [183.625, 189.285],
      ],
      excludedGHz: [{ bandGHz: [182.995, 183.625], codes: ["if-outside-detector", "image-response"] }],
      placeGHz: 180.16,
      placeReason: null,
    },
  ],
  channels: [
    {
      ...EX1_WV1_RESULT,
    },
  ],
  spurs: [
    { chain: "A", family: "lock-self", order: 1, bandGHz: [0.06, 0.06], source: "1·fm", hits: [] },
    { chain: "A", family: "harmonic", order: 2, bandGHz: [2.95, 3.05], source: "2·wv1", hits: [] },
  ],
  findings: [
    { code: "carrier-dominates-lo", severity: "warning", chain: "A", channel: null, message: "…" },
    { code: "in-protected-band", severity: "info", chain: "A", channel: "wv1", message: "…" },
  ],
};

const reference = {
  lines: [
    { label: "H2O 183.31", centreGHz: 183.310087, source: "ITU-R P.676" },
    { label: "H2O 22.24", centreGHz: 22.23508, source: "ITU-R P.676" },
  ],
  protectedBands: [{ minGHz: 182, maxGHz: 185, source: "RR No. 5.340" }],
};

describe("buildLaneModel, example 1 (upper sideband)", () => {
  const model = buildLaneModel(plan1, result1, reference);
  const byId = new Map(model.items.map((i) => [i.id, i]));

  it("draws the channel passband c ± B/2 and the wanted mode n·fsr ± δ/2", () => {
    // c = 183.31 GHz, B = 10 MHz (docs/plan-format.md §8.1 "The plan")
    const ch = byId.get("rf:channel:wv1:0");
    expect(ch?.lo).toBeCloseTo(183.305, 9);
    expect(ch?.hi).toBeCloseTo(183.315, 9);
    expect(ch?.severity).toBe("info");
    expect(ch?.codes).toEqual(["in-protected-band"]);
    // δ = 193.4 THz / 1e7 = 19.34 MHz (docs/plan-format.md §8.2 "Chain figures": linewidthMHz 19.34)
    const mode = model.items.find((i) => i.kind === "mode-passband" && i.codes.includes("wanted"));
    expect(mode?.lo).toBeCloseTo(183.31 - 0.00967, 9);
    expect(mode?.hi).toBeCloseTo(183.31 + 0.00967, 9);
  });

  it("puts the LO, reach, carrier and lock sidebands on the optical lane at their offsets", () => {
    expect(byId.get("optical:A:lo")?.lo).toBe(184.81);
    expect(byId.get("optical:A:carrier")?.lo).toBe(0);
    expect(byId.get("optical:A:reach:0")).toMatchObject({ lo: 150, hi: 200 });
    // fm = 60 MHz, orders = 2 → ±0.06 and ±0.12 GHz
    const lock = model.items.filter((i) => i.kind === "lock-sideband").map((i) => i.lo);
    expect(lock.sort((a, b) => a - b)).toEqual([-0.12, -0.06, 0.06, 0.12]);
    expect(model.items.filter((i) => i.kind === "feasible")).toHaveLength(2);
    expect(byId.get("optical:A:blocked:0")?.codes).toEqual(["if-outside-detector", "image-response"]);
  });

  it("marks the LO with the codes of the blocked interval it sits in", () => {
    const inside = buildLaneModel({ ...plan1, chains: [{ ...plan1.chains[0]!, loOffsetGHz: 183.3 }] }, result1);
    const lo = inside.items.find((i) => i.kind === "lo");
    expect(lo?.severity).toBe("error");
    expect(lo?.codes).toEqual(["if-outside-detector", "image-response"]);
    const ok = model.items.find((i) => i.kind === "lo");
    expect(ok?.severity).toBeNull();
  });

  it("draws the IF slot, drift and guard nested, and spurs on their family's row", () => {
    const slot = byId.get("if:A:slot:wv1");
    const occ = byId.get("if:A:occupied:wv1");
    const guard = byId.get("if:A:guard:wv1");
    expect([slot?.lo, slot?.hi]).toEqual([1.495, 1.505]);
    expect([occ?.lo, occ?.hi]).toEqual([1.475, 1.525]);
    // guard 50 MHz on each side of the occupied band
    expect(guard?.lo).toBeCloseTo(1.425, 12);
    expect(guard?.hi).toBeCloseTo(1.575, 12);
    const spurs = model.items.filter((i) => i.kind === "spur");
    expect(spurs.map((s) => [s.family, s.row])).toEqual([
      ["lock-self", IF_ROWS.spur0 + SPUR_FAMILIES.indexOf("lock-self")],
      ["harmonic", IF_ROWS.spur0 + SPUR_FAMILIES.indexOf("harmonic")],
    ]);
  });

  it("keeps reference lines near the plan and drops the far ones", () => {
    expect(model.items.some((i) => i.kind === "line-centre" && i.lo === 183.310087)).toBe(true);
    expect(model.items.some((i) => i.kind === "line-centre" && i.lo < 30)).toBe(false);
    expect(model.items.some((i) => i.kind === "protected-band")).toBe(true);
  });

  it("has three lanes: RF, optical offset and IF", () => {
    expect(model.lanes.map((l) => l.kind)).toEqual(["rf", "optical", "if"]);
  });
});

describe("buildLaneModel, example 2 (lower sideband)", () => {
  const result2: LaneResultInput = {
    chains: [
      {
        id: "O2",
        linewidthMHz: 970,
        feasibleGHz: [[-113.244, -112.756]],
        excludedGHz: [],
        placeGHz: -113,
        placeReason: null,
      },
    ],
    channels: [],
    spurs: [],
    findings: [],
  };
  const model = buildLaneModel(plan2, result2);
  it("mirrors the optical offsets of a lower-sideband chain so they line up with RF", () => {
    const lane = model.lanes.find((l) => l.id === "optical:O2");
    expect(lane?.mirror).toBe(-1);
    // L = −121 GHz is drawn at 121 GHz; the 118.75 GHz channel's optical band −118.95…−118.55 at 118.55…118.95
    expect(model.items.find((i) => i.kind === "lo")?.lo).toBe(121);
    const sb = model.items.find((i) => i.id === "optical:O2:sideband:o2-core:0");
    expect(sb?.lo).toBeCloseTo(118.55, 9);
    expect(sb?.hi).toBeCloseTo(118.95, 9);
    const f = model.items.find((i) => i.kind === "feasible");
    expect([f?.lo, f?.hi]).toEqual([112.756, 113.244]);
    // sample rate 8 GHz → Nyquist edges at 4 and 8 GHz (detector up to 7 GHz)
    expect(model.items.filter((i) => i.kind === "nyquist-edge").map((i) => i.lo)).toEqual([4, 8]);
  });
});

// Random plans: each channel SSB or DSB, random chains.
const planArb = fc
  .record({
    chains: fc.integer({ min: 1, max: 3 }),
    channels: fc.array(
      fc.record({
        c: fc.double({ min: 100, max: 350, noNaN: true }),
        bw: fc.double({ min: 1, max: 500, noNaN: true }),
        dsb: fc.option(fc.double({ min: 0.3, max: 10, noNaN: true })),
        chain: fc.nat(),
        slot: fc.option(fc.double({ min: 0.05, max: 5, noNaN: true })),
      }),
      { maxLength: 12 },
    ),
  })
  .map(({ chains, channels }) => {
    const ids = Array.from({ length: chains }, (_, i) => `c${i}`);
    const plan: LanePlanInput = {
      settings: { guardMHz: 20 },
      lasers: ids.map((id) => ({
        id: `L${id}`,
        carrierTHz: 193.4,
        reach: [{ minGHz: 100, maxGHz: 200 }],
        stepMHz: 10,
        driftMHz: 5,
        lock: { modulationMHz: 50, modulationIndex: 0.5, orders: 2 },
      })),
      resonators: ids.map((id) => ({ id: `R${id}`, fsrGHz: 150, loadedQ: 1e6 })),
      detectors: ids.map((id) => ({ id: `D${id}`, minGHz: 0.1, maxGHz: 6, sampleRateGHz: null })),
      chains: ids.map((id, i) => ({
        id,
        laser: `L${id}`,
        resonator: `R${id}`,
        detector: `D${id}`,
        mode: 1,
        sideband: i % 2 ? "lower" : "upper",
        loOffsetGHz: i % 2 ? -150 : 150,
        rfInput: { minGHz: 100, maxGHz: 200 },
      })),
      channels: channels.map((c, k) => ({
        id: `ch${k}`,
        name: `ch ${k}`,
        chain: ids[c.chain % chains]!,
        centerGHz: c.c,
        bandwidthMHz: c.bw,
        dsbOffsetGHz: c.dsb === null ? null : c.dsb + c.bw / 1000,
      })),
    };
    const result: LaneResultInput = {
      chains: ids.map((id) => ({
        id,
        linewidthMHz: 193.4,
        feasibleGHz: [],
        excludedGHz: [],
        placeGHz: null,
        placeReason: "no-feasible-interval",
      })),
      channels: channels.map((c, k) => ({
        id: `ch${k}`,
        ifSlotGHz: c.slot === null ? null : [c.slot, c.slot + c.bw / 1000],
        occupiedGHz: c.slot === null ? null : [c.slot - 0.005, c.slot + c.bw / 1000 + 0.005],
        imageGHz: null,
        imageRejectionDB: null,
        nedtK: null,
        lockReplicaDB: -30,
      })),
      spurs: [],
      findings: [],
    };
    return { plan, result };
  });

describe("buildLaneModel, properties", () => {
  it("draws one RF item per passband (DSB pairs linked) and one slot per channel with a slot", () => {
    fc.assert(
      fc.property(planArb, ({ plan, result }) => {
        const model = buildLaneModel(plan, result);
        for (const ch of plan.channels) {
          const bands = model.items.filter((i) => i.kind === "channel-band" && i.channel === ch.id);
          expect(bands).toHaveLength(ch.dsbOffsetGHz == null ? 1 : 2);
          if (ch.dsbOffsetGHz != null) {
            expect(bands[0]?.link).toBe(bands[1]?.link);
            expect(bands[0]?.link).not.toBeNull();
            // the pair is symmetric about the centre
            expect((bands[0]!.lo + bands[1]!.hi) / 2).toBeCloseTo(ch.centerGHz, 9);
          }
          const r = result.channels.find((c) => c.id === ch.id);
          expect(model.items.filter((i) => i.kind === "if-slot" && i.channel === ch.id)).toHaveLength(
            r?.ifSlotGHz ? 1 : 0,
          );
        }
        const ids = model.items.map((i) => i.id);
        expect(new Set(ids).size).toBe(ids.length);
        for (const it of model.items) expect(it.lo).toBeLessThanOrEqual(it.hi);
      }),
    );
  });

  it("gives the table view exactly the chart's items, in the same order, with the same numbers", () => {
    fc.assert(
      fc.property(planArb, ({ plan, result }) => {
        const model = buildLaneModel(plan, result);
        const rows = laneTableRows(model);
        expect(rows.map((r) => [r.id, r.lane, r.kind, r.fromGHz, r.toGHz])).toEqual(
          model.items.map((i) => [i.id, i.lane, i.kind, i.lo, i.hi]),
        );
        expect(rows.map((r) => r.codes)).toEqual(model.items.map((i) => i.codes.join(" ")));
      }),
    );
  });
});
