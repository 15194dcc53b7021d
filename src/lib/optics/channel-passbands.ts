import type { ChannelSpec } from "./internals/channel";

export interface Passband {
  minGHz: number;
  maxGHz: number;
}

/**
 * RF passbands of a channel (docs/plan-format.md §3.2 "Per channel"):
 * single sideband P = [c − B/2, c + B/2]; double sideband the pair
 * [c ∓ d − B/2, c ∓ d + B/2], lower first. B = bandwidthMHz/1000.
 */
export function channelPassbands(channel: ChannelSpec): Passband[] {
  const half = channel.bandwidthMHz / 2000;
  const c = channel.centerGHz;
  if (channel.dsbOffsetGHz === null) return [{ minGHz: c - half, maxGHz: c + half }];
  const d = channel.dsbOffsetGHz;
  return [
    { minGHz: c - d - half, maxGHz: c - d + half },
    { minGHz: c + d - half, maxGHz: c + d + half },
  ];
}
