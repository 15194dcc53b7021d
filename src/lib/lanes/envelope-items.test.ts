import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import { arbitraryPlan, example1, example2 } from "../../../tests/fixtures/plans/builders";
import { buildLaneModel } from "./build-lane-model";
import { laneModelByChain } from "./lane-model-by-chain";

describe("the operating envelope on the RF lane", () => {
  it("example 1 (±20 MHz drift, slot filter): the 183.305–183.315 GHz channel is also drawn 20 MHz either side", () => {
    const plan = example1();
    const model = buildLaneModel(plan, checkPlan(plan));
    const bands = model.items.filter((i) => i.kind === "envelope-band");
    expect(bands.map((b) => [b.id, +b.lo.toFixed(9), +b.hi.toFixed(9), b.row])).toEqual([
      ["rf:envelope:wv1:0:lo", 183.285, 183.295, 3],
      ["rf:envelope:wv1:0:hi", 183.325, 183.335, 3],
    ]);
    // no temperature excursion in a version 1 document: no mode drift
    expect(model.items.some((i) => i.kind === "mode-drift")).toBe(false);
    // drawn beneath the nominal items
    const first = model.items.findIndex((i) => i.kind === "channel-band");
    expect(model.items.findIndex((i) => i.kind === "envelope-band")).toBeLessThan(first);
  });

  it("with the occupied-band filter LO drift does not move the RF band, so no envelope band is drawn", () => {
    const plan = example1((p) => {
      p.format = "heterolane.plan/2";
      p.channels[0]!.ifFilter = "occupied";
    });
    expect(buildLaneModel(plan, checkPlan(plan)).items.some((i) => i.kind === "envelope-band")).toBe(false);
  });

  it("the wanted mode over ±Te: example 1 with −6.28 MHz/K and ±2 K spans the mode ± 12.56 MHz ± δ/2", () => {
    // −6.28 MHz/K at 183.31 GHz: the figure issue 11 gives for a lithium-niobate disk following one mode pair.
    const plan = example1((p) => {
      p.format = "heterolane.plan/2";
      p.resonators[0]!.fsrShiftMHzPerK = -6.28;
      p.chains[0]!.temperatureExcursionK = 2;
    });
    const drift = buildLaneModel(plan, checkPlan(plan)).items.find((i) => i.kind === "mode-drift")!;
    const delta = (193.4 * 1000) / 1e7; // δ = ν/Q = 19.34 MHz, in GHz
    expect(drift.lo).toBeCloseTo(183.31 - 0.01256 - delta / 2, 9);
    expect(drift.hi).toBeCloseTo(183.31 + 0.01256 + delta / 2, 9);
  });

  it("over generated plans: two bands per passband, each B wide at ±D from it, and the same items chain by chain", () => {
    fc.assert(
      fc.property(arbitraryPlan(), (plan) => {
        const result = checkPlan(plan);
        const model = buildLaneModel(plan, result);
        const bands = model.items.filter((i) => i.kind === "envelope-band");
        let expected = 0;
        for (const ch of plan.channels) {
          const chain = plan.chains.find((c) => c.id === ch.chain)!;
          const D = plan.lasers.find((l) => l.id === chain.laser)!.driftMHz / 1000;
          const own = bands.filter((b) => b.channel === ch.id);
          if (D <= 0 || ch.ifFilter !== "slot") {
            expect(own).toHaveLength(0);
            continue;
          }
          const centres =
            ch.dsbOffsetGHz == null ? [ch.centerGHz] : [ch.centerGHz - ch.dsbOffsetGHz, ch.centerGHz + ch.dsbOffsetGHz];
          expected += 2 * centres.length;
          const want = centres.flatMap((c) => [c - D, c + D]).sort((a, b) => a - b);
          const got = own.map((b) => (b.lo + b.hi) / 2).sort((a, b) => a - b);
          got.forEach((g, i) => expect(g).toBeCloseTo(want[i]!, 6));
          for (const b of own) expect(b.hi - b.lo).toBeCloseTo(ch.bandwidthMHz / 1000, 6);
        }
        expect(bands).toHaveLength(expected);
        const byChain = laneModelByChain(plan, result, { lines: [], protectedBands: [] }).model;
        expect(
          new Set(byChain.items.filter((i) => i.kind === "envelope-band" || i.kind === "mode-drift").map((i) => i.id)),
        ).toEqual(
          new Set(model.items.filter((i) => i.kind === "envelope-band" || i.kind === "mode-drift").map((i) => i.id)),
        );
      }),
      { numRuns: 40 },
    );
  });

  it("example 2 (lower sideband): the ends are the same pair of bands as for an upper-sideband chain", () => {
    const plan = example2();
    const model = buildLaneModel(plan, checkPlan(plan));
    const D = plan.lasers[0]!.driftMHz / 1000;
    for (const ch of plan.channels) {
      const own = model.items.filter(
        (i) => i.kind === "envelope-band" && i.channel === ch.id && i.id.endsWith(":0:lo"),
      );
      if (D > 0) expect(own[0]!.lo).toBeCloseTo(ch.centerGHz - (ch.dsbOffsetGHz ?? 0) - ch.bandwidthMHz / 2000 - D, 9);
    }
  });
});
