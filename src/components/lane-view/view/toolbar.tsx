import type React from "react";
import type { Plan } from "@/schemas/plan";
import { SEVERITY_COLOUR } from "../vocabulary";

export type LaneViewMode = "chart" | "table";

export interface LaneToolbarProps {
  view: LaneViewMode;
  onView: (v: LaneViewMode) => void;
  /** Zoom the GHz axis in (factor 2) or out (0.5) about its middle. */
  onZoomBy: (factor: number) => void;
  onReset: () => void;
  channels: Plan["channels"];
  onZoomToChannel: (channelId: string) => void;
  counts: { error: number; warning: number; info: number };
  /** Where the time of each live re-check frame is written (straight into the page, no re-render). */
  frameText: React.RefObject<HTMLSpanElement | null>;
}

/** The lane view's controls: chart or table, zoom, reset, zoom to a channel, and the live finding counts. */
export function LaneToolbar({
  view,
  onView,
  onZoomBy,
  onReset,
  channels,
  onZoomToChannel,
  counts,
  frameText,
}: LaneToolbarProps) {
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm" role="toolbar" aria-label="Lane view controls">
      <div className="inline-flex overflow-hidden rounded border border-ink-faint" role="group" aria-label="View">
        {(["chart", "table"] as const).map((v) => (
          <button
            key={v}
            type="button"
            aria-pressed={view === v}
            className={`px-3 py-1 ${view === v ? "bg-ink text-white" : "bg-white hover:bg-ink-faint"}`}
            onClick={() => onView(v)}
          >
            {v === "chart" ? "Chart" : "Table"}
          </button>
        ))}
      </div>
      {view === "chart" ? (
        <>
          {(
            [
              ["Zoom in", () => onZoomBy(2)],
              ["Zoom out", () => onZoomBy(0.5)],
              ["Reset zoom", onReset],
            ] as const
          ).map(([label, onClick]) => (
            <button
              key={label}
              type="button"
              className="rounded border border-ink-faint px-2 py-1 hover:bg-ink-faint"
              onClick={onClick}
            >
              {label}
            </button>
          ))}
          <label className="flex items-center gap-1">
            <span>Zoom to channel</span>
            <select
              className="rounded border border-ink-faint px-2 py-1"
              value=""
              onChange={(e) => e.target.value && onZoomToChannel(e.target.value)}
            >
              <option value="">choose…</option>
              {channels.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.id} · {c.name}
                </option>
              ))}
            </select>
          </label>
          <span className="text-xs text-ink-soft">Wheel: zoom · drag: pan · shift+wheel: pan</span>
        </>
      ) : null}
      <span className="ml-auto text-xs text-ink-soft" aria-live="polite">
        <span style={{ color: SEVERITY_COLOUR.error }}>{counts.error} errors</span> ·{" "}
        <span style={{ color: SEVERITY_COLOUR.warning }}>{counts.warning} warnings</span> · {counts.info} info
        <span ref={frameText} data-testid="frame-time" />
      </span>
    </div>
  );
}
