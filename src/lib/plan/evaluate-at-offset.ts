import { channelResult } from "./internals/channel-result";
import { evaluateChain } from "./internals/evaluate-chain";
import type { PreparedChain } from "./prepare-chain";
import type { ChannelResult, Finding, Spur } from "./types";

/** One chain checked at one LO offset: its part of the result document, without the map and place. */
export interface ChainAtOffset {
  /** The LO offset evaluated (GHz). */
  loOffsetGHz: number;
  /** The `channels` entries of the chain's channels, in input order. */
  channels: ChannelResult[];
  /** Every kept spur of the chain (family in table order, then band). */
  spurs: Spur[];
  /** Every finding of the chain and its channels, in the order of docs/plan-format.md §4.3. */
  findings: Finding[];
}

/**
 * Check a prepared chain with its LO at `loOffsetGHz`: the same channel
 * figures, spurs and findings `checkPlan` gives for the chain when the
 * plan's `loOffsetGHz` is set to that offset (the feasibility map and the
 * place do not depend on the LO and are not worked out). For many offsets
 * of one chain (a drag in the lane view), prepare once and call this per
 * offset.
 */
export function evaluateAtOffset(chain: PreparedChain, loOffsetGHz: number): ChainAtOffset {
  const ev = evaluateChain(chain.context, loOffsetGHz);
  return { loOffsetGHz, channels: ev.channels.map(channelResult), spurs: ev.spurs, findings: ev.findings };
}
