import type { ChannelResult } from "../types";
import { pair } from "./format";
import type { ChannelAtOffset } from "./offset-state";

/** A JSON-safe number: non-finite values (only reachable with absurd inputs) become null. */
function finite(v: number | null): number | null {
  return v !== null && Number.isFinite(v) ? v : null;
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
  };
}
