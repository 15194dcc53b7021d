import type { Plan } from "@/schemas/plan";
import { chainContext } from "./internals/chain-context";
import { type EvaluateOptions, evaluateChain } from "./internals/evaluate-chain";
import type { Finding } from "./types";

/**
 * Every finding of chain `chainId` and its channels, in the order of
 * docs/plan-format.md §4.3 "Order of findings", with the chain's LO
 * replaced by `loOffsetGHz`. No feasibility map or place.
 *
 * `options.mapOnly` restricts the work to the error rules that depend on
 * L (the ones that shape the feasibility map); the harmonic and
 * intermodulation families, which only ever make info findings, are then
 * skipped. For many offsets of one chain, prepare it once with
 * `prepareChain` and call `evaluateAtOffset`.
 */
export function checkChainAtOffset(
  plan: Plan,
  chainId: string,
  loOffsetGHz: number,
  options: EvaluateOptions = {},
): Finding[] {
  return evaluateChain(chainContext(plan, chainId), loOffsetGHz, options).findings;
}
