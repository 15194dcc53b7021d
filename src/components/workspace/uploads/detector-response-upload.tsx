"use client";

import { useState } from "react";
import { api } from "@/queries/api";
import { useCollectionQuery } from "@/queries/missions";
import type { DetectorResponsePreview } from "@/queries/types";
import { formatDB, formatInterval } from "../format";
import { NumberInput, PreviewApplyUpload, RowSelect } from "./preview-apply-upload";

/** A measured detector response: the usable band within the chosen drop below the peak, then set as the detector's IF band. */
export function DetectorResponseUpload({ missionId }: { missionId: string }) {
  const detectors = useCollectionQuery(missionId, "detectors");
  const [detectorId, setDetectorId] = useState("");
  const [dropDB, setDropDB] = useState("3");
  const det = detectors.data?.find((d) => d.id === (detectorId || detectors.data?.[0]?.id));
  return (
    <PreviewApplyUpload<DetectorResponsePreview, NonNullable<typeof det>>
      missionId={missionId}
      title="Detector response"
      intro={
        <>
          A CSV with the columns <code className="font-mono text-xs">frequencyGHz</code> and{" "}
          <code className="font-mono text-xs">responseDB</code>: the measured response of photodiode and IF chain. The
          usable band is where the response stays within the chosen drop below its peak.
        </>
      }
      fileId="detector-file"
      fileLabel="Measured response"
      url={(apply) =>
        `${api.collection(missionId, "uploads/detector-response")}?detectorId=${encodeURIComponent(det?.id ?? "")}&dropDB=${encodeURIComponent(dropDB)}&apply=${apply ? 1 : 0}`
      }
      target={det}
      controls={(drop) => (
        <>
          <RowSelect
            label="Detector"
            rows={detectors.data ?? []}
            value={det?.id ?? ""}
            onChange={(id) => {
              setDetectorId(id);
              drop();
            }}
          />
          <NumberInput
            label="Drop below peak (dB)"
            value={dropDB}
            onChange={(v) => {
              setDropDB(v);
              drop();
            }}
          />
        </>
      )}
      missing={detectors.data && detectors.data.length === 0 ? "Add a detector first." : null}
      testId="detector-preview"
      preview={(preview, det) => (
        <p className="text-sm tabular-nums">
          Usable band {formatInterval([preview.minGHz, preview.maxGHz])} (peak {formatDB(preview.peakDB)} dB, −{dropDB}{" "}
          dB points); now {formatInterval([det.minGHz, det.maxGHz])}.
        </p>
      )}
      apply={{
        label: (_, det) => `Set the IF band of ${det.key}`,
        done: (_, det) => `IF band of ${det.key} updated; the plan was re-checked.`,
      }}
    />
  );
}
