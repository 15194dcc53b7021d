import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Plan, PlanInput } from "@/schemas/plan";
import { example1, mustParse, fixtureInput } from "../../../../tests/fixtures/plans/builders";
import { chainContext } from "./chain-context";
import { channelEnvelope } from "./channel-envelope";
import { envelopeBox } from "./envelope-box";
import { figuresAt, worstByGrid } from "./envelope-reference.test-util";
import { adaptiveSimpson } from "./numeric-reference.test-util";
import { centroidOffset } from "./received-band";
import { imageAt, sensitivityAt, slotAt } from "./slot";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** Example 1 (δ = 19.34 MHz, a 10 MHz channel centred on the 183.31 GHz mode), edited, as a version 2 document. */
function ex1v2(edit: (p: PlanInput) => void = () => {}): Plan {
  const input = fixtureInput("ex1-single-channel");
  input.format = "heterolane.plan/2";
  edit(input);
  return mustParse(input);
}

function envelopeOf(plan: Plan, chainId = "A", channelIndex = 0, L?: number) {
  const ctx = chainContext(plan, chainId);
  const ch = ctx.channels[channelIndex]!;
  const lo = L ?? ctx.chain.loOffsetGHz;
  const geo = slotAt(ch, lo, ctx.D);
  return { ctx, ch, lo, env: channelEnvelope(ctx, ch, geo, lo, ctx.box) };
}

describe("known answers in closed form", () => {
  // ∫ dx/(1 + x²) = atan x (Abramowitz & Stegun 4.4.3 / any table of integrals): a band of width δ whose
  // edge sits on the mode centre receives (δ/2)·atan 2 of the mode, one centred on it (δ/2)·(π/2).
  const delta = 0.01934; // GHz, example 1
  const boxPlan = () =>
    ex1v2((p) => {
      p.channels[0]!.bandwidthMHz = 19.34; // B = δ
      p.lasers[0]!.driftMHz = 9.67; // D = δ/2: at u = ±D the band's edge is on the mode centre
      p.channels[0]!.antennaK = 0; // S = T_R, flat: NEΔT = T_R·sqrt(B/τ)/∫W
      p.channels[0]!.requiredNedtK = null;
    });

  it("NEΔT of a receiver-noise-limited channel at the envelope's end: T_R·sqrt(B/τ)/((δ/2)·atan 2)", () => {
    const { env } = envelopeOf(boxPlan());
    const B = 0.01934e9; // Hz
    const tau = 0.01; // s
    const worst = (5000 * Math.sqrt(B / tau)) / ((delta / 2) * Math.atan(2) * 1e9);
    expect(worst).toBeCloseTo(20.538, 3); // worked by hand: 5000·43977/(9.67e6·1.10715) = 20.538 K
    expect(rel(env.nedt!.value, worst)).toBeLessThan(1e-9);
    expect(Math.abs(env.nedt!.u)).toBeCloseTo(0.00967, 12);
    // the nominal point (band centred on the mode): (δ/2)·(atan 1 − atan(−1)) = (δ/2)·π/2
    const { ctx, ch, lo } = envelopeOf(boxPlan());
    const nominal = channelEnvelope(ctx, ch, slotAt(ch, lo, ctx.D), lo, envelopeBox(0, 0, 0, 0, 1));
    expect(rel(nominal.nedt!.value, (5000 * Math.sqrt(B / tau)) / ((delta / 2) * (Math.PI / 2) * 1e9))).toBeLessThan(
      1e-9,
    );
  });

  it("mode response at the envelope's end: 1/(1 + (2D/δ)²) (the Lorentzian line shape, Saleh & Teich)", () => {
    const { env } = envelopeOf(boxPlan());
    expect(env.mode.response).toBeCloseTo(0.5, 12); // D = δ/2: exactly the half-power point
    expect(env.mode.detuning).toBeCloseTo(0.00967, 12);
    const { env: e1 } = envelopeOf(example1());
    // example 1: D = 20 MHz on δ = 19.34 MHz: 1/(1 + (40/19.34)²) = 0.18948 (issue 11 gives 0.1895)
    expect(e1.mode.response).toBeCloseTo(1 / (1 + (40 / 19.34) ** 2), 12);
    expect(e1.mode.response).toBeCloseTo(0.1895, 4);
  });

  it("the centroid in closed form equals the numerically integrated centroid (adaptive Simpson)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.001, max: 5, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: 0.01, max: 4, noNaN: true }),
        (d, epsOverDelta, widthOverDelta) => {
          const eps = epsOverDelta * d;
          const width = widthOverDelta * d;
          const M = (x: number) => 1 / (1 + ((2 * x) / d) ** 2);
          const a = eps - width / 2;
          const b = eps + width / 2;
          const m0 = adaptiveSimpson(M, a, b, 1e-13);
          const m1 = adaptiveSimpson((x) => x * M(x), a, b, 1e-13);
          const want = m1 / m0 - eps;
          expect(Math.abs(centroidOffset(eps, width, d) - want)).toBeLessThanOrEqual(1e-9 * Math.max(d, Math.abs(eps)));
        },
      ),
      { numRuns: 300 },
    );
  });

  it("a band centred on the mode has its centroid at its centre; an off-centre band is pulled toward the mode", () => {
    expect(centroidOffset(0, 0.01, 0.01934)).toBe(0);
    expect(centroidOffset(0.005, 0.01, 0.01934)).toBeLessThan(0);
    expect(centroidOffset(-0.005, 0.01, 0.01934)).toBeGreaterThan(0);
  });
});

