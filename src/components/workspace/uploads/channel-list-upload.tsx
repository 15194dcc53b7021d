"use client";

import { CHANNEL_COLUMNS } from "@/lib/imports";
import { api } from "@/queries/api";
import type { ChannelUploadPreview } from "@/queries/types";
import { formatGHz } from "../format";
import { PreviewApplyUpload } from "./preview-apply-upload";

/** The preview answers one page of rows (the first 200) with the counts of the whole file. */
type PagedPreview = ChannelUploadPreview & { total?: number; invalidRows?: number; firstInvalidRows?: number[] };

const total = (p: PagedPreview) => p.total ?? p.rows.length;
const bad = (p: PagedPreview) => p.invalidRows ?? p.rows.filter((r) => r.errors.length > 0).length;

/** A channel list CSV: every row previewed with its problems; applied only when all rows are valid. */
export function ChannelListUpload({ missionId }: { missionId: string }) {
  return (
    <PreviewApplyUpload<PagedPreview, string>
      missionId={missionId}
      title="Channel list"
      intro={
        <>
          A CSV with one channel per row and the columns{" "}
          {CHANNEL_COLUMNS.map((c, i) => (
            <span key={c}>
              {i ? ", " : ""}
              <code className="font-mono text-xs">{c}</code>
            </span>
          ))}{" "}
          (the chain by its plan id; DSB offset, gain stability and required NEΔT may be left out). Instead of the
          centre, offset and bandwidth numbers a row may give a <code className="font-mono text-xs">notation</code>{" "}
          column as channel tables write it (<code className="font-mono text-xs">183.31 ± 7.0</code>) and a{" "}
          <code className="font-mono text-xs">bandwidth</code> text column (
          <code className="font-mono text-xs">2 × 500 MHz</code>). Channels are matched by id: new ids are added,
          existing ones updated, others kept. Every row is checked; nothing is saved unless all rows are valid.
        </>
      }
      fileId="channels-file"
      fileLabel="Channel list"
      url={(apply) => `${api.collection(missionId, "uploads/channels")}?apply=${apply ? 1 : 0}`}
      target={missionId}
      testId="channels-preview"
      preview={(preview) => {
        const n = total(preview);
        const b = bad(preview);
        return (
          <>
            <p className="text-sm">
              {n} rows,{" "}
              {b === 0 ? (
                <span className="text-sev-ok">all valid</span>
              ) : (
                <span className="text-sev-error">{b} with errors</span>
              )}
              {preview.rows.length < n ? (
                <span className="text-ink-soft">
                  {" "}
                  (the first {preview.rows.length} shown
                  {b > 0 && preview.firstInvalidRows?.length
                    ? `; rows with errors: ${preview.firstInvalidRows.join(", ")}${b > preview.firstInvalidRows.length ? ", …" : ""}`
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
                    <tr
                      key={r.row}
                      className={`border-t border-ink/10 align-top ${r.errors.length ? "bg-red-50" : ""}`}
                    >
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
          </>
        );
      }}
      apply={{
        label: (preview) => `Apply ${total(preview)} ${total(preview) === 1 ? "row" : "rows"}`,
        done: (preview) => `${total(preview)} channel rows applied; the plan was re-checked.`,
        disabled: (preview) => !preview.valid,
        title: (preview) => (preview.valid ? undefined : "Fix the rows with errors first"),
      }}
      after={(preview) =>
        !preview.valid ? (
          <p className="text-xs text-ink-soft">
            Fix the rows marked in red in the file and preview it again; nothing has been saved.
          </p>
        ) : null
      }
    />
  );
}
