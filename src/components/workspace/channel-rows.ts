import type { Chain, Channel, ChannelResult, Finding, PlanResult } from "@/queries/types";
import { findingsForChannel, worstFinding, SEVERITY_RANK } from "./findings";
import { nedtStatus } from "./format";
import type { Cell } from "./table";

/** One line of the channels table: the stored channel joined with its chain and its latest check. */
export interface ChannelRow {
  channel: Channel;
  chainKey: string;
  /** RF passband(s) in GHz: one for SSB, two for DSB. */
  bandsGHz: [number, number][];
  sideband: "SSB" | "DSB";
  result: ChannelResult | null;
  nedt: ReturnType<typeof nedtStatus>;
  worst: Finding | null;
  findingCount: number;
}

export function rfBands(c: Pick<Channel, "centerGHz" | "bandwidthMHz" | "dsbOffsetGHz">): [number, number][] {
  const half = c.bandwidthMHz / 2000;
  if (c.dsbOffsetGHz === null) return [[c.centerGHz - half, c.centerGHz + half]];
  const d = c.dsbOffsetGHz;
  return [
    [c.centerGHz - d - half, c.centerGHz - d + half],
    [c.centerGHz + d - half, c.centerGHz + d + half],
  ];
}

export function buildChannelRows(
  channels: readonly Channel[],
  chains: readonly Chain[],
  result: PlanResult | null | undefined,
): ChannelRow[] {
  const chainKey = new Map(chains.map((c) => [c.id, c.key]));
  const byKey = new Map((result?.channels ?? []).map((r) => [r.id, r]));
  const findings = result?.findings ?? [];
  return channels.map((channel) => {
    const r = byKey.get(channel.key) ?? null;
    const own = findingsForChannel(findings, channel.key);
    return {
      channel,
      chainKey: chainKey.get(channel.chainId) ?? "?",
      bandsGHz: rfBands(channel),
      sideband: channel.dsbOffsetGHz === null ? "SSB" : "DSB",
      result: r,
      nedt: nedtStatus(r?.nedtK, channel.requiredNedtK),
      worst: worstFinding(own),
      findingCount: own.length,
    };
  });
}

export type ChannelSortKey =
  "key" | "center" | "sideband" | "chain" | "slot" | "image" | "bandwidth" | "nedt" | "margin" | "worst";

export function channelCell(row: ChannelRow, key: ChannelSortKey): Cell {
  switch (key) {
    case "key":
      return row.channel.key;
    case "center":
      return row.channel.centerGHz;
    case "sideband":
      return row.sideband;
    case "chain":
      return row.chainKey;
    case "slot":
      return row.result?.ifSlotGHz?.[0] ?? null;
    case "image":
      return row.result?.imageRejectionDB ?? null;
    case "bandwidth":
      return row.result?.radiometricBandwidthMHz ?? null;
    case "nedt":
      return row.result?.nedtK ?? null;
    case "margin":
      return row.nedt.marginK;
    case "worst":
      // 0 for a clean channel so it sorts before/after the others rather than with missing values.
      return row.worst ? SEVERITY_RANK[row.worst.severity] : 0;
  }
}

/** Words a free-text filter searches in a channel row. */
export function channelText(row: ChannelRow): Cell[] {
  return [row.channel.key, row.channel.name, row.chainKey, row.sideband, row.worst?.code, row.channel.centerGHz];
}
