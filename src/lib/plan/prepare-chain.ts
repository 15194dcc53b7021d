import type { Plan } from "@/schemas/plan";
import { type ChainContext, chainContext } from "./internals/chain-context";

/**
 * One chain of a plan made ready for checks at many LO offsets: everything
 * that does not depend on the LO, worked out once. Read it only through
 * `evaluateAtOffset`; it stays valid while the plan's other fields stay the
 * same (the chain's own `loOffsetGHz` is not used).
 */
export interface PreparedChain {
  readonly chainId: string;
  /** The engine's L-independent figures of the chain (not part of the public contract). */
  readonly context: ChainContext;
}

/** Prepare chain `chainId` of `plan` for `evaluateAtOffset`. Throws when the chain, its laser, resonator or detector does not exist. */
export function prepareChain(plan: Plan, chainId: string): PreparedChain {
  return { chainId, context: chainContext(plan, chainId) };
}
