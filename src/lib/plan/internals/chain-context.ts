import type { Plan, PlanChain, PlanChannel, PlanDetector, PlanLaser, PlanResonator } from "@/schemas/plan";
import type { Comb } from "./comb";
import { type EnvelopeBox, envelopeBox } from "./envelope-box";
import { type Interval, mergeIntervals } from "./intervals";
import { lorentzianIntegral, lorentzianSquaredIntegral } from "./lorentz";
import { lockReplicaDB } from "./lock-replica";
import type { NoiseBudget } from "../types";
import { type ChainNoise, channelBudget, chainNoise, throughTransmission } from "./noise-budget";

/**
 * Everything about one channel that does not depend on the LO offset L
 * (docs/plan-format.md §3.2 "Per channel"). Frequencies in GHz.
 */
export interface ChannelContext {
  channel: PlanChannel;
  /** Position of the channel in `plan.channels` (input order). */
  index: number;
  /** True for a double-sideband channel `c ± d`. */
  dsb: boolean;
  /** Width of one passband, `B = bandwidthMHz/1000`. */
  B: number;
  /** RF passbands, in increasing frequency: SSB `[c − B/2, c + B/2]`; DSB the pair at `c ∓ d`. */
  passbands: Interval[];
  /** RF passband centres, in the order of `passbands`. */
  centres: number[];
  /** Optical bands `Xⱼ = s·Pⱼ`, sorted by frequency. */
  optical: Interval[];
  /** `∫W dy` over the band images in GHz (independent of L: each band maps 1:1 onto its image). */
  intW: number;
  /** `Σⱼ ∫ M_{n*}² dx` over the optical bands in GHz (the DSB cross term depends on L and is added separately). */
  intW2Self: number;
  /** Lock-replica share `lockReplicaDB` (dB). */
  lockReplicaDB: number;
  /** The channel's IF filter passes its slot, or the occupied band (docs/plan-format.md §12.3). */
  occupiedFilter: boolean;
  /** Allowed error of the effective centre (GHz), or null. */
  centreToleranceGHz: number | null;
  /**
   * Scan step of the envelope's searches in the detuning, δ/16 (GHz): every
   * figure the searches look at is the wanted mode (or the comb) integrated
   * over a band, a Lorentzian convolved with a box, which is smooth on the
   * scale of the linewidth whatever the band's width.
   */
  envelopeStep: number;
  /** The receiver temperature NEΔT uses (K): `receiverK`, or the budget's total when the channel's is computed. */
  receiverK: number;
  /** The channel's noise budget, or null when the chain has none (docs/plan-format.md §14.4). */
  budget: NoiseBudget | null;
}

/**
 * Everything about one chain that does not depend on L
 * (docs/plan-format.md §3.1 "Per chain"). Frequencies in GHz,
 * powers in mW.
 */
export interface ChainContext {
  plan: Plan;
  chain: PlanChain;
  laser: PlanLaser;
  resonator: PlanResonator;
  detector: PlanDetector;
  /** Sideband sign s: +1 upper, −1 lower. */
  s: 1 | -1;
  /** Wanted mode index `n* = s·k`. */
  nStar: number;
  /** Centre of the wanted mode, `x = n*·fsr`. */
  modeCentre: number;
  fsr: number;
  /** Loaded linewidth `δ = carrierTHz·1000/loadedQ`. */
  delta: number;
  comb: Comb;
  /** Drift `D = driftMHz/1000`. */
  D: number;
  /** FSR change per kelvin φ = fsrShiftMHzPerK/1000 (GHz/K). */
  phi: number;
  /** Temperature excursion Te (K). */
  Te: number;
  /** The chain's operating envelope: u ∈ [−D, D], t ∈ [−Te, Te] (docs/plan-format.md §12.2). */
  box: EnvelopeBox;
  /** Tuning step in GHz (0: any offset). */
  step: number;
  /** Guard in GHz. */
  guard: number;
  /** Lock modulation frequency `fm` in GHz, modulation index β, orders M. */
  fm: number;
  beta: number;
  lockOrders: number;
  /** Reach intervals, merged where they overlap or touch. */
  reach: Interval[];
  rfInput: Interval;
  detectorBand: Interval;
  sampleRate: number | null;
  /** Carrier power at the detector P_c, LO power P_LO, per-photodiode power P_pd (mW). */
  carrierMW: number;
  loMW: number;
  pdMW: number;
  /**
   * The through-port transmission at resonance that `carrierMW` includes when
   * the resonator's intrinsic Q is given (docs/plan-format.md §14.3), else null
   * (the upper bound of version 1).
   */
  throughTransmission: number | null;
  /** The chain's noise figures, or null without a conversion efficiency (no budget). */
  noise: ChainNoise | null;
  channels: ChannelContext[];
}

function byId<T extends { id: string }>(list: readonly T[], id: string, what: string): T {
  const found = list.find((item) => item.id === id);
  if (!found) throw new Error(`The plan has no ${what} "${id}"`);
  return found;
}

