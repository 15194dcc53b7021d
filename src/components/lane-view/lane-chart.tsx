"use client";

import { useMemo, useRef, useState } from "react";
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import type { Domain, LaneItem, LaneModel } from "@/lib/lanes";
import { Axis } from "./chart/axis";
import { LaneRows } from "./chart/lane-rows";
import { ChartDefs } from "./chart/patterns";
import { Tooltip, type Hover } from "./chart/tooltip";
import { usePanZoomDrag, type AxisChange } from "./chart/use-pan-zoom-drag";
import { AXIS_H, MARGIN_LEFT, MARGIN_RIGHT, chartLayout } from "./layout";

export interface LaneChartProps {
  model: LaneModel;
  width: number;
  domain: Domain;
  ifDomain: Domain;
  selectedId: string | null;
  /** Zoom or pan of one axis: factor > 1 zooms in about `pivot`; or a shift by `pan` (GHz). */
  onZoom: (axis: "ghz" | "if", change: AxisChange) => void;
  onSelect: (item: LaneItem | null) => void;
  onZoomToItem: (item: LaneItem) => void;
  /** LO drag on the optical lane, in drawn (mirrored) GHz. */
  onLoDrag?: (chain: string, drawnGHz: number, phase: "start" | "move" | "end") => void;
  /** LO keyboard nudge by a number of steps. */
  onLoNudge?: (chain: string, steps: number) => void;
}

/**
 * The lane view's chart: lanes stacked over a shared GHz axis and an IF
 * axis, zoomable and pannable. The parts live in `./chart/`: the axes, the
 * fill patterns, each lane's rows of marks (`marks/`, one file per kind of
 * mark), the tooltip, and the pointer and wheel handling.
 */
export function LaneChart({
  model,
  width,
  domain,
  ifDomain,
  selectedId,
  onZoom,
  onSelect,
  onZoomToItem,
  onLoDrag,
  onLoNudge,
}: LaneChartProps) {
  // The layout depends only on the lanes and their rows; keep it (and the lane boxes the memoised lanes compare) across re-checks.
  const laneKey = model.lanes.map((l) => `${l.id}:${l.rows}`).join("|");
  const layout = useMemo(() => chartLayout(model), [laneKey]); // eslint-disable-line react-hooks/exhaustive-deps
  const svgRef = useRef<SVGSVGElement>(null);
  const [hover, setHover] = useState<Hover | null>(null);
  const inner = Math.max(50, width - MARGIN_LEFT - MARGIN_RIGHT);
  const ghzScale = scaleLinear({ domain: [domain[0], domain[1]], range: [0, inner] });
  const ifScale = scaleLinear({ domain: [ifDomain[0], ifDomain[1]], range: [0, inner] });
  const byLane = useMemo(() => {
    const m = new Map<string, LaneItem[]>();
    for (const it of model.items) {
      const list = m.get(it.lane) ?? [];
      list.push(it);
      m.set(it.lane, list);
    }
    return m;
  }, [model]);
  const none: LaneItem[] = [];
  const { svgHandlers, onLoPointerDown } = usePanZoomDrag({
    svgRef,
    layout,
    inner,
    ghzScale,
    ifScale,
    onZoom,
    onSelect,
    onLoDrag,
  });

  return (
    <div className="relative">
      <svg
        ref={svgRef}
        width={width}
        height={layout.height}
        role="group"
        aria-label="Lane view chart: RF, optical-offset and IF lanes. Tab to an item; Enter shows its details, Z zooms to it."
        className="select-none touch-none"
        {...svgHandlers}
        data-testid="lane-chart"
      >
        <ChartDefs inner={inner} height={layout.height} />
        <Axis domain={domain} width={width} y={layout.ghzAxisY} title="RF / optical offset" />
        <Axis domain={ifDomain} width={width} y={layout.ifAxisY} title="IF" />
        {layout.boxes.map((box) => (
          <g key={box.lane.id}>
            <rect
              x={MARGIN_LEFT}
              y={box.y}
              width={inner}
              height={box.h}
              fill={box.lane.kind === "optical" ? "#fbfaff" : box.lane.kind === "if" ? "#fffcf7" : "#f9fbfb"}
              stroke="#e1ebe9"
            />
            <text x={MARGIN_LEFT - 10} y={box.y + 14} textAnchor="end" fontSize={11.5} fontWeight={600} fill="#12343b">
              {box.lane.kind === "rf" ? "RF" : box.lane.kind === "optical" ? "Optical offset" : "IF"}
            </text>
            {box.lane.chain ? (
              <text x={MARGIN_LEFT - 10} y={box.y + 28} textAnchor="end" fontSize={10.5} fill="#2d545e">
                chain {box.lane.chain}
                {box.lane.mirror < 0 ? " (mirrored)" : ""}
              </text>
            ) : null}
            <Group left={MARGIN_LEFT} clipPath="url(#hl-clip)">
              <LaneRows
                box={box}
                items={byLane.get(box.lane.id) ?? none}
                domain={box.lane.axis === "ghz" ? domain : ifDomain}
                inner={inner}
                selectedId={selectedId}
                onHover={setHover}
                onSelect={onSelect}
                onZoomToItem={onZoomToItem}
                onLoPointerDown={onLoPointerDown}
                onLoNudge={onLoNudge}
              />
            </Group>
          </g>
        ))}
      </svg>
      {hover ? <Tooltip hover={hover} /> : null}
    </div>
  );
}

export { AXIS_H };
