"use client";

import type { WaiverMap } from "@/components/waivers";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { Plan } from "@/schemas/plan";
import type { ResultDocument } from "@/lib/plan";
import type { LaneItem } from "@/lib/lanes";
import { EnvelopeSection } from "@/components/envelope/envelope-section";
import { LaneChart } from "./lane-chart";
import { LaneTable } from "./lane-table";
import { Legend } from "./legend";
import { useLiveRecheck, type FrameTime } from "./use-live-recheck";
import { ChainControls } from "./view/chain-controls";
import { ChannelFigures } from "./view/channel-figures";
import { NoiseBudgetPanel } from "./view/noise-budget-panel";
import { DetailsPanel } from "./view/details-panel";
import { FindingsPanel } from "./view/live-findings";
import { LaneToolbar, type LaneViewMode } from "./view/toolbar";
import { useChartWidth } from "./view/use-chart-width";
import { useLaneDomains } from "./view/use-lane-domains";
import { useLaneModel } from "./view/use-lane-model";
import { useLoSave, type SaveOutcome } from "./view/use-lo-save";

export type { SaveOutcome };

export interface LaneViewProps {
  plan: Plan;
  /** The stored result of the plan (null: check it here). */
  result: ResultDocument | null;
  /** Save a chain's LO as a new plan revision; absent on read-only views. */
  onSaveLo?: (chainId: string, loOffsetGHz: number) => Promise<SaveOutcome>;
  /** Called with the time of every live re-check frame (ms). */
  onFrame?: (t: FrameTime) => void;
  /** Recorded waivers by finding key: the live findings mark waived errors. */
  waivers?: WaiverMap;
}

/**
 * The lane view: the whole plan on shared frequency axes, the feasibility
 * map of each receiver chain, live re-check while an LO is dragged, place,
 * save as revision, details of any item and a table view of the same data.
 * This component holds the live plan and its lane model and wires the parts
 * (`./view/`: toolbar, chain controls, details and findings panels, channel
 * figures, and the hooks for the lane model, the visible ranges, the chart
 * width and saving).
 */
export function LaneView({ plan, result, onSaveLo, onFrame, waivers }: LaneViewProps) {
  // The frame time is written straight into the page (no re-render per frame).
  const frameText = useRef<HTMLSpanElement>(null);
  const onFrameRef = useRef(onFrame);
  useEffect(() => {
    onFrameRef.current = onFrame;
  });
  const reportFrame = useCallback((t: FrameTime) => {
    if (frameText.current) frameText.current.textContent = ` · last re-check + render ${t.workMs.toFixed(1)} ms`;
    onFrameRef.current?.(t);
  }, []);
  const live = useLiveRecheck(plan, result, reportFrame);
  const model = useLaneModel(live.plan, live.result);
  const [view, setView] = useState<LaneViewMode>("chart");
  const [selected, setSelected] = useState<LaneItem | null>(null);
  const { saveState, save } = useLoSave(live.plan, onSaveLo);

  // Handlers passed to the chart stay the same across re-checks (the memoised lanes compare them).
  const latest = useRef({ lanes: model.lanes, plan: live.plan });
  useEffect(() => {
    latest.current = { lanes: model.lanes, plan: live.plan };
  });
  const { domain, ifDomain, onZoom, zoomTo, zoomToChannel, reset } = useLaneDomains(plan, model, latest);
  const { wrapRef, width, ready } = useChartWidth();

  const { moveLo, setLo } = live;
  const onLoDrag = useCallback(
    (chain: string, drawn: number, phase: "start" | "move" | "end") => {
      if (phase === "start") return;
      const mirror = latest.current.lanes.find((l) => l.id === `optical:${chain}`)?.mirror ?? 1;
      moveLo(chain, mirror * drawn);
    },
    [moveLo],
  );
  const onLoNudge = useCallback(
    (chain: string, steps: number) => {
      const plan = latest.current.plan;
      const c = plan.chains.find((x) => x.id === chain);
      const l = plan.lasers.find((x) => x.id === c?.laser);
      const step = l && l.stepMHz > 0 ? l.stepMHz / 1000 : 0.001;
      if (c) setLo(chain, c.loOffsetGHz + steps * step);
    },
    [setLo],
  );

  // Keep the details panel on the live version of the selected item.
  const selectedLive = selected ? (model.items.find((i) => i.id === selected.id) ?? null) : null;

  const counts = useMemo(() => {
    const c = { error: 0, warning: 0, info: 0 };
    for (const f of live.result.findings) c[f.severity]++;
    return c;
  }, [live.result]);

  return (
    <div className="space-y-4" data-testid="lane-view" data-ready={ready ? "1" : "0"}>
      <LaneToolbar
        view={view}
        onView={setView}
        onZoomBy={(factor) => onZoom("ghz", { factor, pivot: (domain[0] + domain[1]) / 2 })}
        onReset={reset}
        channels={live.plan.channels}
        onZoomToChannel={zoomToChannel}
        counts={counts}
        frameText={frameText}
      />

      <ChainControls
        plan={live.plan}
        result={live.result}
        saveState={saveState}
        canSave={Boolean(onSaveLo)}
        onPlace={(chain, L) => live.setLo(chain, L)}
        onSave={save}
        onSet={(chain, L) => live.setLo(chain, L)}
      />
      {live.error ? (
        <p role="alert" className="text-sm text-sev-error">
          {live.error}
        </p>
      ) : null}

      <div ref={wrapRef} className={view === "chart" ? "" : "hidden"}>
        <LaneChart
          model={model}
          width={width}
          domain={domain}
          ifDomain={ifDomain}
          selectedId={selected?.id ?? null}
          onZoom={onZoom}
          onSelect={setSelected}
          onZoomToItem={zoomTo}
          onLoDrag={onLoDrag}
          onLoNudge={onLoNudge}
        />
      </div>
      {view === "table" ? <LaneTable model={model} /> : null}

      <div className="grid gap-4 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <DetailsPanel item={selectedLive} plan={live.plan} result={live.result} onZoom={zoomTo} />
        <FindingsPanel result={live.result} waivers={waivers} />
      </div>
      <ChannelFigures plan={live.plan} result={live.result} />
      <EnvelopeSection plan={live.plan} result={live.result} />
      <NoiseBudgetPanel plan={live.plan} />
      <details className="rounded border border-ink-faint p-3">
        <summary className="cursor-pointer text-sm font-semibold">Legend</summary>
        <div className="mt-2">
          <Legend />
        </div>
      </details>
      <p className="text-xs text-ink-soft">
        Optical offsets of a lower-sideband chain are drawn mirrored (at −x) so they line up with the RF they carry;
        tooltips and the table give the signed offset. Not modelled in v1: laser noise pedestals, parasitic mode
        families, LO side modes, shaped antenna response, image noise in NEΔT. Sensitivity figures are design estimates,
        not calibration.
      </p>
    </div>
  );
}
