import type { Plan } from "@/schemas/plan";
import { chainContext } from "./internals/chain-context";
import { channelImageProblem, filterWidening, occupiedFilterImpossible } from "./internals/channel-envelope";
import { envelopeBox } from "./internals/envelope-box";
import { imageRejectionAtPoint } from "./internals/envelope-image";
import { modeResponse } from "./internals/received-band";
import { receivedSensitivity, slotAt } from "./internals/slot";

/** Which way a curve runs through the operating envelope. */
export type EnvelopeAxis = "lo" | "temperature";

export interface EnvelopeCurveOptions {
  /** "lo": against the LO shift u at the nominal temperature; "temperature": against the temperature offset t at u = 0. */
  axis: EnvelopeAxis;
  /** Number of points, evenly spaced, ends included (at least 2; default 101). */
  points?: number;
  /**
   * Half-width of the curve (MHz of LO shift, or K): by default twice the
   * envelope's end, and at least half a linewidth (in K: the temperature
   * that moves the wanted mode by half a linewidth; 1 K when nothing moves).
   */
  span?: number;
  /** The LO offset (GHz); the chain's own by default. */
  loOffsetGHz?: number;
}

export interface EnvelopeCurvePoint {
  /** LO shift (MHz) or temperature offset (K). */
  x: number;
  /** NEΔT (K); null without a slot or with an impossible occupied-band filter. */
  nedtK: number | null;
  /** Lowest response of the wanted mode at a received passband centre (0..1). */
  modeResponse: number;
  /** Image rejection (dB); null for DSB, without a slot, or when nothing of the image gets in. */
  imageRejectionDB: number | null;
}

export interface EnvelopeCurve {
  channelId: string;
  axis: EnvelopeAxis;
  /** Unit of `x`: "MHz" of LO shift or "K" of temperature offset. */
  unit: "MHz" | "K";
  /** The operating envelope's ends on this axis: [−D, D] in MHz or [−Te, Te] in K. */
  envelope: [number, number];
  /** The channel's NEΔT requirement (K), or null. */
  requiredNedtK: number | null;
  /** The mode response below which `mode-detuned` fires (half power). */
  modeResponseLimit: number;
  /** The image rejection the plan requires (dB). */
  requiredImageRejectionDB: number;
  points: EnvelopeCurvePoint[];
}

/**
 * NEΔT, mode response and image rejection of one channel along one axis of
 * its chain's operating envelope (docs/plan-format.md §12.3), for plotting:
 * against the LO shift u at the nominal resonator temperature, or against
 * the temperature offset t with the LO at its offset; with the requirement
 * and the envelope's ends. The figures are those the envelope's worst
 * values are taken from. Throws when the channel does not exist.
 */
export function envelopeCurves(plan: Plan, channelId: string, options: EnvelopeCurveOptions): EnvelopeCurve {
  const channel = plan.channels.find((c) => c.id === channelId);
  if (!channel) throw new Error(`The plan has no channel "${channelId}"`);
  const ctx = chainContext(plan, channel.chain);
  const ch = ctx.channels.find((c) => c.channel.id === channelId)!;
  const L = options.loOffsetGHz ?? ctx.chain.loOffsetGHz;
  const n = Math.max(2, Math.round(options.points ?? 101));
  const k = ctx.box.k;
  const lo = options.axis === "lo";
  const defaultSpan = lo
    ? Math.max(2 * ctx.D, ctx.delta / 2) * 1000
    : Math.max(2 * ctx.Te, k === 0 ? 1 : ctx.delta / 2 / Math.abs(k));
  const span = options.span !== undefined && options.span > 0 ? options.span : defaultSpan;
  const geo = slotAt(ch, L, ctx.D);
  const usable = geo !== null && !occupiedFilterImpossible(ch, geo, ctx.D);
  const w = filterWidening(ch, ctx.box);
  const image = usable ? channelImageProblem(ctx, ch, envelopeBox(ctx.D, -ctx.Te, ctx.Te, ctx.phi, ctx.nStar)) : null;
  const points: EnvelopeCurvePoint[] = [];
  for (let i = 0; i < n; i++) {
    const x = -span + (2 * span * i) / (n - 1);
    const u = lo ? x / 1000 : 0;
    const t = lo ? 0 : x;
    const d = u - k * t;
    const nedt = usable ? receivedSensitivity(ctx, ch, geo, L, d, w).nedtK : null;
    let response = 1;
    for (const f of ch.centres) {
      const det = ctx.s * f - ctx.modeCentre + (ch.occupiedFilter ? 0 : u) - k * t;
      response = Math.min(response, modeResponse(det, ctx.delta));
    }
    const r = image ? imageRejectionAtPoint(image, L, u, t) : null;
    points.push({
      x: x + 0,
      nedtK: nedt !== null && Number.isFinite(nedt) ? nedt : null,
      modeResponse: response,
      imageRejectionDB: r !== null && Number.isFinite(r) ? r : null,
    });
  }
  return {
    channelId,
    axis: options.axis,
    unit: lo ? "MHz" : "K",
    envelope: lo ? [-ctx.D * 1000 + 0, ctx.D * 1000] : [-ctx.Te + 0, ctx.Te],
    requiredNedtK: channel.requiredNedtK,
    modeResponseLimit: 0.5,
    requiredImageRejectionDB: plan.settings.imageRejectionDB,
    points,
  };
}
