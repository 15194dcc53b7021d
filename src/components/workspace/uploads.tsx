"use client";

import { useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { CHANNEL_COLUMNS } from "@/lib/imports";
import { api, ApiError } from "@/queries/api";
import { invalidateMission, useCollectionQuery, useMissionQuery } from "@/queries/missions";
import type { ChannelUploadPreview, DetectorResponsePreview, Interval, TuningPreview } from "@/queries/types";
import { uploadFile } from "@/queries/upload";
import { formatDB, formatGHz, formatInterval } from "./format";
import { mergedCoverage } from "./intervals";
import { buttonClass, Card, ErrorNote, LaserSafetyNote } from "./ui";

type Phase =
  | { state: "idle" }
  | { state: "sending"; share: number | null }
  | { state: "error"; error: ApiError }
  | { state: "done"; message: string };

/** Upload progress and errors, shared by the three uploads. */
function useUpload() {
  const [phase, setPhase] = useState<Phase>({ state: "idle" });
  const run = async <T,>(url: string, file: File): Promise<T | null> => {
    setPhase({ state: "sending", share: 0 });
    try {
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

function Progress({ phase }: { phase: Phase }) {
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

function FileInput({ id, label, onFile }: { id: string; label: string; onFile: (f: File | null) => void }) {
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

const num = "w-28 rounded border border-ink/30 px-2 py-1 text-sm tabular-nums";
const sel = "rounded border border-ink/30 bg-white px-2 py-1 text-sm";

/** Draws the current and the uploaded reach on one offset axis. */
function ReachStrip({ current, next }: { current: Interval[]; next: Interval[] }) {
  const all = [...current, ...next];
  if (all.length === 0) return null;
  const lo = Math.min(...all.map((i) => i.minGHz));
  const hi = Math.max(...all.map((i) => i.maxGHz));
  const span = hi - lo || 1;
  const x = (v: number) => 8 + ((v - lo) / span) * 584;
  const row = (ivs: Interval[], y: number, cls: string) =>
    ivs.map((i, n) => (
      <rect
        key={n}
        x={x(i.minGHz)}
        y={y}
        width={Math.max(1.5, x(i.maxGHz) - x(i.minGHz))}
        height={12}
        className={cls}
      />
    ));
  return (
    <svg
      viewBox="0 0 600 58"
      className="w-full max-w-xl"
      role="img"
      aria-label="Current reach above, uploaded tuning map below"
    >
      <text x={8} y={10} className="fill-ink-soft text-[9px]">
        now
      </text>
      {row(current, 13, "fill-ink/30")}
      <text x={8} y={37} className="fill-ink-soft text-[9px]">
        uploaded
      </text>
      {row(next, 40, "fill-lane-optical")}
      <text x={8} y={58} className="fill-ink-soft text-[9px]">
        {formatGHz(lo, 2)} GHz
      </text>
      <text x={592} y={58} textAnchor="end" className="fill-ink-soft text-[9px]">
        {formatGHz(hi, 2)} GHz
      </text>
    </svg>
  );
}

function TuningMapUpload({ missionId }: { missionId: string }) {
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

function ChannelListUpload({ missionId }: { missionId: string }) {
  const qc = useQueryClient();
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<ChannelUploadPreview | null>(null);
  const { phase, setPhase, run } = useUpload();
  const url = (apply: boolean) => `${api.collection(missionId, "uploads/channels")}?apply=${apply ? 1 : 0}`;
  const bad = preview?.rows.filter((r) => r.errors.length > 0).length ?? 0;
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
          onClick={async () => file && setPreview(await run<ChannelUploadPreview>(url(false), file))}
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
            {preview.rows.length} rows,{" "}
            {bad === 0 ? (
              <span className="text-sev-ok">all valid</span>
            ) : (
              <span className="text-sev-error">{bad} with errors</span>
            )}
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
                  message: `${preview.rows.length} channel rows applied; the plan was re-checked.`,
                });
              }
            }}
          >
            Apply {preview.rows.length} {preview.rows.length === 1 ? "row" : "rows"}
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

function DetectorResponseUpload({ missionId }: { missionId: string }) {
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

export function UploadsPage({ missionId }: { missionId: string }) {
  const mission = useMissionQuery(missionId);
  return (
    <div className="space-y-4">
      <div>
        <p className="text-xs text-ink-soft">
          <Link href="/missions" className="hover:underline">
            Missions
          </Link>{" "}
          /{" "}
          <Link href={`/missions/${missionId}`} className="hover:underline">
            {mission.data?.name ?? "Mission"}
          </Link>{" "}
          /
        </p>
        <h1 className="text-2xl font-semibold tracking-tight">Upload measured data</h1>
        <p className="text-sm text-ink-soft">
          Each upload is previewed first; applying it saves a new plan revision and re-checks the plan.
        </p>
      </div>
      <TuningMapUpload missionId={missionId} />
      <ChannelListUpload missionId={missionId} />
      <DetectorResponseUpload missionId={missionId} />
      <LaserSafetyNote />
    </div>
  );
}
