import type { Plan } from "@/schemas/plan";
import { type LDependentErrorCode, L_DEPENDENT_ERROR_CODES, RULE_ORDER } from "../types";
import { type EnvelopeBox, envelopeBox } from "./envelope-box";
import type { ImageProblem } from "./envelope-image";
import { lorentzianIntegral } from "./lorentz";

/** A code the feasibility map can list. */
export type MapCode = LDependentErrorCode;

/**
 * The codes that shape the feasibility map: the engine's
 * `L_DEPENDENT_ERROR_CODES`, taken in rules-table order (`RULE_ORDER`) so
 * that a mask's codes come out in the order docs/plan-format.md §4.1 lists them.
 */
export const MAP_CODES: readonly MapCode[] = RULE_ORDER.filter((c): c is MapCode =>
  L_DEPENDENT_ERROR_CODES.includes(c),
);

/** Bit of each code in a code-set mask (bit i = `MAP_CODES[i]`). */
export const CODE_BIT: Readonly<Record<MapCode, number>> = Object.fromEntries(
  MAP_CODES.map((code, i) => [code, 1 << i]),
) as Record<MapCode, number>;

/** The codes of a mask, in rules-table order. */
export function codesOfMask(mask: number): MapCode[] {
  const out: MapCode[] = [];
  for (let i = 0; i < MAP_CODES.length; i++) {
    if (mask & (1 << i)) out.push(MAP_CODES[i] as MapCode);
  }
  return out;
}

/** One channel, reduced to what the L-dependent rules need (GHz). */
export interface MapChannel {
  id: string;
  /** Optical bands `Xⱼ = s·Pⱼ`, sorted by lower edge (one for SSB, two for DSB). */
  bands: [number, number][];
  /** Width of one passband `B`. */
  widthGHz: number;
  /** SSB channels are subject to the image rule. */
  ssb: boolean;
  /** `∫W dy` over the slot: `∫_X M_{n*}(x) dx` (independent of L). */
  wantedIntegral: number;
  /** The IF filter passes the occupied band (docs/plan-format.md §12.3). */
  occupied: boolean;
  /** The image rule over the chain's operating envelope (SSB channels), as the per-offset check states it. */
  imageProblem: ImageProblem | null;
}

/** One chain, reduced to what the L-dependent rules need (all in GHz). */
export interface MapModel {
  chainId: string;
  /** Merged reach intervals (overlapping or touching ones joined), increasing. */
  reach: [number, number][];
  /** Drift `D`. */
  drift: number;
  /** The chain's operating envelope (u within ±D, t within ±Te). */
  box: EnvelopeBox;
  /** Guard `g`. */
  guard: number;
  /** Tuning step (0 = any offset). */
  step: number;
  /** Step in MHz as entered (multiples are formed as `k·stepMHz/1000`). */
  stepMHz: number;
  detMin: number;
  detMax: number;
  /** `fs/2`, or null when the IF is not digitised. */
  halfFs: number | null;
  /** `slot-overlap` is a warning (not in the map) when true. */
  sharedIf: boolean;
  /** Lock modulation `fm` and orders `M`. */
  fm: number;
  lockOrders: number;
  /** Linewidth `δ`, FSR, comb parameter `a = δ/(2·fsr)`. */
  linewidth: number;
  fsr: number;
  /** Image rule threshold (dB) and the antenna box `rfInput`. */
  imageRejectionDB: number;
  rfMin: number;
  rfMax: number;
  channels: MapChannel[];
}

/** Merge intervals that overlap or touch (docs/plan-format.md §1.3: reach intervals). */
export function mergeTouching(list: readonly (readonly [number, number])[]): [number, number][] {
  const sorted = list.map((r) => [r[0], r[1]] as [number, number]).sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  const out: [number, number][] = [];
  for (const iv of sorted) {
    const last = out[out.length - 1];
    if (last && iv[0] <= last[1]) {
      if (iv[1] > last[1]) last[1] = iv[1];
    } else out.push(iv);
  }
  return out;
}

