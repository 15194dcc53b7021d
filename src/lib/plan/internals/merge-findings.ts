import type { Finding } from "../types";
import { ruleRank } from "../types";

/**
 * The findings of one chain from two collectors, in the order of
 * docs/plan-format.md §4.3: chain-level first, then per channel in the
 * order of `channelIds`, codes in rules-table order, stable within a code
 * (both lists are already in that order; `a`'s come first within a code).
 */
export function mergeFindings(a: readonly Finding[], b: readonly Finding[], channelIds: readonly string[]): Finding[] {
  if (b.length === 0) return [...a];
  const at = new Map(channelIds.map((id, i) => [id, i]));
  const key = (f: Finding) => (f.channel === null ? -1 : (at.get(f.channel) ?? channelIds.length));
  return [...a, ...b].sort((x, y) => key(x) - key(y) || ruleRank(x.code) - ruleRank(y.code));
}
