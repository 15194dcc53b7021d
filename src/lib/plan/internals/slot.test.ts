import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { PlanChannel } from "@/schemas/plan";
import { example1 } from "../../../../tests/fixtures/plans/builders";
import { type ChainContext, chainContext, channelContext } from "./chain-context";
import { combResponse } from "./comb";
import { lorentzian } from "./lorentz";
import { integratePiecewise } from "./numeric-reference.test-util";
import { imageAt, sensitivityAt, slotAt } from "./slot";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

function channel(over: Partial<PlanChannel>): PlanChannel {
  return {
    id: "t",
    name: "test",
    chain: "A",
    centerGHz: 183.31,
    bandwidthMHz: 10,
    dsbOffsetGHz: null,
    integrationMs: 10,
    antennaK: 250,
    receiverK: 5000,
    gainStability: 0,
    requiredNedtK: null,
    ifFilter: "slot",
    centreToleranceMHz: null,
    receiverKSource: "entered",
    ...over,
  };
}

/** Example 1's chain (δ = 19.34 MHz at 183.31 GHz), optionally with another loaded Q / sideband. */
function ctxWith(loadedQ = 1e7, sideband: "upper" | "lower" = "upper"): ChainContext {
  return chainContext(
    example1((p) => {
      p.resonators[0]!.loadedQ = loadedQ;
      p.chains[0]!.sideband = sideband;
    }),
    "A",
  );
}

/** W(y) built pointwise from the definition: sum over bands of M_{n*}(x) where x ∈ Xⱼ beats to y. */
function responseAt(ctx: ChainContext, optical: readonly (readonly [number, number])[], L: number, y: number): number {
  let w = 0;
  for (const x of optical) {
    for (const cand of [L + y, L - y])
      if (cand >= x[0] && cand <= x[1]) w += lorentzian(cand, ctx.modeCentre, ctx.delta);
  }
  return w;
}

describe("IF slot and image geometry", () => {
  it("the IF slot maps back to the optical band (property)", () => {
    const ctx = ctxWith();
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 300, noNaN: true }),
        fc.double({ min: 1, max: 3000, noNaN: true }),
        fc.double({ min: -20, max: 20, noNaN: true }),
        fc.boolean(),
        (c, bw, dL, lower) => {
          const ctxS = lower ? ctxWith(1e7, "lower") : ctx;
          const ch = channelContext(ctxS, channel({ centerGHz: c, bandwidthMHz: bw }), 0);
          const x = ch.optical[0]!;
          const L = (x[0] + x[1]) / 2 + dL;
          fc.pre(L <= x[0] || L >= x[1]);
          const geo = slotAt(ch, L, ctxS.D)!;
          const e = geo.images[0]!.e;
          const back = [L + e * geo.slot[0], L + e * geo.slot[1]].sort((p, q) => p - q);
          expect(Math.abs(back[0]! - x[0])).toBeLessThan(1e-9);
          expect(Math.abs(back[1]! - x[1])).toBeLessThan(1e-9);
          // and the optical band is s times the passband
          expect(Math.abs(Math.abs(x[0]) + Math.abs(x[1]) - 2 * c)).toBeLessThan(1e-9);
        },
      ),
    );
  });

  it("the image of the image is the signal (property)", () => {
    const ctx = ctxWith();
    fc.assert(
      fc.property(
        fc.double({ min: 150, max: 250, noNaN: true }),
        fc.double({ min: 1, max: 500, noNaN: true }),
        fc.double({ min: 0.5, max: 10, noNaN: true }),
        fc.boolean(),
        (c, bw, ifGHz, high) => {
          const ch = channelContext(ctx, channel({ centerGHz: c, bandwidthMHz: bw }), 0);
          const L = c + (high ? 1 : -1) * (ifGHz + bw / 2000);
          const img = imageAt(ctx, ch, L)!;
          // a channel whose passband is the image band, seen with the same LO, has the original band as its image
          const ic = (img.imageGHz[0] + img.imageGHz[1]) / 2;
          const chImg = channelContext(ctx, channel({ centerGHz: ic, bandwidthMHz: bw }), 0);
          const back = imageAt(ctx, chImg, L)!;
          expect(Math.abs(back.imageGHz[0] - (c - bw / 2000))).toBeLessThan(1e-9);
          expect(Math.abs(back.imageGHz[1] - (c + bw / 2000))).toBeLessThan(1e-9);
        },
      ),
    );
  });

  it("the LO strictly inside a band leaves no slot; on an edge it does", () => {
    const ctx = ctxWith();
    const ch = channelContext(ctx, channel({}), 0);
    expect(slotAt(ch, 183.31, ctx.D)).toBeNull();
    const edge = slotAt(ch, 183.315, ctx.D)!;
    expect(edge.slot[0]).toBe(0);
    expect(edge.slot[1]).toBeCloseTo(0.01, 12);
  });

  it("a DSB channel with a centred LO has the slot [d − B/2, d + B/2] (docs/plan-format.md §3.2 'Per channel')", () => {
    const ctx = ctxWith(1e5);
    const ch = channelContext(ctx, channel({ centerGHz: 183.311, bandwidthMHz: 1000, dsbOffsetGHz: 3 }), 0);
    const geo = slotAt(ch, 183.311, ctx.D)!;
    expect(geo.slot[0]).toBeCloseTo(2.5, 12);
    expect(geo.slot[1]).toBeCloseTo(3.5, 12);
    // an off-centre LO widens it
    const off = slotAt(ch, 183.411, ctx.D)!;
    expect(off.slot[1] - off.slot[0]).toBeCloseTo(1.2, 12);
  });
});