/**
 * Reduce a chain of a parsed plan to the quantities the L-dependent rules use.
 * Throws when the chain id does not exist (the caller passes ids from the plan).
 * `temperatureK` replaces the chain's temperature excursion by one
 * temperature offset (a row of the temperature map).
 */
export function buildMapModel(plan: Plan, chainId: string, temperatureK?: number): MapModel {
  const chain = plan.chains.find((c) => c.id === chainId);
  if (!chain) throw new Error(`no chain with id "${chainId}"`);
  const laser = plan.lasers.find((l) => l.id === chain.laser);
  const resonator = plan.resonators.find((r) => r.id === chain.resonator);
  const detector = plan.detectors.find((d) => d.id === chain.detector);
  if (!laser || !resonator || !detector)
    throw new Error(`chain "${chainId}" names a missing laser, resonator or detector`);
  const s = chain.sideband === "upper" ? 1 : -1;
  const linewidth = (laser.carrierTHz * 1000) / resonator.loadedQ;
  const wantedCentre = s * chain.mode * resonator.fsrGHz;
  const nStar = s * chain.mode;
  const D = laser.driftMHz / 1000;
  const box = envelopeBox(
    D,
    temperatureK ?? -chain.temperatureExcursionK,
    temperatureK ?? chain.temperatureExcursionK,
    resonator.fsrShiftMHzPerK / 1000,
    nStar,
  );
  const channels: MapChannel[] = [];
  for (const ch of plan.channels) {
    if (ch.chain !== chainId) continue;
    const B = ch.bandwidthMHz / 1000;
    const centres =
      ch.dsbOffsetGHz === null ? [ch.centerGHz] : [ch.centerGHz - ch.dsbOffsetGHz, ch.centerGHz + ch.dsbOffsetGHz];
    const bands = centres
      .map((f) => {
        const lo = s * (f - B / 2);
        const hi = s * (f + B / 2);
        return (lo <= hi ? [lo, hi] : [hi, lo]) as [number, number];
      })
      .sort((p, q) => p[0] - q[0]);
    let wantedIntegral = 0;
    for (const b of bands) wantedIntegral += lorentzianIntegral(b[0], b[1], wantedCentre, linewidth);
    const occupied = ch.ifFilter === "occupied";
    const w = occupied ? D : 0;
    const x = bands[0] as [number, number];
    const imageProblem: ImageProblem | null =
      ch.dsbOffsetGHz === null
        ? {
            xl: w === 0 ? x[0] : x[0] - w,
            xh: w === 0 ? x[1] : x[1] + w,
            modeCentre: wantedCentre,
            delta: linewidth,
            fsr: resonator.fsrGHz,
            nStar,
            rfMin: chain.rfInput.minGHz,
            rfMax: chain.rfInput.maxGHz,
            box,
            step: linewidth / 16,
          }
        : null;
    channels.push({
      id: ch.id,
      bands,
      widthGHz: B,
      ssb: ch.dsbOffsetGHz === null,
      wantedIntegral,
      occupied,
      imageProblem,
    });
  }
  return {
    chainId,
    reach: mergeTouching(laser.reach.map((r) => [r.minGHz, r.maxGHz] as const)),
    drift: D,
    box,
    guard: plan.settings.guardMHz / 1000,
    step: laser.stepMHz / 1000,
    stepMHz: laser.stepMHz,
    detMin: detector.minGHz,
    detMax: detector.maxGHz,
    halfFs: detector.sampleRateGHz === null ? null : detector.sampleRateGHz / 2,
    sharedIf: chain.sharedIf,
    fm: laser.lock.modulationMHz / 1000,
    lockOrders: laser.lock.orders,
    linewidth,
    fsr: resonator.fsrGHz,
    imageRejectionDB: plan.settings.imageRejectionDB,
    rfMin: chain.rfInput.minGHz,
    rfMax: chain.rfInput.maxGHz,
    channels,
  };
}