describe("the envelope against an independent brute-force implementation (dense grid, adaptive Simpson)", () => {
  const cases: [string, Plan, number][] = [
    ["example 1 as written (±20 MHz drift)", example1(), 184.81],
    [
      "example 1 with ±1 K of a −6.28 MHz/K resonator",
      ex1v2((p) => {
        p.resonators[0]!.fsrShiftMHzPerK = -6.28;
        p.chains[0]!.temperatureExcursionK = 1;
      }),
      184.81,
    ],
    [
      "example 1, 5 MHz off the mode, occupied-band filter, ±2 K",
      ex1v2((p) => {
        p.resonators[0]!.fsrShiftMHzPerK = -6.28;
        p.chains[0]!.temperatureExcursionK = 2;
        p.channels[0]!.centerGHz = 183.315;
        p.channels[0]!.ifFilter = "occupied";
      }),
      184.81,
    ],
    [
      "example 1 with the LO 0.2 GHz above the band (the image near the mode)",
      ex1v2((p) => {
        p.resonators[0]!.fsrShiftMHzPerK = 3;
        p.chains[0]!.temperatureExcursionK = 1.5;
      }),
      183.5,
    ],
  ];
  it.each(cases)(
    "%s",
    (_name, plan, L) => {
      const { env, ctx } = envelopeOf(plan, "A", 0, L);
      const ref = worstByGrid(plan, "wv1", L, -ctx.Te, ctx.Te, 161, 17);
      // the engine's extremum is an extremum over the continuous box: at least as bad as every grid point,
      // and within 1e-6 of the refined grid's
      expect(env.nedt!.value).toBeGreaterThanOrEqual(ref.nedtK * (1 - 1e-9));
      expect(rel(env.nedt!.value, ref.nedtK)).toBeLessThan(1e-6);
      expect(env.bandwidth!.value).toBeLessThanOrEqual(ref.bandwidthMHz! * (1 + 1e-9));
      expect(rel(env.bandwidth!.value, ref.bandwidthMHz!)).toBeLessThan(1e-6);
      expect(env.image!.rejectionDB).toBeLessThanOrEqual(ref.imageDB! + 1e-7);
      expect(rel(env.image!.rejectionDB, ref.imageDB!)).toBeLessThan(1e-6);
      expect(env.mode.response).toBeLessThanOrEqual(ref.modeResponse * (1 + 1e-9));
      expect(rel(env.mode.response, ref.modeResponse)).toBeLessThan(1e-6);
      expect(env.centre!.error * 1000).toBeGreaterThanOrEqual(ref.centreErrorMHz * (1 - 1e-7));
      expect(rel(env.centre!.error * 1000, ref.centreErrorMHz)).toBeLessThan(1e-6);
      // and every figure the engine names at its worst point is the reference's figure there
      const at = figuresAt(plan, "wv1", L, env.nedt!.u, env.nedt!.t);
      expect(rel(env.nedt!.value, at.nedtK)).toBeLessThan(1e-8);
      const atImage = figuresAt(plan, "wv1", L, env.image!.u, env.image!.t);
      expect(Math.abs(env.image!.rejectionDB - atImage.imageDB!)).toBeLessThan(1e-7);
    },
    60_000,
  );

  it("example 2's DSB and SSB channels (sampled IF, lower sideband) with a temperature excursion", () => {
    const plan = mustParse({
      ...fixtureInput("ex2-lower-sideband-sampled"),
      format: "heterolane.plan/2",
    });
    const input = fixtureInput("ex2-lower-sideband-sampled");
    input.format = "heterolane.plan/2";
    input.resonators[0]!.fsrShiftMHzPerK = -4;
    input.chains[0]!.temperatureExcursionK = 2;
    const warm = mustParse(input);
    for (const p of [plan, warm]) {
      const ctx = chainContext(p, p.chains[0]!.id);
      ctx.channels.forEach((ch, i) => {
        const { env } = envelopeOf(p, ctx.chain.id, i);
        const ref = worstByGrid(p, ch.channel.id, ctx.chain.loOffsetGHz, -ctx.Te, ctx.Te, 61, 9);
        if (env.nedt) expect(rel(env.nedt.value, ref.nedtK)).toBeLessThan(1e-6);
        expect(rel(env.mode.response, ref.modeResponse)).toBeLessThan(1e-6);
        expect(rel(env.centre!.error * 1000, ref.centreErrorMHz)).toBeLessThan(1e-6);
        if (env.image) expect(rel(env.image.rejectionDB, ref.imageDB!)).toBeLessThan(1e-6);
      });
    }
  }, 120_000);
});

