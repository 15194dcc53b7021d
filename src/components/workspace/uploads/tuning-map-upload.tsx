"use client";

import { useState } from "react";
import { api } from "@/queries/api";
import { useCollectionQuery } from "@/queries/missions";
import type { TuningPreview } from "@/queries/types";
import { formatInterval } from "../format";
import { mergedCoverage } from "../intervals";
import { NumberInput, PreviewApplyUpload, RowSelect } from "./preview-apply-upload";
import { ReachStrip } from "./reach-strip";

/** A measured tuning map: previewed as merged reach intervals beside the current reach, then applied to the laser pair. */
export function TuningMapUpload({ missionId }: { missionId: string }) {
  const lasers = useCollectionQuery(missionId, "lasers");
  const [laserId, setLaserId] = useState("");
  const [gapMHz, setGapMHz] = useState("50");
  const laser = lasers.data?.find((l) => l.id === (laserId || lasers.data?.[0]?.id));
  return (
    <PreviewApplyUpload<TuningPreview, NonNullable<typeof laser>>
      missionId={missionId}
      title="Tuning map (measured LO offsets)"
      intro={
        <>
          A CSV with a header row and an <code className="font-mono text-xs">offsetGHz</code> column: the measured LO
          offsets that laser 2 reached (other columns are ignored; a blank offset marks a setpoint with no measurement).
          Offsets closer than the gap are joined into one reachable interval; the preview shows the intervals before
          they replace the laser pair&apos;s reach.
        </>
      }
      fileId="tuning-file"
      fileLabel="Measured offsets"
      url={(apply) =>
        `${api.collection(missionId, "uploads/tuning-map")}?laserId=${encodeURIComponent(laser?.id ?? "")}&gapMHz=${encodeURIComponent(gapMHz)}&apply=${apply ? 1 : 0}`
      }
      target={laser}
      controls={(drop) => (
        <>
          <RowSelect
            label="Laser pair"
            rows={lasers.data ?? []}
            value={laser?.id ?? ""}
            onChange={(id) => {
              setLaserId(id);
              drop();
            }}
          />
          <NumberInput
            label="Largest gap joined (MHz)"
            value={gapMHz}
            onChange={(v) => {
              setGapMHz(v);
              drop();
            }}
          />
        </>
      )}
      missing={lasers.data && lasers.data.length === 0 ? "Add a laser pair first." : null}
      testId="tuning-preview"
      preview={(preview, laser) => {
        const rejected = preview.rejectedRows.length;
        return (
          <>
            <p className="text-sm">
              {preview.points} points → {preview.intervals.length} interval
              {preview.intervals.length === 1 ? "" : "s"}
              {rejected ? (
                <span className="text-sev-warning">
                  {" "}
                  · {rejected} row{rejected === 1 ? "" : "s"} without a measurement
                </span>
              ) : null}
              {preview.isolatedGHz && preview.isolatedGHz.length > 0 ? (
                <span className="text-sev-warning">
                  {" "}
                  · {preview.isolatedGHz.length} isolated offset{preview.isolatedGHz.length === 1 ? "" : "s"} left out
                  (no neighbour within the gap)
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
          </>
        );
      }}
      apply={{
        label: (_, laser) => `Replace the reach of ${laser.key}`,
        done: (_, laser) => `Reach of ${laser.key} replaced; the plan was re-checked.`,
        disabled: (preview) => preview.intervals.length === 0,
      }}
    />
  );
}
