import fc from "fast-check";
import { type Plan, type PlanInput, parsePlan } from "@/schemas/plan";

/**
 * Small one-chain plans (invented demo data) whose feasibility map is
 * interesting: the channels sit near the wanted mode, the reach sweeps the
 * LO across them so the IF runs through the detector band, and drift,
 * guard, lock tones, image threshold and sampling vary. Used by the map,
 * place and sampler tests.
 */

const dbl = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/** Round to 1 kHz so that generated plans read like hand-written ones (and hit exact ties now and then). */
const kHz = (x: number) => Math.round(x * 1e6) / 1e6;

export interface SmallPlanOptions {
  /** Largest channel count (default 4). */
  maxChannels?: number;
}

export function arbitrarySmallPlanInput(opts: SmallPlanOptions = {}): fc.Arbitrary<PlanInput> {
  const maxChannels = opts.maxChannels ?? 4;
  return fc
    .record({
      upper: fc.boolean(),
      fsr: dbl(20, 200),
      mode: fc.integer({ min: 1, max: 2 }),
      loadedQ: fc.oneof(dbl(1e4, 1e5), dbl(1e5, 1e7)),
      channels: fc.array(
        fc.record({
          offset: dbl(-2, 2), // GHz from the mode centre
          bwMHz: dbl(5, 800),
          dsb: fc.option(dbl(0.05, 4), { nil: null, freq: 4 }),
        }),
        { minLength: 1, maxLength: maxChannels },
      ),
      reach: fc.array(fc.tuple(dbl(-16, 14), dbl(0.5, 18)), { minLength: 1, maxLength: 3 }),
      stepMHz: fc.constantFrom(0, 1, 5, 10, 25, 100),
      driftMHz: fc.oneof(fc.constant(0), dbl(0, 60)),
      guardMHz: fc.oneof(fc.constant(0), dbl(0, 120)),
      fmMHz: dbl(10, 700),
      orders: fc.integer({ min: 1, max: 3 }),
      detMin: fc.oneof(fc.constant(0), dbl(0, 1.5)),
      detWidth: dbl(0.5, 12),
      fs: fc.option(dbl(1.5, 20), { nil: null }),
      imageDB: dbl(-5, 60),
      rfLo: dbl(0.5, 8),
      rfHi: dbl(0.5, 8),
      sharedIf: fc.boolean(),
    })
    .map((g) => {
      const s = g.upper ? 1 : -1;
      const centre = g.mode * g.fsr;
      const channels = g.channels.map((c, k) => {
        const bandwidthMHz = kHz(c.bwMHz / 1000) * 1000;
        const dsbOffsetGHz = c.dsb === null ? null : kHz(bandwidthMHz / 2000 + c.dsb);
        return {
          id: `ch${k}`,
          name: `demo channel ${k}`,
          chain: "A",
          centerGHz: kHz(centre + c.offset),
          bandwidthMHz,
          dsbOffsetGHz,
          integrationMs: 10,
          antennaK: 250,
          receiverK: 3000,
          gainStability: 0,
          requiredNedtK: null,
        };
      });
      const input: PlanInput = {
        format: "heterolane.plan/1",
        name: "Demo data: generated small plan",
        settings: {
          guardMHz: kHz(g.guardMHz / 1000) * 1000,
          imageRejectionDB: g.imageDB,
          spurMaxOrder: 3,
          replicaLimitDB: -20,
        },
        lasers: [
          {
            id: "LP",
            carrierTHz: 193.4,
            carrierPowerMW: 5,
            loPowerMW: 5,
            reach: g.reach.map(([a, w]) => ({ minGHz: kHz(s * centre + a), maxGHz: kHz(s * centre + a + w) })),
            stepMHz: g.stepMHz,
            driftMHz: kHz(g.driftMHz / 1000) * 1000,
            lock: { modulationMHz: kHz(g.fmMHz / 1000) * 1000, modulationIndex: 0.5, orders: g.orders },
          },
        ],
        resonators: [{ id: "R", fsrGHz: g.fsr, loadedQ: g.loadedQ }],
        detectors: [
          {
            id: "D",
            minGHz: kHz(g.detMin),
            maxGHz: kHz(g.detMin + g.detWidth),
            maxInputMW: 10,
            sampleRateGHz: g.fs === null ? null : kHz(g.fs),
          },
        ],
        chains: [
          {
            id: "A",
            laser: "LP",
            resonator: "R",
            detector: "D",
            mode: g.mode,
            sideband: g.upper ? "upper" : "lower",
            loOffsetGHz: s * centre,
            rfInput: { minGHz: centre - g.rfLo, maxGHz: centre + g.rfHi },
            tapFraction: 0.01,
            pathLossDB: 3,
            carrierRejectionDB: 0,
            sharedIf: g.sharedIf,
          },
        ],
        channels,
      };
      return input;
    });
}

/**
 * The small plans of `arbitrarySmallPlanInput` as version 2 documents with
 * an operating envelope: an LO drift of 0.5–40 MHz, a temperature
 * excursion of 0 or up to 2 K, an FSR shift of up to ±20 MHz per kelvin
 * and either IF filter per channel (invented demo data).
 */
export function arbitraryEnvelopePlanInput(opts: SmallPlanOptions = {}): fc.Arbitrary<PlanInput> {
  return fc
    .tuple(
      arbitrarySmallPlanInput(opts),
      fc.record({
        driftMHz: dbl(0.5, 40),
        te: fc.oneof(fc.constant(0), dbl(0.001, 2)),
        phi: dbl(-20, 20),
        occupied: fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }),
      }),
    )
    .map(([p, e]) => {
      const q = structuredClone(p);
      q.format = "heterolane.plan/2";
      q.lasers[0]!.driftMHz = kHz(e.driftMHz / 1000) * 1000;
      q.chains[0]!.temperatureExcursionK = kHz(e.te / 1000) * 1000;
      q.resonators[0]!.fsrShiftMHzPerK = kHz(e.phi / 1000) * 1000;
      q.channels.forEach((c, i) => (c.ifFilter = e.occupied[i % 8] ? "occupied" : "slot"));
      return q;
    });
}

export function arbitraryEnvelopePlan(opts: SmallPlanOptions = {}): fc.Arbitrary<Plan> {
  return arbitraryEnvelopePlanInput(opts).map(parseOrThrow);
}

export function parseOrThrow(input: unknown): Plan {
  const r = parsePlan(input);
  if (!r.ok) throw new Error(`invalid generated plan: ${r.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}`);
  return r.plan;
}

export function arbitrarySmallPlan(opts: SmallPlanOptions = {}): fc.Arbitrary<Plan> {
  return arbitrarySmallPlanInput(opts).map(parseOrThrow);
}
