import type { ChannelSpec } from "./internals/channel";

/**
 * Write a channel in sounder-table notation, exactly (shortest round-trip
 * decimal for every number): "183.311 ± 3 GHz, 2 × 1000 MHz" or
 * "89 GHz, 2800 MHz". parseChannelNotation reads it back to the same values.
 */
export function formatChannelNotation(channel: ChannelSpec): string {
  if (channel.dsbOffsetGHz === null) {
    return `${String(channel.centerGHz)} GHz, ${String(channel.bandwidthMHz)} MHz`;
  }
  return `${String(channel.centerGHz)} ± ${String(channel.dsbOffsetGHz)} GHz, 2 × ${String(channel.bandwidthMHz)} MHz`;
}
