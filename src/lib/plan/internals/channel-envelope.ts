import type { ChainContext, ChannelContext } from "./chain-context";
import { type BoxPoint, type EnvelopeBox, detuningRange, modeShiftRange, pointAt } from "./envelope-box";
import { type ImageProblem, type ImageWorst, worstImage } from "./envelope-image";
import { maximise, minimise } from "./extremum";
import { type NedtModel, nedtModel } from "./nedt-model";
import { centroidOffset, modeResponse } from "./received-band";
import { type SlotGeometry, receivedSensitivity } from "./slot";

/**
 * A channel's figures over the operating envelope at one LO offset
 * (docs/plan-format.md §12.3–§12.4): the worst NEΔT, radiometric bandwidth,
 * image rejection and mode response over the box, the largest error of the
 * effective centre, and where each occurs. Frequencies in GHz.
 */

/** A worst value and the point of the box where it occurs. */
export interface WorstAt extends BoxPoint {
  value: number;
}

export interface ModeWorst extends BoxPoint {
  /** Lowest response of the wanted mode at a received passband centre (0..1). */
  response: number;
  /** The largest detuning of a received passband centre from the mode (GHz). */
  detuning: number;
  /** The nominal RF centre of the passband where it occurs (GHz). */
  passbandCentre: number;
  /** Every passband centre whose worst detuning exceeds δ/2 (beyond the allowance), in passband order. */
  detunedCentres: number[];
}

export interface CentreWorst extends BoxPoint {
  /** Largest error of the effective centre over the box (GHz). */
  error: number;
  /** The nominal RF centre of the passband where it occurs (GHz). */
  passbandCentre: number;
}

/** The largest NEΔT, and its two terms there (what an observation schedule's best split reads, §13.6). */
export interface NedtWorst extends WorstAt {
  model: NedtModel;
}

export interface ChannelEnvelope {
  /** The occupied-band filter cannot be built at L: the occupied band reaches 0 GHz (slot.lo ≤ D, D > 0). */
  filterImpossible: boolean;
  /** Largest NEΔT (K); null without a slot or with an impossible filter. */
  nedt: NedtWorst | null;
  /** Smallest radiometric bandwidth (MHz); null as NEΔT, or when S ≡ 0. */
  bandwidth: WorstAt | null;
  /** Lowest image rejection; null for DSB, without a slot, with an impossible filter, or when nothing of the image gets in. */
  image: ImageWorst | null;
  /** Lowest mode response; reported with or without a slot. */
  mode: ModeWorst;
  /** Largest centre error; null with an impossible filter. */
  centre: CentreWorst | null;
}

/** The occupied-band filter of a channel with a slot cannot be built: its band would reach 0 GHz. */
export function occupiedFilterImpossible(ch: ChannelContext, geo: SlotGeometry | null, D: number): boolean {
  return ch.occupiedFilter && geo !== null && D > 0 && geo.slot[0] <= D;
}

/** The half-width by which the channel's received band is widened: D for the occupied-band filter, else 0. */
export function filterWidening(ch: ChannelContext, box: EnvelopeBox): number {
  return ch.occupiedFilter ? box.D : 0;
}

/** The image problem of an SSB channel (the received band at u = 0 and the comb), for `worstImage`. */
export function channelImageProblem(ctx: ChainContext, ch: ChannelContext, box: EnvelopeBox): ImageProblem | null {
  const x = ch.optical[0];
  if (ch.dsb || !x) return null;
  const w = filterWidening(ch, box);
  return {
    xl: w === 0 ? x[0] : x[0] - w,
    xh: w === 0 ? x[1] : x[1] + w,
    modeCentre: ctx.modeCentre,
    delta: ctx.delta,
    fsr: ctx.fsr,
    nStar: ctx.nStar,
    rfMin: ctx.rfInput[0],
    rfMax: ctx.rfInput[1],
    box,
    step: ch.envelopeStep,
  };
}

/** The worst mode response over the box (closed form: the largest detuning is at an end of the box). */
export function modeWorst(ctx: ChainContext, ch: ChannelContext, box: EnvelopeBox): ModeWorst {
  const halfDelta = ctx.delta / 2;
  // slot: the received centre moves with d = u − k·t; occupied: only the mode moves (−k·t)
  const [lo, hi] = ch.occupiedFilter ? modeShiftRange(box) : detuningRange(box);
  let worst: ModeWorst | null = null;
  const detuned: number[] = [];
  for (const f of ch.centres) {
    const e = ctx.s * f - ctx.modeCentre;
    const a = Math.abs(e + lo);
    const b = Math.abs(e + hi);
    const shift = b > a ? hi : lo;
    const detuning = Math.max(a, b);
    if (detuning > halfDelta + 1e-9) detuned.push(f);
    // the first largest detuning (as the nominal rule has always named it)
    if (worst === null || detuning > worst.detuning) {
      const at = ch.occupiedFilter ? occupiedPoint(box, shift) : pointAt(box, shift);
      worst = { response: modeResponse(detuning, ctx.delta), detuning, passbandCentre: f, detunedCentres: [], ...at };
    }
  }
  const out = worst as ModeWorst;
  out.detunedCentres = detuned;
  return out;
}

