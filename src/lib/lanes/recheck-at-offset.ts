import type { Plan } from "@/schemas/plan";
import type { ChannelResult, ResultDocument } from "@/lib/plan";
// The engine's per-offset evaluation: the plan engine documents this pair
// (chainContext once, evaluateChain per offset) as the way to check many
// offsets of one chain; see docs/decisions (lane view live re-check).
import { type ChainContext, chainContext } from "@/lib/plan/internals/chain-context";
import { evaluateChain } from "@/lib/plan/internals/evaluate-chain";

export interface Recheck {
  plan: Plan;
  result: ResultDocument;
}

const finite = (v: number | null): number | null => (v !== null && Number.isFinite(v) ? v : null);

/**
 * The plan with chain `chainId`'s LO moved to `loOffsetGHz`, and its result
 * document, computed from `previous` (the result of the same plan at any
 * other LO): only the moved chain is evaluated at the new offset; its
 * feasibility map and place are kept, because they do not depend on the LO
 * (plan-format.md, "Feasibility map and place"). The result equals
 * `checkPlan` of the moved plan (tested). Pass `ctx` (the chain's context
 * for this plan, any LO) to skip rebuilding it on every frame of a drag.
 */
export function recheckAtOffset(
  plan: Plan,
  previous: ResultDocument,
  chainId: string,
  loOffsetGHz: number,
  ctx: ChainContext = chainContext(plan, chainId),
): Recheck {
  const chains = plan.chains.map((c) => (c.id === chainId ? { ...c, loOffsetGHz } : c));
  const moved: Plan = { ...plan, chains };
  const ev = evaluateChain(ctx, loOffsetGHz);
  const fresh = new Map<string, ChannelResult>();
  for (const c of ev.channels) {
    fresh.set(c.ch.channel.id, {
      id: c.ch.channel.id,
      ifSlotGHz: c.geo ? [c.geo.slot[0], c.geo.slot[1]] : null,
      occupiedGHz: c.geo ? [c.geo.occupied[0], c.geo.occupied[1]] : null,
      imageGHz: c.image ? [c.image.imageGHz[0], c.image.imageGHz[1]] : null,
      imageRejectionDB: c.image ? finite(c.image.rejectionDB) : null,
      radiometricBandwidthMHz: c.sensitivity ? finite(c.sensitivity.radiometricBandwidthMHz) : null,
      nedtK: c.sensitivity ? finite(c.sensitivity.nedtK) : null,
      lockReplicaDB: c.ch.lockReplicaDB,
    });
  }
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
