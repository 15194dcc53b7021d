import type { ChannelEnvelopeResult, ChannelResult, EnvelopePoint } from "../types";
import type { ChannelEnvelope } from "./channel-envelope";
import type { BoxPoint } from "./envelope-box";
import { pair } from "./format";
import type { ChannelAtOffset } from "./offset-state";

/** A JSON-safe number: non-finite values (only reachable with absurd inputs) become null. */
function finite(v: number | null): number | null {
  return v !== null && Number.isFinite(v) ? v + 0 : null;
}

/** A point of the box as the result document writes it (u in MHz, t in K). */
export function envelopePoint(at: BoxPoint): EnvelopePoint {
  return { loShiftMHz: at.u * 1000 + 0, temperatureOffsetK: at.t + 0 };
}

/** The `envelope` object of a channel's result entry (docs/plan-format.md §12.7). */
export function envelopeResult(e: ChannelEnvelope): ChannelEnvelopeResult {
  const nedt = e.nedt && finite(e.nedt.value) !== null ? e.nedt : null;
  const bw = e.bandwidth && finite(e.bandwidth.value) !== null ? e.bandwidth : null;
  const img = e.image && finite(e.image.rejectionDB) !== null ? e.image : null;
  const centre = e.centre && finite(e.centre.error) !== null ? e.centre : null;
  return {
    worstNedtK: nedt ? nedt.value : null,
    worstNedtAt: nedt ? envelopePoint(nedt) : null,
    worstRadiometricBandwidthMHz: bw ? bw.value : null,
    worstRadiometricBandwidthAt: bw ? envelopePoint(bw) : null,
    worstImageRejectionDB: img ? img.rejectionDB : null,
    worstImageRejectionAt: img ? envelopePoint(img) : null,
    worstModeResponse: e.mode.response,
    worstModeResponseAt: envelopePoint(e.mode),
    centreErrorMHz: centre ? centre.error * 1000 + 0 : null,
    centreErrorAt: centre ? envelopePoint(centre) : null,
  };
}

/** The `channels` entry of the result document for one channel at the evaluated offset. */
export function channelResult(c: ChannelAtOffset): ChannelResult {
  return {
    id: c.ch.channel.id,
    ifSlotGHz: c.geo ? pair(c.geo.slot) : null,
    occupiedGHz: c.geo ? pair(c.geo.occupied) : null,
    imageGHz: c.image ? pair(c.image.imageGHz) : null,
    imageRejectionDB: c.image ? finite(c.image.rejectionDB) : null,
    radiometricBandwidthMHz: c.sensitivity ? finite(c.sensitivity.radiometricBandwidthMHz) : null,
    nedtK: c.sensitivity ? finite(c.sensitivity.nedtK) : null,
    lockReplicaDB: c.ch.lockReplicaDB,
    envelope: envelopeResult(c.envelope),
    ...(c.ch.budget ? { noiseBudget: c.ch.budget } : {}),
  };
}