/** The point where the mode has moved by `shift = −k·t` against a band that does not move with u (u = 0). */
function occupiedPoint(box: EnvelopeBox, shift: number): BoxPoint {
  if (box.k === 0) return { u: 0, t: Math.min(box.tHi, Math.max(box.tLo, 0)) + 0 };
  return { u: 0, t: Math.min(box.tHi, Math.max(box.tLo, -shift / box.k)) + 0 };
}

/**
 * The largest error of the effective centre over the box. At fixed t the
 * received band's centroid moves on strictly with u (the centroid of a
 * positive weight over a sliding window does), so `u + H(e + u − k·t)`
 * grows with u and its magnitude is largest at u = ±D; over t it is
 * searched on the two edges u = ±D.
 */
export function centreWorst(ctx: ChainContext, ch: ChannelContext, box: EnvelopeBox): CentreWorst {
  const w = filterWidening(ch, box);
  const width = ch.B + 2 * w;
  const D = box.D;
  let best: CentreWorst | null = null;
  for (const f of ch.centres) {
    const e = ctx.s * f - ctx.modeCentre;
    const edge = (u: number) => (t: number) => Math.abs(u + centroidOffset(e + u - box.k * t, width, ctx.delta));
    for (const u of D === 0 ? [0] : [-D, D]) {
      const g = edge(u);
      let r: { x: number; fx: number };
      if (box.k === 0 || box.tLo === box.tHi) {
        const t0 = Math.min(box.tHi, Math.max(box.tLo, 0)) + 0;
        r = { x: t0, fx: g(t0) };
      } else {
        r = maximise(g, box.tLo, box.tHi, ch.envelopeStep / Math.abs(box.k));
      }
      // equal errors (to 1e-12 relative) go to the first point (lower u, lower passband)
      if (best === null || r.fx > best.error * (1 + 1e-12))
        best = { error: r.fx, passbandCentre: f, u: u + 0, t: r.x + 0 };
    }
  }
  return best as CentreWorst;
}

/**
 * The channel's envelope at LO offset L over `box`. `imageOnly` works out
 * the image rejection alone (what the feasibility map's rules need).
 */
export function channelEnvelope(
  ctx: ChainContext,
  ch: ChannelContext,
  geo: SlotGeometry | null,
  L: number,
  box: EnvelopeBox,
  imageOnly = false,
): ChannelEnvelope {
  const filterImpossible = occupiedFilterImpossible(ch, geo, box.D);
  const usable = geo !== null && !filterImpossible;
  const problem = usable ? channelImageProblem(ctx, ch, box) : null;
  let image: ImageWorst | null = null;
  if (problem) {
    const r = worstImage(problem, L);
    image = Number.isFinite(r.rejectionDB) ? r : null;
  }
  const mode = imageOnly ? null : modeWorst(ctx, ch, box);
  if (imageOnly || !usable) {
    return {
      filterImpossible,
      nedt: null,
      bandwidth: null,
      image,
      mode: mode as ModeWorst,
      centre: imageOnly || filterImpossible ? null : centreWorst(ctx, ch, box),
    };
  }
  const w = filterWidening(ch, box);
  const [dMin, dMax] = detuningRange(box);
  // the NEΔT and bandwidth searches scan the same detunings: work each out once
  const seen = new Map<number, ReturnType<typeof receivedSensitivity>>();
  const sens = (d: number) => {
    let v = seen.get(d);
    if (v === undefined) {
      v = receivedSensitivity(ctx, ch, geo, L, d, w);
      seen.set(d, v);
    }
    return v;
  };
  const n = maximise((d) => sens(d).nedtK, dMin, dMax, ch.envelopeStep);
  const nedt: NedtWorst | null = Number.isFinite(n.fx)
    ? { value: n.fx, ...pointAt(box, n.x), model: nedtModel(sens(n.x), ch.channel.gainStability) }
    : null;
  let bandwidth: WorstAt | null = null;
  if (sens(0).radiometricBandwidthMHz !== null) {
    const b = minimise((d) => sens(d).radiometricBandwidthMHz ?? Infinity, dMin, dMax, ch.envelopeStep);
    if (Number.isFinite(b.fx)) bandwidth = { value: b.fx, ...pointAt(box, b.x) };
  }
  return { filterImpossible, nedt, bandwidth, image, mode: mode as ModeWorst, centre: centreWorst(ctx, ch, box) };
}
