"use client";

import { useMemo, useState } from "react";
import { laneTableRows, type LaneModel } from "@/lib/lanes";

/** The table view: the same rows as the chart's data model, for screen readers and copy-paste. */
export function LaneTable({ model }: { model: LaneModel }) {
  const rows = useMemo(() => laneTableRows(model), [model]);
  const [lane, setLane] = useState("all");
  const shown = lane === "all" ? rows : rows.filter((r) => r.lane === lane);
  const tsv = useMemo(
    () =>
      ["lane\tkind\tlabel\tfrom GHz\tto GHz\tchain\tchannel\tfamily\torder\tseverity\tcodes\tfacts"]
        .concat(
          shown.map((r) =>
            [
              r.lane,
              r.kind,
              r.label,
              r.fromGHz,
              r.toGHz,
              r.chain,
              r.channel,
              r.family,
              r.order,
              r.severity,
              r.codes,
              r.facts,
            ].join("\t"),
          ),
        )
        .join("\n"),
    [shown],
  );
  return (
    <div data-testid="lane-table">
      <div className="mb-2 flex flex-wrap items-center gap-3 text-sm">
        <label className="flex items-center gap-2">
          Lane
          <select
            className="rounded border border-ink-faint px-2 py-1"
            value={lane}
            onChange={(e) => setLane(e.target.value)}
          >
            <option value="all">all lanes</option>
            {model.lanes.map((l) => (
              <option key={l.id} value={l.id}>
                {l.title}
              </option>
            ))}
          </select>
        </label>
        <span className="text-ink-soft">{shown.length} rows</span>
        <button
          type="button"
          className="rounded border border-ink-faint px-2 py-1 hover:bg-ink-faint"
          onClick={() => void navigator.clipboard?.writeText(tsv)}
        >
          Copy as tab-separated text
        </button>
      </div>
      <div className="max-h-[32rem] overflow-auto rounded border border-ink-faint">
        <table className="w-full border-collapse text-xs">
          <caption className="sr-only">
            Every item of the lane view, one row each, with its frequencies and findings
          </caption>
          <thead className="sticky top-0 bg-white">
            <tr className="text-left">
              {[
                "Lane",
                "Kind",
                "Item",
                "From (GHz)",
                "To (GHz)",
                "Chain",
                "Channel",
                "Family",
                "Order",
                "Severity",
                "Codes",
                "Numbers",
              ].map((h) => (
                <th key={h} scope="col" className="border-b border-ink-faint px-2 py-1 font-semibold">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {shown.map((r) => (
              <tr key={r.id} className="odd:bg-[#f7faf9]" data-row={r.id}>
                <td className="px-2 py-0.5">{r.lane}</td>
                <td className="px-2 py-0.5">{r.kind}</td>
                <th scope="row" className="px-2 py-0.5 text-left font-normal">
                  {r.label}
                </th>
                <td className="px-2 py-0.5 text-right tabular-nums">{r.fromGHz.toFixed(6)}</td>
                <td className="px-2 py-0.5 text-right tabular-nums">{r.toGHz.toFixed(6)}</td>
                <td className="px-2 py-0.5">{r.chain}</td>
                <td className="px-2 py-0.5">{r.channel}</td>
                <td className="px-2 py-0.5">{r.family}</td>
                <td className="px-2 py-0.5">{r.order}</td>
                <td className="px-2 py-0.5">{r.severity}</td>
                <td className="px-2 py-0.5">{r.codes}</td>
                <td className="px-2 py-0.5">{r.facts}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
