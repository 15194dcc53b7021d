"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { api } from "@/queries/api";
import { invalidateMission, useCollectionQuery } from "@/queries/missions";
import type { TuningPreview } from "@/queries/types";
import { formatInterval } from "../format";
import { mergedCoverage } from "../intervals";
import { buttonClass, Card } from "../ui";
import { ReachStrip } from "./reach-strip";
import { FileInput, num, Progress, sel, useUpload } from "./upload-parts";

/** A measured tuning map: previewed as merged reach intervals beside the current reach, then applied to the laser pair. */
export function TuningMapUpload({ missionId }: { missionId: string }) {
  const lasers = useCollectionQuery(missionId, "lasers");
  const qc = useQueryClient();
  const [laserId, setLaserId] = useState("");
  const [gapMHz, setGapMHz] = useState("50");
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<TuningPreview | null>(null);
  const { phase, setPhase, run } = useUpload();
  const laser = lasers.data?.find((l) => l.id === (laserId || lasers.data?.[0]?.id));
  const url = (apply: boolean) =>
    `${api.collection(missionId, "uploads/tuning-map")}?laserId=${encodeURIComponent(laser?.id ?? "")}&gapMHz=${encodeURIComponent(gapMHz)}&apply=${apply ? 1 : 0}`;
  const rejected = preview ? preview.rejectedRows.length : 0;
  return (
    <Card title="Tuning map (measured LO offsets)">
      <p className="mb-2 text-sm text-ink-soft">
        A CSV with a header row and an <code className="font-mono text-xs">offsetGHz</code> column: the measured LO
        offsets that laser 2 reached (other columns are ignored; a blank offset marks a setpoint with no measurement).
        Offsets closer than the gap are joined into one reachable interval; the preview shows the intervals before they
        replace the laser pair&apos;s reach.
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <label className="text-sm font-medium">
          Laser pair{" "}
          <select
            className={sel}
            value={laser?.id ?? ""}
            onChange={(e) => {
              setLaserId(e.target.value);
              setPreview(null);
            }}
          >
            {(lasers.data ?? []).map((l) => (
              <option key={l.id} value={l.id}>
                {l.key}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm font-medium">
          Largest gap joined (MHz){" "}
          <input
            className={num}
            type="number"
            min="0"
            step="any"
            value={gapMHz}
            onChange={(e) => {
              setGapMHz(e.target.value);
              setPreview(null);
            }}
          />
        </label>
        <FileInput
          id="tuning-file"
          label="Measured offsets"
          onFile={(f) => {
            setFile(f);
            setPreview(null);
            setPhase({ state: "idle" });
          }}
        />
        <button
          type="button"
          className={buttonClass.secondary}
          disabled={!file || !laser || phase.state === "sending"}
          onClick={async () => file && setPreview(await run<TuningPreview>(url(false), file))}
        >
          Preview
        </button>
      </div>
      {lasers.data && lasers.data.length === 0 ? (
        <p className="mt-2 text-sm text-ink-soft">Add a laser pair first.</p>
      ) : null}
      <div className="mt-2">
        <Progress phase={phase} />
      </div>
      {preview && laser ? (
        <div className="mt-3 space-y-2" data-testid="tuning-preview">
          <p className="text-sm">
            {preview.points} points → {preview.intervals.length} interval{preview.intervals.length === 1 ? "" : "s"}
            {rejected ? (
              <span className="text-sev-warning">
                {" "}
                · {rejected} row{rejected === 1 ? "" : "s"} without a measurement
              </span>
            ) : null}
            {preview.isolatedGHz && preview.isolatedGHz.length > 0 ? (
              <span className="text-sev-warning">
                {" "}
                · {preview.isolatedGHz.length} isolated offset{preview.isolatedGHz.length === 1 ? "" : "s"} left out (no
                neighbour within the gap)
              </span>
            ) : null}
          </p>
          <ReachStrip current={mergedCoverage(laser.reach)} next={preview.intervals} />
          <ul className="text-sm tabular-nums">
            {preview.intervals.map((i, n) => (
              <li key={n}>{formatInterval([i.minGHz, i.maxGHz])}</li>
            ))}
          </ul>
          {preview.rejectedRows.length > 0 ? (
            <ul className="text-xs text-sev-warning">
              {preview.rejectedRows.slice(0, 20).map((r) => (
                <li key={r.row}>
                  row {r.row}: {r.message}
                </li>
              ))}
            </ul>
          ) : null}
          <button
            type="button"
            className={buttonClass.primary}
            disabled={phase.state === "sending" || preview.intervals.length === 0}
            onClick={async () => {
              if (!file) return;
              const out = await run<unknown>(url(true), file);
              if (out) {
                await invalidateMission(qc, missionId);
                setPreview(null);
                setPhase({ state: "done", message: `Reach of ${laser.key} replaced; the plan was re-checked.` });
              }
            }}
          >
            Replace the reach of {laser.key}
          </button>
        </div>
      ) : null}
    </Card>
  );
}