describe("properties of the envelope", () => {
  // plausible magnitudes (0, or at least a kilohertz / a millikelvin), so that the comparisons are not of rounding
  const dbl = (min: number, max: number) => fc.oneof(fc.constant(0), fc.double({ min, max, noNaN: true }));
  const arb = fc.record({
    driftMHz: dbl(0.001, 40),
    te: dbl(0.001, 3),
    phi: fc.oneof(
      dbl(0.01, 20),
      dbl(0.01, 20).map((v) => -v),
    ),
    offsetMHz: fc.double({ min: -15, max: 15, noNaN: true }),
    bwMHz: fc.double({ min: 1, max: 60, noNaN: true }),
    occupied: fc.boolean(),
    loGHz: fc.constantFrom(184.81, 183.6, 181.5, 186.2),
  });
  type Gen = typeof arb extends fc.Arbitrary<infer T> ? T : never;
  const planOf = (g: Gen) =>
    ex1v2((p) => {
      p.lasers[0]!.driftMHz = g.driftMHz;
      p.chains[0]!.temperatureExcursionK = g.te;
      p.resonators[0]!.fsrShiftMHzPerK = g.phi;
      p.channels[0]!.centerGHz = 183.31 + g.offsetMHz / 1000;
      p.channels[0]!.bandwidthMHz = g.bwMHz;
      p.channels[0]!.ifFilter = g.occupied ? "occupied" : "slot";
    });

  it("with the slot filter the worst is never better than the nominal figure", () => {
    fc.assert(
      fc.property(arb, (g) => {
        const plan = planOf({ ...g, occupied: false });
        const { ctx, ch, lo, env } = envelopeOf(plan, "A", 0, g.loGHz);
        const nominal = channelEnvelope(ctx, ch, slotAt(ch, lo, ctx.D), lo, envelopeBox(0, 0, 0, 0, 1));
        if (!env.nedt || !nominal.nedt) return;
        expect(env.nedt.value).toBeGreaterThanOrEqual(nominal.nedt.value * (1 - 1e-12));
        expect(env.bandwidth!.value).toBeLessThanOrEqual(nominal.bandwidth!.value * (1 + 1e-12));
        expect(env.mode.response).toBeLessThanOrEqual(nominal.mode.response * (1 + 1e-12));
        expect(env.centre!.error).toBeGreaterThanOrEqual(nominal.centre!.error * (1 - 1e-12));
        if (env.image && nominal.image)
          expect(env.image.rejectionDB).toBeLessThanOrEqual(nominal.image.rejectionDB + 1e-9);
      }),
      { numRuns: 150 },
    );
  }, 60_000);

  it("a larger box (more drift, more temperature excursion) is never better", () => {
    fc.assert(
      fc.property(
        arb,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (g, fd, ft) => {
          const small = envelopeOf(planOf({ ...g, driftMHz: g.driftMHz * fd, te: g.te * ft }), "A", 0, g.loGHz).env;
          const large = envelopeOf(planOf(g), "A", 0, g.loGHz).env;
          if (small.filterImpossible || large.filterImpossible) return;
          // (the occupied filter widens with the drift itself, so only the temperature is compared there)
          if (g.occupied && fd !== 1) return;
          if (small.nedt && large.nedt) expect(large.nedt.value).toBeGreaterThanOrEqual(small.nedt.value * (1 - 1e-9));
          expect(large.mode.response).toBeLessThanOrEqual(small.mode.response * (1 + 1e-9));
          expect(large.centre!.error).toBeGreaterThanOrEqual(small.centre!.error * (1 - 1e-9));
          if (small.image && large.image)
            expect(large.image.rejectionDB).toBeLessThanOrEqual(small.image.rejectionDB + 1e-7);
        },
      ),
      { numRuns: 100 },
    );
  }, 60_000);

  it("a channel centred on its mode, with no temperature excursion, is as bad at +D as at −D", () => {
    fc.assert(
      fc.property(arb, (g) => {
        const plan = planOf({ ...g, offsetMHz: 0, te: 0, occupied: false });
        const { ctx, ch, lo, env } = envelopeOf(plan, "A", 0, g.loGHz);
        if (!env.nedt || ctx.D === 0) return;
        const plus = figuresAt(plan, ch.channel.id, lo, ctx.D, 0).nedtK;
        const minus = figuresAt(plan, ch.channel.id, lo, -ctx.D, 0).nedtK;
        expect(rel(plus, minus)).toBeLessThan(1e-9);
        expect(rel(env.nedt.value, Math.max(plus, minus))).toBeLessThan(1e-6);
        // equal worst values go to the lower LO shift
        expect(env.nedt.u).toBeLessThan(0);
        expect(env.mode.u).toBeLessThan(0);
      }),
      { numRuns: 60 },
    );
  }, 60_000);

  it("zero envelope: every worst figure is the nominal figure, exactly", () => {
    fc.assert(
      fc.property(arb, (g) => {
        const plan = planOf({ ...g, driftMHz: 0, te: 0 });
        const { ctx, ch, lo, env } = envelopeOf(plan, "A", 0, g.loGHz);
        const geo = slotAt(ch, lo, ctx.D);
        const f = ch.centres[0]!;
        expect(env.mode.response).toBe(1 / (1 + ((2 * Math.abs(ctx.s * f - ctx.modeCentre)) / ctx.delta) ** 2));
        expect(env.mode.u).toBe(0);
        expect(env.mode.t).toBe(0);
        if (!geo) return;
        const nominal = sensitivityAt(ctx, ch, geo, lo);
        expect(env.nedt!.value).toBe(nominal.nedtK);
        expect(env.bandwidth!.value).toBe(nominal.radiometricBandwidthMHz);
        const image = imageAt(ctx, ch, lo);
        if (image?.rejectionDB !== null && image?.rejectionDB !== undefined)
          expect(env.image!.rejectionDB).toBe(image.rejectionDB);
        else expect(env.image).toBeNull();
      }),
      { numRuns: 200 },
    );
  });
});
