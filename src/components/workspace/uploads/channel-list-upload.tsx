"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { CHANNEL_COLUMNS } from "@/lib/imports";
import { api } from "@/queries/api";
import { invalidateMission } from "@/queries/missions";
import type { ChannelUploadPreview } from "@/queries/types";
import { formatGHz } from "../format";
import { buttonClass, Card } from "../ui";
import { FileInput, Progress, useUpload } from "./upload-parts";

/** The preview answers one page of rows (the first 200) with the counts of the whole file. */
type PagedPreview = ChannelUploadPreview & { total?: number; invalidRows?: number; firstInvalidRows?: number[] };

/** A channel list CSV: every row previewed with its problems; applied only when all rows are valid. */
export function ChannelListUpload({ missionId }: { missionId: string }) {
  const qc = useQueryClient();
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<PagedPreview | null>(null);
  const { phase, setPhase, run } = useUpload();
  const url = (apply: boolean) => `${api.collection(missionId, "uploads/channels")}?apply=${apply ? 1 : 0}`;
  const total = preview?.total ?? preview?.rows.length ?? 0;
  const bad = preview?.invalidRows ?? preview?.rows.filter((r) => r.errors.length > 0).length ?? 0;
  return (
    <Card title="Channel list">
      <p className="mb-2 text-sm text-ink-soft">
        A CSV with one channel per row and the columns{" "}
        {CHANNEL_COLUMNS.map((c, i) => (
          <span key={c}>
            {i ? ", " : ""}
            <code className="font-mono text-xs">{c}</code>
          </span>
        ))}{" "}
        (the chain by its plan id; DSB offset, gain stability and required NEΔT may be left out). Instead of the centre,
        offset and bandwidth numbers a row may give a <code className="font-mono text-xs">notation</code> column as
        channel tables write it (<code className="font-mono text-xs">183.31 ± 7.0</code>) and a{" "}
        <code className="font-mono text-xs">bandwidth</code> text column (
        <code className="font-mono text-xs">2 × 500 MHz</code>). Channels are matched by id: new ids are added, existing
        ones updated, others kept. Every row is checked; nothing is saved unless all rows are valid.
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <FileInput
          id="channels-file"
          label="Channel list"
          onFile={(f) => {
            setFile(f);
            setPreview(null);
            setPhase({ state: "idle" });
          }}
        />
        <button
          type="button"
          className={buttonClass.secondary}
          disabled={!file || phase.state === "sending"}
          onClick={async () => file && setPreview(await run<PagedPreview>(url(false), file))}
        >
          Preview
        </button>
      </div>
      <div className="mt-2">
        <Progress phase={phase} />
      </div>
      {preview ? (
        <div className="mt-3 space-y-2" data-testid="channels-preview">
          <p className="text-sm">
            {total} rows,{" "}
            {bad === 0 ? (
              <span className="text-sev-ok">all valid</span>
            ) : (
              <span className="text-sev-error">{bad} with errors</span>
            )}
            {preview.rows.length < total ? (
              <span className="text-ink-soft">
                {" "}
                (the first {preview.rows.length} shown
                {bad > 0 && preview.firstInvalidRows?.length
                  ? `; rows with errors: ${preview.firstInvalidRows.join(", ")}${bad > preview.firstInvalidRows.length ? ", …" : ""}`
                  : ""}
                )
              </span>
            ) : null}
          </p>
          <div className="max-h-96 overflow-auto rounded border border-ink/10">
            <table className="w-full text-sm">
              <thead className="sticky top-0 bg-white text-left text-xs text-ink-soft">
                <tr>
                  <th className="px-2 py-1">Row</th>
                  <th className="px-2 py-1">Id</th>
                  <th className="px-2 py-1">Name</th>
                  <th className="px-2 py-1">Chain</th>
                  <th className="px-2 py-1 text-right">Centre (GHz)</th>
                  <th className="px-2 py-1 text-right">Bandwidth (MHz)</th>
                  <th className="px-2 py-1">Problems</th>
                </tr>
              </thead>
              <tbody>
                {preview.rows.map((r) => (
                  <tr key={r.row} className={`border-t border-ink/10 align-top ${r.errors.length ? "bg-red-50" : ""}`}>
                    <td className="px-2 py-1 tabular-nums">{r.row}</td>
                    <td className="px-2 py-1">{r.channel?.key ?? "–"}</td>
                    <td className="px-2 py-1">{r.channel?.name ?? "–"}</td>
                    <td className="px-2 py-1">{r.channel?.chain ?? "–"}</td>
                    <td className="px-2 py-1 text-right tabular-nums">{formatGHz(r.channel?.centerGHz)}</td>
                    <td className="px-2 py-1 text-right tabular-nums">{r.channel?.bandwidthMHz ?? "–"}</td>
                    <td className="px-2 py-1 text-sev-error">
                      {r.errors.map((e, n) => (
                        <div key={n}>
                          <span className="font-mono text-xs">{e.column}</span>: {e.message}
                        </div>
                      ))}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <button
            type="button"
            className={buttonClass.primary}
            disabled={!preview.valid || phase.state === "sending"}
            title={preview.valid ? undefined : "Fix the rows with errors first"}
            onClick={async () => {
              if (!file) return;
              const out = await run<unknown>(url(true), file);
              if (out) {
                await invalidateMission(qc, missionId);
                setPreview(null);
                setPhase({
                  state: "done",
                  message: `${total} channel rows applied; the plan was re-checked.`,
                });
              }
            }}
          >
            Apply {total} {total === 1 ? "row" : "rows"}
          </button>
          {!preview.valid ? (
            <p className="text-xs text-ink-soft">
              Fix the rows marked in red in the file and preview it again; nothing has been saved.
            </p>
          ) : null}
        </div>
      ) : null}
    </Card>
  );
}
