"use client";

import { WaivedMark, waiverOf, type WaiverMap } from "@/components/waivers";
import { useMemo, useState } from "react";
import type { Chain, Channel, PlanResult } from "@/queries/types";
import { buildChannelRows, channelCell, channelText, type ChannelRow, type ChannelSortKey } from "./channel-rows";
import { formatDB, formatGHz, formatInterval, formatK, formatMHz } from "./format";
import { filterByText, filterByValue, nextSort, sortRows, type SortState } from "./table";
import { buttonClass, Empty, SeverityBadge } from "./ui";

const COLUMNS: { key: ChannelSortKey; label: string; unit?: string; align?: "right" }[] = [
  { key: "key", label: "Channel" },
  { key: "center", label: "RF band", unit: "GHz" },
  { key: "sideband", label: "SSB/DSB" },
  { key: "chain", label: "Chain" },
  { key: "slot", label: "IF slot", unit: "GHz" },
  { key: "image", label: "Image", unit: "GHz · rejection dB" },
  { key: "bandwidth", label: "Radiometric BW", unit: "MHz", align: "right" },
  { key: "nedt", label: "NEΔT / required", unit: "K", align: "right" },
  { key: "worst", label: "Worst finding" },
];

export function ChannelsTable({
  resultPending = false,
  channels,
  chains,
  result,
  canEdit,
  onEdit,
  onSelect,
  waivers,
}: {
  /** True while the latest check is still loading: its columns show an ellipsis, not "no slot". */
  resultPending?: boolean;
  channels: Channel[];
  chains: Chain[];
  result: PlanResult | null | undefined;
  canEdit: boolean;
  onEdit: (c: Channel) => void;
  onSelect?: (key: string) => void;
  /** Recorded waivers by finding key: a waived worst finding is marked as such. */
  waivers?: WaiverMap;
}) {
  const [sort, setSort] = useState<SortState<ChannelSortKey>>({ key: "center", dir: "asc" });
  const [query, setQuery] = useState("");
  const [chain, setChain] = useState("");
  const [band, setBand] = useState("");
  const [severity, setSeverity] = useState("");
  const rows = useMemo(() => buildChannelRows(channels, chains, result), [channels, chains, result]);
  const shown = useMemo(() => {
    let r = filterByText(rows, query, channelText);
    r = filterByValue(r, chain, (x) => x.chainKey);
    r = filterByValue(r, band, (x) => x.sideband);
    r = filterByValue(r, severity, (x) => x.worst?.severity ?? "none");
    return sortRows(r, sort, channelCell);
  }, [rows, query, chain, band, severity, sort]);

  const select = "rounded border border-ink/30 bg-white px-2 py-1 text-sm";
  return (
    <div>
      <div className="mb-2 flex flex-wrap items-end gap-2" role="search" aria-label="Filter channels">
        <label className="text-xs text-ink-soft">
          Search
          <input
            value={query}
            onChange={(e) => setQuery(e.target.value)}
            placeholder="id, name, code…"
            className="ml-1 w-44 rounded border border-ink/30 px-2 py-1 text-sm text-ink"
          />
        </label>
        <label className="text-xs text-ink-soft">
          Chain{" "}
          <select value={chain} onChange={(e) => setChain(e.target.value)} className={select}>
            <option value="">all</option>
            {chains.map((c) => (
              <option key={c.id} value={c.key}>
                {c.key}
              </option>
            ))}
          </select>
        </label>
        <label className="text-xs text-ink-soft">
          Sidebands{" "}
          <select value={band} onChange={(e) => setBand(e.target.value)} className={select}>
            <option value="">all</option>
            <option value="SSB">SSB</option>
            <option value="DSB">DSB</option>
          </select>
        </label>
        <label className="text-xs text-ink-soft">
          Worst finding{" "}
          <select value={severity} onChange={(e) => setSeverity(e.target.value)} className={select}>
            <option value="">any</option>
            <option value="error">error</option>
            <option value="warning">warning</option>
            <option value="info">info</option>
            <option value="none">none</option>
          </select>
        </label>
        <span className="ml-auto text-xs text-ink-soft" aria-live="polite">
          {shown.length} of {rows.length} channels
        </span>
      </div>
      {rows.length === 0 ? (
        <Empty>No channels yet.{canEdit ? " Add one, or upload a channel list." : ""}</Empty>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full border-collapse text-sm" data-testid="channels-table">
            <thead>
              <tr className="border-b border-ink/20 text-left text-xs text-ink-soft">
                {COLUMNS.map((c) => {
                  const active = sort.key === c.key;
                  return (
                    <th
                      key={c.key}
                      scope="col"
                      aria-sort={active ? (sort.dir === "asc" ? "ascending" : "descending") : "none"}
                      className={`whitespace-nowrap px-2 py-1.5 font-medium ${c.align === "right" ? "text-right" : ""}`}
                    >
                      <button
                        type="button"
                        className="inline-flex items-center gap-1 hover:text-ink"
                        onClick={() => setSort(nextSort(sort, c.key))}
                      >
                        <span>
                          {c.label}
                          {c.unit ? <span className="font-normal"> ({c.unit})</span> : null}
                        </span>
                        <span aria-hidden className={active ? "text-ink" : "text-transparent"}>
                          {sort.dir === "asc" ? "▲" : "▼"}
                        </span>
                      </button>
                    </th>
                  );
                })}
                {canEdit ? <th className="px-2" aria-label="Actions" /> : null}
              </tr>
            </thead>
            <tbody>
              {shown.map((row) => (
                <ChannelTr
                  key={row.channel.id}
                  row={row}
                  pending={resultPending}
                  canEdit={canEdit}
                  onEdit={onEdit}
                  onSelect={onSelect}
                  waivers={waivers}
                />
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}

function ChannelTr({
  row,
  pending,
  canEdit,
  onEdit,
  onSelect,
  waivers,
}: {
  row: ChannelRow;
  pending: boolean;
  canEdit: boolean;
  onEdit: (c: Channel) => void;
  onSelect?: (key: string) => void;
  waivers?: WaiverMap;
}) {
  const r = row.result;
  const waiver = row.worst ? waiverOf(row.worst, waivers) : null;
  const nedtClass =
    row.nedt.state === "unmet" ? "text-sev-error font-semibold" : row.nedt.state === "met" ? "text-sev-ok" : "";
  return (
    <tr className="border-b border-ink/10 align-top hover:bg-ink-faint/50" data-channel={row.channel.key}>
      <td className="min-w-[11rem] px-2 py-1.5">
        <div className="font-medium">{row.channel.key}</div>
        <div className="text-xs text-ink-soft">{row.channel.name}</div>
      </td>
      <td className="whitespace-nowrap px-2 py-1.5 tabular-nums">
        {row.bandsGHz.map(([lo, hi]) => (
          <div key={lo}>
            {formatGHz(lo)}–{formatGHz(hi)}
          </div>
        ))}
      </td>
      <td className="px-2 py-1.5">{row.sideband}</td>
      <td className="px-2 py-1.5">{row.chainKey}</td>
      <td className="whitespace-nowrap px-2 py-1.5 tabular-nums">
        {r?.ifSlotGHz ? formatInterval(r.ifSlotGHz, "") : pending ? "…" : "no slot"}
      </td>
      <td className="whitespace-nowrap px-2 py-1.5 tabular-nums">
        {r?.imageGHz ? (
          <>
            <div>{formatInterval(r.imageGHz, "")}</div>
            <div className="text-xs text-ink-soft">
              {r.imageRejectionDB === null ? "fully rejected" : `${formatDB(r.imageRejectionDB)} dB`}
            </div>
          </>
        ) : (
          "–"
        )}
      </td>
      <td className="px-2 py-1.5 text-right tabular-nums">{formatMHz(r?.radiometricBandwidthMHz, 2)}</td>
      <td className={`whitespace-nowrap px-2 py-1.5 text-right tabular-nums ${nedtClass}`} data-testid="nedt">
        {formatK(r?.nedtK)} / {row.channel.requiredNedtK === null ? "none" : formatK(row.channel.requiredNedtK)}
      </td>
      <td className="px-2 py-1.5" data-testid="worst-finding">
        {waiver ? (
          <span className="float-right ml-1">
            <WaivedMark waiver={waiver} />
          </span>
        ) : null}
        {row.worst ? (
          <button
            type="button"
            className="flex items-center gap-1.5 whitespace-nowrap text-left hover:underline"
            onClick={() => onSelect?.(row.channel.key)}
            title={row.worst.message}
          >
            <SeverityBadge severity={row.worst.severity} />
            <span className="font-mono text-xs">{row.worst.code}</span>
            {row.findingCount > 1 ? <span className="text-xs text-ink-soft">+{row.findingCount - 1}</span> : null}
          </button>
        ) : pending ? (
          <span className="text-xs text-ink-soft">checking…</span>
        ) : (
          <span className="text-xs text-sev-ok">no findings</span>
        )}
      </td>
      {canEdit ? (
        <td className="px-2 py-1.5 text-right">
          <button
            type="button"
            className={buttonClass.quiet}
            onClick={() => onEdit(row.channel)}
            aria-label={`Edit channel ${row.channel.key}`}
          >
            Edit
          </button>
        </td>
      ) : null}
    </tr>
  );
}