/** Build the L-independent context of chain `chainId`. Throws only when the id does not exist. */
export function chainContext(plan: Plan, chainId: string): ChainContext {
  const chain = byId(plan.chains, chainId, "chain");
  const laser = byId(plan.lasers, chain.laser, "laser");
  const resonator = byId(plan.resonators, chain.resonator, "resonator");
  const detector = byId(plan.detectors, chain.detector, "detector");
  const s: 1 | -1 = chain.sideband === "upper" ? 1 : -1;
  const fsr = resonator.fsrGHz;
  const delta = (laser.carrierTHz * 1000) / resonator.loadedQ;
  const nStar = s * chain.mode;
  const modeCentre = nStar * fsr;
  const fm = laser.lock.modulationMHz / 1000;
  const through = resonator.intrinsicQ === null ? null : throughTransmission(resonator.loadedQ, resonator.intrinsicQ);
  const bound =
    laser.carrierPowerMW * (1 - chain.tapFraction) * 10 ** (-(chain.pathLossDB + chain.carrierRejectionDB) / 10);
  const carrierMW = through === null ? bound : bound * through;
  const loMW = laser.loPowerMW;
  const noise = chainNoise({
    laser,
    resonator,
    detector,
    chain,
    modeGHz: Math.abs(modeCentre),
    carrierMW,
    loMW,
  });
  const ctx: ChainContext = {
    plan,
    chain,
    laser,
    resonator,
    detector,
    s,
    nStar,
    modeCentre,
    fsr,
    delta,
    comb: { fsr, delta },
    D: laser.driftMHz / 1000,
    phi: resonator.fsrShiftMHzPerK / 1000,
    Te: chain.temperatureExcursionK,
    box: envelopeBox(
      laser.driftMHz / 1000,
      -chain.temperatureExcursionK,
      chain.temperatureExcursionK,
      resonator.fsrShiftMHzPerK / 1000,
      nStar,
    ),
    step: laser.stepMHz / 1000,
    guard: plan.settings.guardMHz / 1000,
    fm,
    beta: laser.lock.modulationIndex,
    lockOrders: laser.lock.orders,
    reach: mergeIntervals(laser.reach.map((r) => [r.minGHz, r.maxGHz] as const)),
    rfInput: [chain.rfInput.minGHz, chain.rfInput.maxGHz],
    detectorBand: [detector.minGHz, detector.maxGHz],
    sampleRate: detector.sampleRateGHz,
    carrierMW,
    loMW,
    pdMW: (carrierMW + loMW) / 2,
    throughTransmission: through,
    noise,
    channels: [],
  };
  plan.channels.forEach((channel, index) => {
    if (channel.chain !== chain.id) return;
    const computed = noise ? channelBudget(noise, channel) : null;
    // absurd magnitudes (η near the smallest double) can overflow: such a budget is left out
    const budget = computed && Number.isFinite(computed.totalK) ? computed : null;
    ctx.channels.push(channelContext(ctx, channel, index, budget));
  });
  return ctx;
}

/** The L-independent context of one channel of the chain. */
export function channelContext(
  ctx: Pick<ChainContext, "s" | "modeCentre" | "delta" | "fm" | "beta" | "lockOrders">,
  channel: PlanChannel,
  index: number,
  budget: NoiseBudget | null = null,
): ChannelContext {
  const B = channel.bandwidthMHz / 1000;
  const c = channel.centerGHz;
  const dsb = channel.dsbOffsetGHz !== null;
  const centres = dsb ? [c - (channel.dsbOffsetGHz as number), c + (channel.dsbOffsetGHz as number)] : [c];
  const passbands: Interval[] = centres.map((f) => [f - B / 2, f + B / 2] as const);
  const optical: Interval[] = passbands
    .map((p): Interval => (ctx.s === 1 ? [p[0], p[1]] : [-p[1], -p[0]]))
    .sort((a, b) => a[0] - b[0]);
  let intW = 0;
  let intW2Self = 0;
  for (const x of optical) {
    intW += lorentzianIntegral(x[0], x[1], ctx.modeCentre, ctx.delta);
    intW2Self += lorentzianSquaredIntegral(x[0], x[1], ctx.modeCentre, ctx.delta);
  }
  return {
    channel,
    index,
    dsb,
    B,
    passbands,
    centres,
    optical,
    intW,
    intW2Self,
    lockReplicaDB: lockReplicaDB(ctx.fm, ctx.beta, ctx.lockOrders, ctx.delta, B),
    occupiedFilter: channel.ifFilter === "occupied",
    centreToleranceGHz: channel.centreToleranceMHz === null ? null : channel.centreToleranceMHz / 1000,
    envelopeStep: ctx.delta / 16,
    receiverK: budget && budget.source === "computed" ? budget.totalK : channel.receiverK,
    budget,
  };
}
