import type { Plan } from "@/schemas/plan";
import { chainContext } from "./internals/chain-context";
import { evaluateChain } from "./internals/evaluate-chain";
import { type TemperatureWindow, temperatureWindowAt } from "./internals/temperature-window";

export type { TemperatureWindow } from "./internals/temperature-window";

/**
 * The temperature window of a chain (docs/plan-format.md §12.6): the
 * intervals of resonator temperature offset within ±50 K (edges to 1 mK)
 * at which every error rule holds at the LO offset for every LO shift
 * within ±D, and the margin of ±Te inside it; the same as the result
 * document's `temperatureWindowK` and `temperatureMarginK`. The LO is the
 * chain's own unless `loOffsetGHz` is given. Throws when the chain does not
 * exist.
 */
export function temperatureWindow(plan: Plan, chainId: string, loOffsetGHz?: number): TemperatureWindow {
  const ctx = chainContext(plan, chainId);
  const L = loOffsetGHz ?? ctx.chain.loOffsetGHz;
  const ev = evaluateChain(ctx, L);
  return temperatureWindowAt(ctx, L, ev.findings, ev.channels);
}
