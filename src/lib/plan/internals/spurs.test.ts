import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { example1, example2 } from "../../../../tests/fixtures/plans/builders";
import { chainContext } from "./chain-context";
import { evaluateChain } from "./evaluate-chain";
import { errorSpursAt, infoSpurs } from "./spurs";
import { slotAt } from "./slot";

describe("spur families (docs/plan-format.md §5 'Spur families')", () => {
  it("carrier-beat |L| and lock-lo |L ± m·fm| are widened by D and dropped outside the detector band", () => {
    // example 1 with a wide detector so the carrier beat near 184.81 GHz is kept
    const ctx = chainContext(
      example1((p) => (p.detectors[0]!.maxGHz = 400)),
      "A",
    );
    const bands = errorSpursAt(ctx, 184.81);
    const carrier = bands.filter((b) => b.family === "carrier-beat");
    expect(carrier).toHaveLength(1);
    expect(carrier[0]!.band[0]).toBeCloseTo(184.79, 12);
    expect(carrier[0]!.band[1]).toBeCloseTo(184.83, 12);
    const lockLo = bands.filter((b) => b.family === "lock-lo").map((b) => [b.source, b.order, b.band[0]]);
    expect(lockLo).toEqual([
      ["L−2·fm", 3, expect.closeTo(184.81 - 0.12 - 0.02, 12)],
      ["L−1·fm", 2, expect.closeTo(184.81 - 0.06 - 0.02, 12)],
      ["L+1·fm", 2, expect.closeTo(184.81 + 0.06 - 0.02, 12)],
      ["L+2·fm", 3, expect.closeTo(184.81 + 0.12 - 0.02, 12)],
    ]);
    // with the 6 GHz detector of the example they are all dropped; lock-self stays (m = 1..2M)
    const ctx6 = chainContext(example1(), "A");
    expect(errorSpursAt(ctx6, 184.81).map((b) => b.source)).toEqual(["1·fm", "2·fm", "3·fm", "4·fm"]);
  });

  it("an LO near 0 folds the carrier beat to [0, |L| + D] (absolute value of a straddling interval)", () => {
    const dc = chainContext(
      example1((p) => (p.detectors[0]!.minGHz = 0)),
      "A",
    );
    const carrier = errorSpursAt(dc, 0.01).find((b) => b.family === "carrier-beat")!;
    expect(carrier.band[0]).toBe(0);
    expect(carrier.band[1]).toBeCloseTo(0.03, 12);
    // with the 0.05 GHz lower detector edge of example 1 the same band is dropped
    const ac = chainContext(example1(), "A");
    expect(errorSpursAt(ac, 0.01).find((b) => b.family === "carrier-beat")).toBeUndefined();
  });

  it("harmonics n·slot widened by n·D and intermod a·slotᵢ ± b·slotⱼ widened by (a+b)·D, a + b ≤ spurMaxOrder", () => {
    const plan = example1((p) => {
      p.detectors[0]!.maxGHz = 40;
      p.channels.push({ ...p.channels[0]!, id: "wv2", centerGHz: 183.0 });
    });
    const ctx = chainContext(plan, "A");
    const L = 184.81;
    const slots = ctx.channels.map((ch) => slotAt(ch, L, ctx.D));
    const bands = infoSpurs(ctx, slots);
    const h = bands.filter((b) => b.family === "harmonic");
    expect(h).toHaveLength(2 * 4); // n = 2..5 for each channel
    const h3 = h.find((b) => b.source === "3·wv1")!;
    expect(h3.band[0]).toBeCloseTo(3 * 1.495 - 3 * 0.02, 9);
    expect(h3.band[1]).toBeCloseTo(3 * 1.505 + 3 * 0.02, 9);
    const im = bands.filter((b) => b.family === "intermod");
    // pairs (1 pair) × (a, b) with a + b ≤ 5 (10 combinations) × (+, −), minus those dropped by the detector band
    expect(im.length).toBeLessThanOrEqual(20);
    const diff = im.find((b) => b.source === "2·wv1−1·wv2")!;
    // 2·[1.495, 1.505] − [1.805, 1.815] = [1.175, 1.205], widened by 3·0.02
    expect(diff.band[0]).toBeCloseTo(1.175 - 0.06, 9);
    expect(diff.band[1]).toBeCloseTo(1.205 + 0.06, 9);
    expect(diff.order).toBe(3);
    // sorted by band within each family
    for (const fam of [h, im])
      for (let i = 1; i < fam.length; i++) expect(fam[i]!.band[0]).toBeGreaterThanOrEqual(fam[i - 1]!.band[0]);
  });

  it("a spur that only comes within guard after Nyquist folding still hits and makes an error (example 2 with fs = 0.1 GHz: 2·fm = 0.09 GHz mirrors to 0.01 GHz)", () => {
    const plan = example2((p) => {
      p.detectors[0]!.sampleRateGHz = 0.1;
      p.detectors[0]!.minGHz = 0;
      p.channels = [{ ...p.channels[0]!, centerGHz: 118.75, bandwidthMHz: 2 }];
    });
    const ctx = chainContext(plan, "O2");
    // optical band [−118.751, −118.749]; L = −118.951 puts the slot at [0.198, 0.202], occupied [0.192, 0.208],
    // which folds (h = 0.05 GHz) onto [0, 0.008]; the lock-self tone 2·fm folds to 0.01 GHz, 2 MHz away
    const ev = evaluateChain(ctx, -118.951);
    const folded = ev.findings.filter((f) => f.code === "spur-in-slot" && f.data.folded === true);
    expect(folded.length).toBeGreaterThan(0);
    for (const f of folded) expect(f.message).toContain("after folding");
    // every folded hit is listed in that spur's hits
    for (const f of folded) expect(ev.spurs.find((s) => s.source === f.data.source)!.hits).toContain("o2-core");
  });

  it("hits are exactly the channels within guard of the kept band, directly or folded (property, example 2 geometry)", () => {
    const plan = example2();
    const ctx = chainContext(plan, "O2");
    fc.assert(
      fc.property(fc.double({ min: -130, max: -100, noNaN: true }), (L) => {
        const ev = evaluateChain(ctx, L);
        const guard = ctx.guard;
        for (const s of ev.spurs) {
          for (const c of ev.channels) {
            if (!c.geo) {
              expect(s.hits).not.toContain(c.ch.channel.id);
              continue;
            }
            const o = c.geo.occupied;
            const direct = Math.max(s.bandGHz[0], o[0]) - Math.min(s.bandGHz[1], o[1]) < guard - 1e-9;
            if (direct) expect(s.hits).toContain(c.ch.channel.id);
          }
        }
      }),
      { numRuns: 100 },
    );
  });
});
