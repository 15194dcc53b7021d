import type { Plan } from "@/schemas/plan";
import { chainContext } from "./internals/chain-context";
import { evaluateChain } from "./internals/evaluate-chain";
import { pair } from "./internals/format";
import { feasibilityMap } from "./feasibility-map";
import { placeLo } from "./place-lo";
import {
  type ChainResult,
  type ChannelResult,
  type Finding,
  RESULT_FORMAT,
  type ResultDocument,
  type Spur,
} from "./types";

/** A JSON-safe number: non-finite values (only reachable with absurd inputs) become null. */
function finite(v: number | null): number | null {
  return v !== null && Number.isFinite(v) ? v : null;
}

/**
 * Check a parsed plan and build the whole `heterolane.result/1` document
 * (plan-format.md, "Result document"): per chain the linewidth,
 * photodiode power, feasibility map and place; per channel the IF figures;
 * every kept spur; every finding in contract order.
 */
export function checkPlan(plan: Plan): ResultDocument {
  const chains: ChainResult[] = [];
  const byChannelId = new Map<string, ChannelResult>();
  const spurs: Spur[] = [];
  const findings: Finding[] = [];
  for (const chain of plan.chains) {
    const ctx = chainContext(plan, chain.id);
    const evaluation = evaluateChain(ctx, chain.loOffsetGHz);
    const map = feasibilityMap(plan, chain.id);
    const place = placeLo(plan, chain.id, map.feasibleGHz);
    chains.push({
      id: chain.id,
      linewidthMHz: ctx.delta * 1000,
      pdInputMW: ctx.pdMW,
      // the map's arrays are built fresh for this call and owned by nobody else
      feasibleGHz: map.feasibleGHz,
      excludedGHz: map.excludedGHz,
      placeGHz: place.placeGHz,
      placeReason: place.placeReason,
    });
    for (const c of evaluation.channels) {
      byChannelId.set(c.ch.channel.id, {
        id: c.ch.channel.id,
        ifSlotGHz: c.geo ? pair(c.geo.slot) : null,
        occupiedGHz: c.geo ? pair(c.geo.occupied) : null,
        imageGHz: c.image ? pair(c.image.imageGHz) : null,
        imageRejectionDB: c.image ? finite(c.image.rejectionDB) : null,
        radiometricBandwidthMHz: c.sensitivity ? finite(c.sensitivity.radiometricBandwidthMHz) : null,
        nedtK: c.sensitivity ? finite(c.sensitivity.nedtK) : null,
        lockReplicaDB: c.ch.lockReplicaDB,
      });
    }
    spurs.push(...evaluation.spurs);
    findings.push(...evaluation.findings);
  }
  const channels: ChannelResult[] = [];
  for (const channel of plan.channels) {
    const r = byChannelId.get(channel.id);
    if (r) channels.push(r);
  }
  return { format: RESULT_FORMAT, chains, channels, spurs, findings };
}
