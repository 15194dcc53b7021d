import { SEVERITIES } from "@/lib/plan";
import type { Finding, Severity } from "@/queries/types";

export { SEVERITIES };

/** error > warning > info; higher rank is worse (the engine lists its severities worst first). */
export const SEVERITY_RANK = Object.fromEntries(SEVERITIES.map((s, i) => [s, SEVERITIES.length - i])) as Readonly<
  Record<Severity, number>
>;

/** The worst finding of a list (first of equal severity, i.e. engine order), or null. */
export function worstFinding(findings: readonly Finding[]): Finding | null {
  let worst: Finding | null = null;
  for (const f of findings) if (!worst || SEVERITY_RANK[f.severity] > SEVERITY_RANK[worst.severity]) worst = f;
  return worst;
}

export function countBySeverity(findings: readonly Finding[]): Record<Severity, number> {
  const out: Record<Severity, number> = { error: 0, warning: 0, info: 0 };
  for (const f of findings) out[f.severity] += 1;
  return out;
}

export interface FindingGroup {
  chain: string;
  /** Findings of the chain itself (channel null). */
  chainFindings: Finding[];
  channels: { channel: string; findings: Finding[] }[];
}

/**
 * Groups findings by chain and then channel, keeping the engine's order
 * (chains in input order, chain-level findings first, channels in order of
 * first appearance). A pair finding (slot-overlap) sits under its first channel.
 */
export function groupFindings(findings: readonly Finding[]): FindingGroup[] {
  const groups: FindingGroup[] = [];
  const byChain = new Map<string, FindingGroup>();
  for (const f of findings) {
    let g = byChain.get(f.chain);
    if (!g) {
      g = { chain: f.chain, chainFindings: [], channels: [] };
      byChain.set(f.chain, g);
      groups.push(g);
    }
    if (f.channel === null) {
      g.chainFindings.push(f);
      continue;
    }
    let c = g.channels.find((x) => x.channel === f.channel);
    if (!c) {
      c = { channel: f.channel, findings: [] };
      g.channels.push(c);
    }
    c.findings.push(f);
  }
  return groups;
}

/** Findings of one channel, including pair findings that name it as the other channel. */
export function findingsForChannel(findings: readonly Finding[], channelKey: string): Finding[] {
  return findings.filter(
    (f) => f.channel === channelKey || (f.data && (f.data as { other?: unknown }).other === channelKey),
  );
}
