import type { Plan } from "@/schemas/plan";
import {
  type ChannelResult,
  type PreparedChain,
  type ResultDocument,
  checkPlan,
  evaluateAtOffset,
  prepareChain,
} from "@/lib/plan";

export interface Recheck {
  plan: Plan;
  result: ResultDocument;
}

/**
 * The plan with chain `chainId`'s LO moved to `loOffsetGHz`, and its result
 * document, computed from `previous` (the result of the same plan at any
 * other LO): only the moved chain is evaluated at the new offset; its
 * feasibility map and place are kept, because they do not depend on the LO
 * (docs/plan-format.md §6 "Feasibility map and place"). The result equals
 * `checkPlan` of the moved plan (tested). Pass `prepared` (the chain
 * prepared for this plan, any LO) to skip preparing it on every frame of a
 * drag.
 *
 * A plan with an observation schedule is checked whole: moving one chain's
 * LO changes the retunes of its schedule and so every scheduled chain's
 * duty cycle and NEΔT (docs/plan-format.md §13).
 */
export function recheckAtOffset(
  plan: Plan,
  previous: ResultDocument,
  chainId: string,
  loOffsetGHz: number,
  prepared: PreparedChain = prepareChain(plan, chainId),
): Recheck {
  const chains = plan.chains.map((c) => (c.id === chainId ? { ...c, loOffsetGHz } : c));
  const moved: Plan = { ...plan, chains };
  if (plan.lasers.some((l) => l.schedule)) return { plan: moved, result: checkPlan(moved) };
  const ev = evaluateAtOffset(prepared, loOffsetGHz);
  const fresh = new Map<string, ChannelResult>();
  for (const c of ev.channels) fresh.set(c.id, c);
  const result: ResultDocument = {
    format: previous.format,
    chains: previous.chains,
    channels: previous.channels.map((c) => fresh.get(c.id) ?? c),
    spurs: [],
    findings: [],
  };
  for (const c of plan.chains) {
    if (c.id === chainId) {
      result.spurs.push(...ev.spurs);
      result.findings.push(...ev.findings);
    } else {
      for (const s of previous.spurs) if (s.chain === c.id) result.spurs.push(s);
      for (const f of previous.findings) if (f.chain === c.id) result.findings.push(f);
    }
  }
  return { plan: moved, result };
}
