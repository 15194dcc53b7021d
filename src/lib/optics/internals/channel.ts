/** A channel as the plan stores it (docs/plan-format.md §2.7 `channels[]`). */
export interface ChannelSpec {
  centerGHz: number;
  /** d of a double-sideband channel c ± d, null for a single passband. */
  dsbOffsetGHz: number | null;
  /** Width of each passband, MHz. */
  bandwidthMHz: number;
}

export type ChannelPart = "centre" | "offset" | "bandwidth" | "notation";

export interface ChannelParseError {
  /** Which part of the notation did not parse or is out of range. */
  part: ChannelPart;
  /** The text of that part as typed. */
  text: string;
  message: string;
}

export type ChannelParseResult = { ok: true; value: ChannelSpec } | { ok: false; error: ChannelParseError };
