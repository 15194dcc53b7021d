"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { api } from "@/queries/api";
import { invalidateMission, useCollectionQuery } from "@/queries/missions";
import type { DetectorResponsePreview } from "@/queries/types";
import { formatDB, formatInterval } from "../format";
import { buttonClass, Card } from "../ui";
import { FileInput, num, Progress, sel, useUpload } from "./upload-parts";

/** A measured detector response: the usable band within the chosen drop below the peak, then set as the detector's IF band. */
export function DetectorResponseUpload({ missionId }: { missionId: string }) {
  const detectors = useCollectionQuery(missionId, "detectors");
  const qc = useQueryClient();
  const [detectorId, setDetectorId] = useState("");
  const [dropDB, setDropDB] = useState("3");
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<DetectorResponsePreview | null>(null);
  const { phase, setPhase, run } = useUpload();
  const det = detectors.data?.find((d) => d.id === (detectorId || detectors.data?.[0]?.id));
  const url = (apply: boolean) =>
    `${api.collection(missionId, "uploads/detector-response")}?detectorId=${encodeURIComponent(det?.id ?? "")}&dropDB=${encodeURIComponent(dropDB)}&apply=${apply ? 1 : 0}`;
  return (
    <Card title="Detector response">
      <p className="mb-2 text-sm text-ink-soft">
        A CSV with the columns <code className="font-mono text-xs">frequencyGHz</code> and{" "}
        <code className="font-mono text-xs">responseDB</code>: the measured response of photodiode and IF chain. The
        usable band is where the response stays within the chosen drop below its peak.
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <label className="text-sm font-medium">
          Detector{" "}
          <select
            className={sel}
            value={det?.id ?? ""}
            onChange={(e) => {
              setDetectorId(e.target.value);
              setPreview(null);
            }}
          >
            {(detectors.data ?? []).map((d) => (
              <option key={d.id} value={d.id}>
                {d.key}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm font-medium">
          Drop below peak (dB){" "}
          <input
            className={num}
            type="number"
            min="0"
            step="any"
            value={dropDB}
            onChange={(e) => {
              setDropDB(e.target.value);
              setPreview(null);
            }}
          />
        </label>
        <FileInput
          id="detector-file"
          label="Measured response"
          onFile={(f) => {
            setFile(f);
            setPreview(null);
            setPhase({ state: "idle" });
          }}
        />
        <button
          type="button"
          className={buttonClass.secondary}
          disabled={!file || !det || phase.state === "sending"}
          onClick={async () => file && setPreview(await run<DetectorResponsePreview>(url(false), file))}
        >
          Preview
        </button>
      </div>
      {detectors.data && detectors.data.length === 0 ? (
        <p className="mt-2 text-sm text-ink-soft">Add a detector first.</p>
      ) : null}
      <div className="mt-2">
        <Progress phase={phase} />
      </div>
      {preview && det ? (
        <div className="mt-3 space-y-2" data-testid="detector-preview">
          <p className="text-sm tabular-nums">
            Usable band {formatInterval([preview.minGHz, preview.maxGHz])} (peak {formatDB(preview.peakDB)} dB, −
            {dropDB} dB points); now {formatInterval([det.minGHz, det.maxGHz])}.
          </p>
          <button
            type="button"
            className={buttonClass.primary}
            disabled={phase.state === "sending"}
            onClick={async () => {
              if (!file) return;
              const out = await run<unknown>(url(true), file);
              if (out) {
                await invalidateMission(qc, missionId);
                setPreview(null);
                setPhase({ state: "done", message: `IF band of ${det.key} updated; the plan was re-checked.` });
              }
            }}
          >
            Set the IF band of {det.key}
          </button>
        </div>
      ) : null}
    </Card>
  );
}
