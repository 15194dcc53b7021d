import { useEffect, useMemo, useRef } from "react";
import type React from "react";
import type { LaneItem } from "@/lib/lanes";
import { MARGIN_LEFT, type ChartLayout } from "../layout";

/** Zoom or pan of one axis: factor > 1 zooms in about `pivot`; or a shift by `pan` (GHz). */
export type AxisChange = { factor: number; pivot: number } | { pan: number };
export type Axis = "ghz" | "if";
/** What the hook needs of a linear scale: its domain, and pixels back to GHz. */
interface Scale {
  domain(): number[];
  invert(px: number): number;
}

export interface PanZoomDragOptions {
  svgRef: React.RefObject<SVGSVGElement | null>;
  layout: ChartLayout;
  /** Width of the plot area (pixels). */
  inner: number;
  ghzScale: Scale;
  ifScale: Scale;
  onZoom: (axis: Axis, change: AxisChange) => void;
  onSelect: (item: LaneItem | null) => void;
  /** LO drag on the optical lane, in drawn (mirrored) GHz. */
  onLoDrag?: (chain: string, drawnGHz: number, phase: "start" | "move" | "end") => void;
}

type Drag =
  | { kind: "pan"; axis: Axis; lastX: number; startX: number; pointer: number; captured: boolean }
  | { kind: "lo"; chain: string };

/**
 * The chart's pointer and wheel handling: the wheel zooms the axis under the
 * pointer (shift or a sideways wheel pans it), a background drag pans, and
 * a drag that starts on an LO moves that LO. Returns the handlers for the
 * chart's svg, and `onLoPointerDown` for the LO marks (stable across
 * re-checks, so memoised lanes are not redrawn).
 */
export function usePanZoomDrag({
  svgRef,
  layout,
  inner,
  ghzScale,
  ifScale,
  onZoom,
  onSelect,
  onLoDrag,
}: PanZoomDragOptions) {
  const zoomRef = useRef(onZoom);
  const scalesRef = useRef({ ghzScale, ifScale, layout });
  useEffect(() => {
    zoomRef.current = onZoom;
    scalesRef.current = { ghzScale, ifScale, layout };
  });

  // Wheel zoom needs a non-passive listener to keep the page from scrolling.
  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const onWheel = (e: WheelEvent) => {
      const r = svg.getBoundingClientRect();
      const x = e.clientX - r.left - MARGIN_LEFT;
      const y = e.clientY - r.top;
      if (x < 0) return;
      e.preventDefault();
      const { ghzScale: g, ifScale: f, layout: l } = scalesRef.current;
      const axis = y < l.ifSection[0] ? "ghz" : "if";
      const scale = axis === "ghz" ? g : f;
      if (e.shiftKey || Math.abs(e.deltaX) > Math.abs(e.deltaY)) {
        const d = e.shiftKey ? e.deltaY : e.deltaX;
        const span = scale.domain()[1]! - scale.domain()[0]!;
        zoomRef.current(axis, { pan: (d / inner) * span });
      } else {
        zoomRef.current(axis, { factor: Math.exp(-e.deltaY * 0.0015), pivot: scale.invert(x) });
      }
    };
    svg.addEventListener("wheel", onWheel, { passive: false });
    return () => svg.removeEventListener("wheel", onWheel);
  }, [inner, svgRef]);

  // Background drag pans; LO drag moves the LO.
  const drag = useRef<Drag | null>(null);
  // A click that ends a pan or an LO drag must not clear the selection.
  const dragged = useRef(false);
  const onPointerDown = (e: React.PointerEvent<SVGSVGElement>) => {
    if (drag.current) return;
    dragged.current = false;
    const r = e.currentTarget.getBoundingClientRect();
    const y = e.clientY - r.top;
    // Pointer capture only once the pointer really moves, so clicks still reach the item under it.
    drag.current = {
      kind: "pan",
      axis: y < layout.ifSection[0] ? "ghz" : "if",
      lastX: e.clientX,
      startX: e.clientX,
      pointer: e.pointerId,
      captured: false,
    };
  };
  const onLoPointerDown = useMemo(
    () => (item: LaneItem, e: React.PointerEvent) => {
      if (!item.chain || !onLoDrag) return;
      e.stopPropagation();
      drag.current = { kind: "lo", chain: item.chain };
      dragged.current = true;
      svgRef.current?.setPointerCapture(e.pointerId);
      onSelect(item);
      onLoDrag(item.chain, item.lo, "start");
    },
    [onLoDrag, onSelect, svgRef],
  );
  const onPointerMove = (e: React.PointerEvent<SVGSVGElement>) => {
    const d = drag.current;
    if (!d) return;
    if (d.kind === "pan") {
      if (!d.captured) {
        if (Math.abs(e.clientX - d.startX) < 4) return;
        d.captured = true;
        dragged.current = true;
        e.currentTarget.setPointerCapture(d.pointer);
      }
      const dx = e.clientX - d.lastX;
      if (dx === 0) return;
      d.lastX = e.clientX;
      const scale = d.axis === "ghz" ? ghzScale : ifScale;
      const span = scale.domain()[1]! - scale.domain()[0]!;
      onZoom(d.axis, { pan: (-dx / inner) * span });
    } else {
      const r = e.currentTarget.getBoundingClientRect();
      onLoDrag?.(d.chain, ghzScale.invert(e.clientX - r.left - MARGIN_LEFT), "move");
    }
  };
  const onPointerUp = (e: React.PointerEvent<SVGSVGElement>) => {
    const d = drag.current;
    drag.current = null;
    if (d?.kind === "lo") {
      const r = e.currentTarget.getBoundingClientRect();
      onLoDrag?.(d.chain, ghzScale.invert(e.clientX - r.left - MARGIN_LEFT), "end");
    }
  };
  const onPointerCancel = () => (drag.current = null);
  const onClick = () => {
    if (!dragged.current) onSelect(null);
    dragged.current = false;
  };

  return {
    svgHandlers: { onPointerDown, onPointerMove, onPointerUp, onPointerCancel, onClick },
    onLoPointerDown,
  };
}
