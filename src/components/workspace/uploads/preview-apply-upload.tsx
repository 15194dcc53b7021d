"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { invalidateMission } from "@/queries/missions";
import { buttonClass, Card } from "../ui";
import { FileInput, num, Progress, sel, useUpload } from "./upload-parts";

/** The apply step of an upload: its button and the message once applied. */
export interface ApplyStep<P, T> {
  label: (preview: P, target: T) => string;
  done: (preview: P, target: T) => string;
  disabled?: (preview: P) => boolean;
  /** The button's tooltip while it is disabled for a reason worth saying. */
  title?: (preview: P) => string | undefined;
}

/**
 * The one flow of every workspace upload: pick a file (and the upload's own
 * controls), preview what the server reads from it, then apply the same file
 * and re-check the plan. Changing the file or a control drops the preview.
 * `target` is what the upload applies to (a laser pair, a detector); while it
 * is missing nothing can be previewed.
 */
export function PreviewApplyUpload<P, T>({
  missionId,
  title,
  intro,
  fileId,
  fileLabel,
  url,
  target,
  controls,
  missing,
  testId,
  preview: show,
  apply,
  after,
}: {
  missionId: string;
  title: string;
  intro: ReactNode;
  fileId: string;
  fileLabel: string;
  /** The upload route, previewing or applying. */
  url: (apply: boolean) => string;
  target: T | null | undefined;
  /** The upload's own inputs; `drop` drops the preview when one changes. */
  controls?: (drop: () => void) => ReactNode;
  /** Shown when there is nothing to apply to. */
  missing?: ReactNode;
  testId: string;
  preview: (preview: P, target: T) => ReactNode;
  apply: ApplyStep<P, T>;
  /** Shown below the apply button. */
  after?: (preview: P) => ReactNode;
}) {
  const qc = useQueryClient();
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<P | null>(null);
  const { phase, setPhase, run } = useUpload();
  const sending = phase.state === "sending";
  return (
    <Card title={title}>
      <p className="mb-2 text-sm text-ink-soft">{intro}</p>
      <div className="flex flex-wrap items-end gap-3">
        {controls?.(() => setPreview(null))}
        <FileInput
          id={fileId}
          label={fileLabel}
          onFile={(f) => {
            setFile(f);
            setPreview(null);
            setPhase({ state: "idle" });
          }}
        />
        <button
          type="button"
          className={buttonClass.secondary}
          disabled={!file || target == null || sending}
          onClick={async () => file && setPreview(await run<P>(url(false), file))}
        >
          Preview
        </button>
      </div>
      {missing ? <p className="mt-2 text-sm text-ink-soft">{missing}</p> : null}
      <div className="mt-2">
        <Progress phase={phase} />
      </div>
      {preview && target != null ? (
        <div className="mt-3 space-y-2" data-testid={testId}>
          {show(preview, target)}
          <button
            type="button"
            className={buttonClass.primary}
            disabled={sending || (apply.disabled?.(preview) ?? false)}
            title={apply.title?.(preview)}
            onClick={async () => {
              if (!file) return;
              const out = await run<unknown>(url(true), file);
              if (out) {
                await invalidateMission(qc, missionId);
                setPreview(null);
                setPhase({ state: "done", message: apply.done(preview, target) });
              }
            }}
          >
            {apply.label(preview, target)}
          </button>
          {after?.(preview)}
        </div>
      ) : null}
    </Card>
  );
}

/** A select of the mission's rows of one kind, by key. */
export function RowSelect({
  label,
  rows,
  value,
  onChange,
}: {
  label: string;
  rows: { id: string; key: string }[];
  value: string;
  onChange: (id: string) => void;
}) {
  return (
    <label className="text-sm font-medium">
      {label}{" "}
      <select className={sel} value={value} onChange={(e) => onChange(e.target.value)}>
        {rows.map((r) => (
          <option key={r.id} value={r.id}>
            {r.key}
          </option>
        ))}
      </select>
    </label>
  );
}

/** A small non-negative number input with its label. */
export function NumberInput({
  label,
  value,
  onChange,
}: {
  label: string;
  value: string;
  onChange: (v: string) => void;
}) {
  return (
    <label className="text-sm font-medium">
      {label}{" "}
      <input
        className={num}
        type="number"
        min="0"
        step="any"
        value={value}
        onChange={(e) => onChange(e.target.value)}
      />
    </label>
  );
}
