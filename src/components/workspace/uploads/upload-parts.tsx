"use client";

import { useState } from "react";
import { ApiError } from "@/queries/api";
import { uploadFile } from "@/queries/upload";
import { confirmEditDuringReview, missionOfApplyingUpload } from "@/queries/edit-during-review";
import { ErrorNote } from "../ui";

// What the three uploads share: the send-and-wait state, its display, the
// file input and the input styles.

/** Where an upload stands. */
export type Phase =
  | { state: "idle" }
  | { state: "sending"; share: number | null }
  | { state: "error"; error: ApiError }
  | { state: "done"; message: string };

/** Upload progress and errors, shared by the three uploads. */
export function useUpload() {
  const [phase, setPhase] = useState<Phase>({ state: "idle" });
  const run = async <T,>(url: string, file: File): Promise<T | null> => {
    setPhase({ state: "sending", share: 0 });
    try {
      const applying = missionOfApplyingUpload(url);
      if (applying) await confirmEditDuringReview(applying);
      const out = await uploadFile<T>(url, file, (share) => setPhase({ state: "sending", share }));
      setPhase({ state: "idle" });
      return out;
    } catch (e) {
      setPhase({ state: "error", error: e instanceof ApiError ? e : new ApiError(0, "client", String(e)) });
      return null;
    }
  };
  return { phase, setPhase, run };
}

/** Upload progress, the refusal with its issues, or the outcome. */
export function Progress({ phase }: { phase: Phase }) {
  if (phase.state === "sending")
    return (
      <div role="status" className="flex items-center gap-2 text-sm text-ink-soft">
        <div className="h-1.5 w-40 overflow-hidden rounded bg-ink-faint">
          {phase.share === null ? (
            <div className="h-full w-1/3 animate-pulse bg-ink/60" />
          ) : (
            <div className="h-full bg-ink transition-all" style={{ width: `${Math.round(phase.share * 100)}%` }} />
          )}
        </div>
        {phase.share === null ? "Reading the file on the server…" : `Sending ${Math.round(phase.share * 100)} %`}
      </div>
    );
  if (phase.state === "error")
    return (
      <ErrorNote title={phase.error.status === 413 ? "The file is too large." : "The file was not accepted."}>
        <p>{phase.error.message}</p>
        {phase.error.issues.length > 0 ? (
          <ul className="mt-1 list-disc pl-5">
            {phase.error.issues.map((i, n) => (
              <li key={n}>
                {i.path ? <span className="font-mono">{i.path}: </span> : null}
                {i.message}
              </li>
            ))}
          </ul>
        ) : null}
        <p className="mt-1 text-xs">Nothing already saved was changed.</p>
      </ErrorNote>
    );
  if (phase.state === "done")
    return (
      <p role="status" className="text-sm text-sev-ok">
        {phase.message}
      </p>
    );
  return null;
}

/** A CSV file picker with its label. */
export function FileInput({ id, label, onFile }: { id: string; label: string; onFile: (f: File | null) => void }) {
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-medium">
        {label} <span className="font-normal text-ink-soft">(CSV file)</span>
      </label>
      <input
        id={id}
        type="file"
        accept=".csv,text/csv,text/plain"
        className="mt-0.5 text-sm"
        onChange={(e) => onFile(e.target.files?.[0] ?? null)}
      />
    </div>
  );
}

/** Styles of the uploads' small number inputs and selects. */
export const num = "w-28 rounded border border-ink/30 px-2 py-1 text-sm tabular-nums";
export const sel = "rounded border border-ink/30 bg-white px-2 py-1 text-sm";