describe("sensitivity integrals", () => {
  it("closed forms agree with adaptive Simpson of S(y) built pointwise, SSB and DSB with an off-centre LO (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e4, max: 1e8, noNaN: true }),
        fc.double({ min: 180, max: 186, noNaN: true }),
        fc.double({ min: 0.5, max: 800, noNaN: true }),
        fc.option(fc.double({ min: 0.5, max: 5, noNaN: true }), { nil: null }),
        fc.double({ min: -0.3, max: 0.3, noNaN: true }),
        fc.double({ min: 0, max: 500, noNaN: true }),
        fc.double({ min: 0, max: 5000, noNaN: true }),
        (Q, c, bw, d, dL, Ta, Tr) => {
          fc.pre(Ta + Tr > 0);
          const ctx = ctxWith(Q);
          const ch = channelContext(
            ctx,
            channel({
              centerGHz: c,
              bandwidthMHz: bw,
              dsbOffsetGHz: d === null ? null : d + bw / 2000,
              antennaK: Ta,
              receiverK: Tr,
            }),
            0,
          );
          const L = d === null ? c + 1.5 + bw / 2000 + dL : c + dL;
          const geo = slotAt(ch, L, ctx.D);
          fc.pre(geo !== null);
          const sens = sensitivityAt(ctx, ch, geo!, L);
          const W = (y: number) => responseAt(ctx, ch.optical, L, y);
          const inUnion = (y: number) => geo!.images.some((b) => y >= b.image[0] && y <= b.image[1]);
          const S = (y: number) => (inUnion(y) ? Ta * W(y) + Tr : 0);
          const cuts = geo!.images.flatMap((b) => [b.image[0], b.image[1]]);
          cuts.push(Math.abs(ctx.modeCentre - L));
          const [a, b] = geo!.slot;
          const intW = integratePiecewise(W, a, b, cuts, 1e-11);
          const intS = integratePiecewise(S, a, b, cuts, 1e-11) * 1e9;
          const intS2 = integratePiecewise((y) => S(y) ** 2, a, b, cuts, 1e-11) * 1e9;
          expect(rel(sens.intW, intW)).toBeLessThan(1e-6);
          expect(rel(sens.intS, intS)).toBeLessThan(1e-6);
          expect(rel(sens.intS2, intS2)).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 150 },
    );
  });

  it("the image integral agrees with adaptive Simpson of A(|x'|)·C(x') (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e4, max: 1e8, noNaN: true }),
        fc.double({ min: 170, max: 196, noNaN: true }),
        fc.double({ min: 1, max: 3000, noNaN: true }),
        fc.double({ min: 0.2, max: 10, noNaN: true }),
        (Q, c, bw, ifGHz) => {
          const ctx = ctxWith(Q);
          const ch = channelContext(ctx, channel({ centerGHz: c, bandwidthMHz: bw }), 0);
          const L = c + ifGHz + bw / 2000;
          const img = imageAt(ctx, ch, L)!;
          const [lo, hi] = img.opticalImage;
          const A = (x: number) => (Math.abs(x) >= ctx.rfInput[0] && Math.abs(x) <= ctx.rfInput[1] ? 1 : 0);
          const cuts = [ctx.rfInput[0], ctx.rfInput[1], -ctx.rfInput[0], -ctx.rfInput[1]];
          for (let n = Math.ceil(lo / ctx.fsr); n * ctx.fsr < hi; n++) cuts.push(n * ctx.fsr);
          const ref = integratePiecewise((x) => A(x) * combResponse(x, ctx.comb), lo, hi, cuts, 1e-11);
          if (ref === 0) expect(img.intWi).toBe(0);
          else expect(rel(img.intWi, ref)).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 150 },
    );
  });

  it("radiometric bandwidth → B for a channel much narrower than the mode, and → π·δ with no receiver noise for one much wider (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e5, max: 1e8, noNaN: true }),
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        (Q, Tr) => {
          const ctx = ctxWith(Q);
          const narrow = channelContext(ctx, channel({ bandwidthMHz: (ctx.delta * 1000) / 1e4, receiverK: Tr }), 0);
          const Ln = 183.31 + 1;
          const sn = sensitivityAt(ctx, narrow, slotAt(narrow, Ln, ctx.D)!, Ln);
          expect(rel(sn.radiometricBandwidthMHz!, narrow.B * 1000)).toBeLessThan(1e-6);
          const wideB = ctx.delta * 1e5;
          const wide = channelContext(ctx, channel({ bandwidthMHz: wideB * 1000, receiverK: 0 }), 0);
          const Lw = 183.31 + wideB;
          const sw = sensitivityAt(ctx, wide, slotAt(wide, Lw, ctx.D)!, Lw);
          expect(rel(sw.radiometricBandwidthMHz!, Math.PI * ctx.delta * 1000)).toBeLessThan(1e-4);
        },
      ),
    );
  });

  it("NEΔT falls as the integration time grows (property)", () => {
    const ctx = ctxWith();
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1e4, noNaN: true }),
        fc.double({ min: 1.01, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 1e-3, noNaN: true }),
        (ms, k, g) => {
          const a = channelContext(ctx, channel({ integrationMs: ms, gainStability: g }), 0);
          const b = channelContext(ctx, channel({ integrationMs: ms * k, gainStability: g }), 0);
          const L = 184.81;
          const na = sensitivityAt(ctx, a, slotAt(a, L, ctx.D)!, L).nedtK;
          const nb = sensitivityAt(ctx, b, slotAt(b, L, ctx.D)!, L).nedtK;
          expect(nb).toBeLessThan(na);
        },
      ),
    );
  });

  it("NEΔT falls with bandwidth while the channel is much narrower than the mode, and rises again once much wider when receiver noise dominates (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e5, max: 1e8, noNaN: true }),
        fc.double({ min: 1.5, max: 4, noNaN: true }),
        (Q, k) => {
          const ctx = ctxWith(Q);
          const dMHz = ctx.delta * 1000;
          const nedt = (bwMHz: number) => {
            const ch = channelContext(ctx, channel({ bandwidthMHz: bwMHz, antennaK: 100, receiverK: 5000 }), 0);
            const L = 183.31 + bwMHz / 1000;
            return sensitivityAt(ctx, ch, slotAt(ch, L, ctx.D)!, L).nedtK;
          };
          expect(nedt((dMHz / 1000) * k)).toBeLessThan(nedt(dMHz / 1000));
          expect(nedt(dMHz * 1000 * k)).toBeGreaterThan(nedt(dMHz * 1000));
        },
      ),
    );
  });

  it("with W ≡ 1 the figure is the textbook (T_A + T_R)·sqrt(1/(Bτ) + (ΔG/G)²) (Ulaby & Long, radiometer chapter)", () => {
    // a channel 1e-6 of the mode width sees W = 1 to ~1e-12
    const ctx = ctxWith(1e4);
    const ch = channelContext(
      ctx,
      channel({
        bandwidthMHz: ctx.delta * 1e-3,
        antennaK: 300,
        receiverK: 700,
        integrationMs: 1000,
        gainStability: 1e-3,
      }),
      0,
    );
    const L = 184;
    const s = sensitivityAt(ctx, ch, slotAt(ch, L, ctx.D)!, L);
    const B = ch.B * 1e9;
    expect(rel(s.nedtK, 1000 * Math.sqrt(1 / B + 1e-6))).toBeLessThan(1e-6);
  });
});
