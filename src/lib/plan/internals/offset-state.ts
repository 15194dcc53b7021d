import type { ChainContext, ChannelContext } from "./chain-context";
import { type ChannelEnvelope, channelEnvelope } from "./channel-envelope";
import type { EnvelopeBox } from "./envelope-box";
import { type Interval, absInterval } from "./intervals";
import { foldInterval } from "./nyquist";
import { type ImageFigures, type Sensitivity, type SlotGeometry, imageAt, sensitivityAt, slotAt } from "./slot";

/** Per-channel figures at the evaluated offset. */
export interface ChannelAtOffset {
  ch: ChannelContext;
  /** Null when the LO lies strictly inside one of the channel's optical bands. */
  geo: SlotGeometry | null;
  /** Null without a slot, and in map-only mode. */
  sensitivity: Sensitivity | null;
  /** Null for DSB channels and without a slot (the nominal image). */
  image: ImageFigures | null;
  /** The channel over the operating envelope (in map-only mode only its image rejection is worked out). */
  envelope: ChannelEnvelope;
}

/** What every rule family of `evaluateChain` reads: the chain, the offset and the geometry there. */
export interface OffsetState {
  ctx: ChainContext;
  /** The LO offset (GHz). */
  L: number;
  /** Only the error rules that depend on L (see `EvaluateOptions.mapOnly`). */
  mapOnly: boolean;
  /** The operating envelope the worst values are taken over (the chain's own unless told). */
  box: EnvelopeBox;
  /** One entry per `ctx.channels[i]`. */
  channels: ChannelAtOffset[];
  /** `|O|` of each channel folded at the sample rate; null without a slot or without sampling. */
  foldedOcc: (Interval | null)[];
}

/**
 * The geometry of every channel of the chain at LO offset L, its nominal
 * figures and its figures over the envelope `box` (sensitivity skipped in
 * map-only mode, where only the envelope's image rejection is worked out).
 */
export function offsetState(ctx: ChainContext, L: number, mapOnly: boolean, box: EnvelopeBox = ctx.box): OffsetState {
  const fs = ctx.sampleRate;
  const channels: ChannelAtOffset[] = ctx.channels.map((ch) => {
    const geo = slotAt(ch, L, ctx.D);
    const sensitivity = geo && !mapOnly ? sensitivityAt(ctx, ch, geo, L) : null;
    const image = geo ? imageAt(ctx, ch, L) : null;
    const envelope = channelEnvelope(ctx, ch, geo, L, box, mapOnly);
    return { ch, geo, sensitivity, image, envelope };
  });
  const foldedOcc: (Interval | null)[] = channels.map((c) =>
    c.geo && fs !== null ? foldInterval(absInterval(c.geo.occupied), fs) : null,
  );
  return { ctx, L, mapOnly, box, channels, foldedOcc };
}
