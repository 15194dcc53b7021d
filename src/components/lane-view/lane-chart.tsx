"use client";

import { memo, useEffect, useMemo, useRef, useState } from "react";
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import { formatTicks, visibleItems, type Domain, type LaneItem, type LaneModel } from "@/lib/lanes";
import { FAMILY_LOOK, KIND_LOOK, SEVERITY_COLOUR, markerPath, markerPathAt, orderShape } from "./vocabulary";
import { AXIS_H, MARGIN_LEFT, MARGIN_RIGHT, ROW_PAD, chartLayout, type LaneBox } from "./layout";

export interface LaneChartProps {
  model: LaneModel;
  width: number;
  domain: Domain;
  ifDomain: Domain;
  selectedId: string | null;
  /** Zoom or pan of one axis: factor > 1 zooms in about `pivot`; or a shift by `pan` (GHz). */
  onZoom: (axis: "ghz" | "if", change: { factor: number; pivot: number } | { pan: number }) => void;
  onSelect: (item: LaneItem | null) => void;
  onZoomToItem: (item: LaneItem) => void;
  /** LO drag on the optical lane, in drawn (mirrored) GHz. */
  onLoDrag?: (chain: string, drawnGHz: number, phase: "start" | "move" | "end") => void;
  /** LO keyboard nudge by a number of steps. */
  onLoNudge?: (chain: string, steps: number) => void;
}

interface Hover {
  item: LaneItem;
  x: number;
  y: number;
}

const MIN_PX = 2;
/** Above this many visible spur products in one lane, they are drawn as merged paths (zoom in, or use the table view, to reach each one). */
const DENSE_SPURS = 120;

function Axis({ domain, width, y, title }: { domain: Domain; width: number; y: number; title: string }) {
  const inner = width - MARGIN_LEFT - MARGIN_RIGHT;
  const set = formatTicks(domain, Math.max(3, Math.floor(inner / 90)));
  const k = inner / (domain[1] - domain[0]);
  return (
    <g transform={`translate(${MARGIN_LEFT},${y})`} aria-hidden="true">
      <line x1={0} x2={inner} y1={0} y2={0} stroke="#12343b" strokeWidth={1} />
      {set.ticks.map((t) => {
        const x = (t.value - domain[0]) * k;
        return (
          <g key={t.value} transform={`translate(${x},0)`}>
            <line y1={0} y2={-5} stroke="#12343b" />
            <text y={-8} textAnchor="middle" fontSize={11} fill="#12343b">
              {t.label}
            </text>
          </g>
        );
      })}
      <text x={-10} y={-8} textAnchor="end" fontSize={11} fill="#2d545e" fontWeight={600}>
        {title} ({set.unit === "MHz" ? `MHz from ${set.anchorLabel}` : "GHz"})
      </text>
    </g>
  );
}

function itemAria(it: LaneItem): string {
  const sev = it.severity ? `, ${it.severity}${it.codes.length ? `: ${it.codes.join(", ")}` : ""}` : "";
  const where = it.lo === it.hi ? `at ${it.lo.toFixed(4)} GHz` : `${it.lo.toFixed(4)} to ${it.hi.toFixed(4)} GHz`;
  return `${it.label}, ${where}${sev}`;
}

interface ItemMarkProps {
  it: LaneItem;
  x0: number;
  x1: number;
  y: number;
  h: number;
  boxY: number;
  boxH: number;
  selected: boolean;
  onHover: (h: Hover | null) => void;
  onSelect: (item: LaneItem) => void;
  onZoomToItem: (item: LaneItem) => void;
  onLoPointerDown?: (item: LaneItem, e: React.PointerEvent) => void;
  onLoNudge?: (chain: string, steps: number) => void;
}

/** One mark; skipped on re-render when its place, look and findings are unchanged. */
const ItemMark = memo(
  function ItemMark({
    it,
    x0,
    x1,
    y,
    h,
    boxY,
    boxH,
    selected,
    onHover,
    onSelect,
    onZoomToItem,
    onLoPointerDown,
    onLoNudge,
  }: ItemMarkProps) {
    const look = KIND_LOOK[it.kind];
    const sevStroke = it.severity ? SEVERITY_COLOUR[it.severity] : look.stroke;
    const common = {
      tabIndex: 0,
      role: "button" as const,
      "aria-label": itemAria(it),
      "data-item": it.id,
      "data-kind": it.kind,
      className: "hl-item",
      onPointerEnter: (e: React.PointerEvent) => onHover({ item: it, x: e.clientX, y: e.clientY }),
      onPointerLeave: () => onHover(null),
      onFocus: (e: React.FocusEvent<SVGGElement>) => {
        const r = e.currentTarget.getBoundingClientRect();
        onHover({ item: it, x: r.left + r.width / 2, y: r.bottom });
      },
      onBlur: () => onHover(null),
      onClick: (e: React.MouseEvent) => {
        e.stopPropagation();
        onSelect(it);
      },
      onKeyDown: (e: React.KeyboardEvent) => {
        if (e.key === "Enter" || e.key === " ") {
          e.preventDefault();
          onSelect(it);
        } else if (e.key === "z" || e.key === "Z") {
          e.preventDefault();
          onZoomToItem(it);
        } else if (it.kind === "lo" && it.chain && onLoNudge && (e.key === "ArrowLeft" || e.key === "ArrowRight")) {
          e.preventDefault();
          onLoNudge(it.chain, (e.key === "ArrowRight" ? 1 : -1) * (e.shiftKey ? 100 : 1));
        }
      },
    };
    const outline = selected ? { stroke: "#111", strokeWidth: 2 } : {};
    switch (it.kind) {
      case "line-centre":
      case "nyquist-edge":
        return (
          <g {...common}>
            <rect x={x0 - 3} y={boxY} width={x1 - x0 + 6} height={boxH} fill="transparent" />
            <line
              x1={(x0 + x1) / 2}
              x2={(x0 + x1) / 2}
              y1={boxY}
              y2={boxY + boxH}
              stroke={look.stroke}
              strokeDasharray={look.dash}
              strokeWidth={selected ? 2 : 1}
            />
            {it.kind === "line-centre" ? (
              <path
                d={markerPath("diamond", 3.5)}
                transform={`translate(${(x0 + x1) / 2},${y + h / 2})`}
                fill={look.stroke}
              />
            ) : null}
          </g>
        );
      case "carrier":
        return (
          <g {...common}>
            <rect x={x0 - 3} y={boxY} width={x1 - x0 + 6} height={boxH} fill="transparent" />
            <line
              x1={(x0 + x1) / 2}
              x2={(x0 + x1) / 2}
              y1={boxY + 2}
              y2={boxY + boxH - 2}
              stroke={look.stroke}
              strokeWidth={selected ? 3 : 2}
            />
          </g>
        );
      case "lock-sideband":
        return (
          <g {...common}>
            <line
              x1={(x0 + x1) / 2}
              x2={(x0 + x1) / 2}
              y1={y + 2}
              y2={y + h}
              stroke={look.stroke}
              strokeWidth={selected ? 2.5 : 1.5}
            />
            <path
              d={markerPath(orderShape(it.order), 2.5)}
              transform={`translate(${(x0 + x1) / 2},${y + 2})`}
              fill={look.fill}
            />
          </g>
        );
      case "lo": {
        const cx = (x0 + x1) / 2;
        const colour = it.severity === "error" ? SEVERITY_COLOUR.error : look.fill;
        return (
          <g
            key={it.id}
            {...common}
            aria-label={`${itemAria(it)}. Drag, or use the left and right arrow keys, to move the LO.`}
            style={{ cursor: "ew-resize" }}
            onPointerDown={(e) => onLoPointerDown?.(it, e)}
          >
            <rect x={cx - 9} y={boxY} width={18} height={boxH} fill="transparent" />
            <line x1={cx} x2={cx} y1={boxY + 1} y2={boxY + boxH - 1} stroke={colour} strokeWidth={2} />
            <path
              d={`M ${cx - 7} ${y + h + 2} L ${cx + 7} ${y + h + 2} L ${cx} ${y - 2} Z`}
              fill={colour}
              stroke={selected ? "#111" : look.stroke}
              strokeWidth={selected ? 2 : 1}
            />
          </g>
        );
      }
      case "spur": {
        const fam = it.family ? FAMILY_LOOK[it.family] : null;
        const colour = fam?.colour ?? "#666";
        const cx = (x0 + x1) / 2;
        const wide = x1 - x0 > 6;
        return (
          <g {...common}>
            {wide ? (
              <rect
                x={x0}
                y={y + 1}
                width={x1 - x0}
                height={h - 2}
                fill={`url(#${fam?.pattern ?? "hl-pat-diag"})`}
                stroke={colour}
                strokeWidth={0.8}
              />
            ) : null}
            <path
              d={markerPath(orderShape(it.order), 3)}
              transform={`translate(${cx},${y + h / 2})`}
              fill={it.severity === "error" || it.severity === "info" ? colour : "#fff"}
              stroke={it.severity === "error" ? SEVERITY_COLOUR.error : colour}
              strokeWidth={it.severity === "error" ? 1.8 : 1}
            />
            {selected ? (
              <rect
                x={x0 - 2}
                y={y - 1}
                width={x1 - x0 + 4}
                height={h + 2}
                fill="none"
                stroke="#111"
                strokeWidth={1.5}
              />
            ) : null}
          </g>
        );
      }
      default: {
        const background =
          it.kind === "reach" || it.kind === "detector-band" || it.kind === "rf-input" || it.kind === "protected-band";
        const ry = background ? 0 : 2;
        const yy = it.kind === "protected-band" ? boxY : y;
        const hh = it.kind === "protected-band" ? boxH : h;
        return (
          <g {...common}>
            <rect
              x={x0}
              y={yy}
              width={x1 - x0}
              height={hh}
              rx={ry}
              fill={look.fill}
              fillOpacity={look.opacity}
              stroke={it.severity && !background ? sevStroke : look.stroke}
              strokeWidth={it.severity === "error" ? 1.8 : 1}
              strokeDasharray={look.dash}
              {...outline}
            />
          </g>
        );
      }
    }
  },
  (a, b) =>
    a.x0 === b.x0 &&
    a.x1 === b.x1 &&
    a.y === b.y &&
    a.h === b.h &&
    a.boxY === b.boxY &&
    a.boxH === b.boxH &&
    a.selected === b.selected &&
    a.onSelect === b.onSelect &&
    a.onZoomToItem === b.onZoomToItem &&
    a.onLoPointerDown === b.onLoPointerDown &&
    a.onLoNudge === b.onLoNudge &&
    a.it.id === b.it.id &&
    a.it.severity === b.it.severity &&
    a.it.label === b.it.label &&
    a.it.codes.join() === b.it.codes.join(),
);

interface LaneRowsProps {
  box: LaneBox;
  items: readonly LaneItem[];
  domain: Domain;
  inner: number;
  selectedId: string | null;
  onHover: (h: Hover | null) => void;
  onSelect: (item: LaneItem) => void;
  onZoomToItem: (item: LaneItem) => void;
  onLoPointerDown?: (item: LaneItem, e: React.PointerEvent) => void;
  onLoNudge?: (chain: string, steps: number) => void;
}

function sameItems(a: readonly LaneItem[], b: readonly LaneItem[]): boolean {
  if (a === b) return true;
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    const y = b[i]!;
    if (
      x.id !== y.id ||
      x.lo !== y.lo ||
      x.hi !== y.hi ||
      x.severity !== y.severity ||
      x.label !== y.label ||
      x.codes.join() !== y.codes.join()
    )
      return false;
  }
  return true;
}

/** One lane's items; re-rendered only when its items, the view or the selection change. */
const LaneRows = memo(
  function LaneRows({
    box,
    items,
    domain,
    inner,
    selectedId,
    onHover,
    onSelect,
    onZoomToItem,
    onLoPointerDown,
    onLoNudge,
  }: LaneRowsProps) {
    const placed = visibleItems(items, domain, inner, MIN_PX);
    const top = box.y + ROW_PAD;
    const rowY = (row: number) => top + row * box.rowH;
    const linkPairs = new Map<string, { x: number; y: number }[]>();
    const spurCount = placed.drawn.reduce((n, d) => n + (d.item.kind === "spur" ? 1 : 0), 0);
    const dense = spurCount > DENSE_SPURS;
    const merged = new Map<
      string,
      { family: LaneItem["family"]; severity: LaneItem["severity"]; bands: string[]; marks: string[] }
    >();
    if (dense) {
      for (const { item: it, x0, x1 } of placed.drawn) {
        if (it.kind !== "spur") continue;
        const key = `${it.family}|${it.severity}`;
        const m = merged.get(key) ?? { family: it.family, severity: it.severity, bands: [], marks: [] };
        const y = rowY(it.row);
        const h = box.rowH - 3;
        if (x1 - x0 > 6)
          m.bands.push(`M ${x0.toFixed(1)} ${y + 1} H ${x1.toFixed(1)} V ${y + h - 1} H ${x0.toFixed(1)} Z`);
        m.marks.push(markerPathAt(orderShape(it.order), (x0 + x1) / 2, y + h / 2, 3));
        merged.set(key, m);
      }
    }
    const denseNodes = [...merged.entries()].map(([key, m]) => {
      const fam = m.family ? FAMILY_LOOK[m.family] : null;
      const colour = fam?.colour ?? "#666";
      return (
        <g key={`dense-${key}`} aria-hidden="true">
          {m.bands.length ? (
            <path
              d={m.bands.join(" ")}
              fill={`url(#${fam?.pattern ?? "hl-pat-diag"})`}
              stroke={colour}
              strokeWidth={0.8}
            />
          ) : null}
          <path
            d={m.marks.join(" ")}
            fill={m.severity === "error" || m.severity === "info" ? colour : "#fff"}
            stroke={m.severity === "error" ? SEVERITY_COLOUR.error : colour}
            strokeWidth={m.severity === "error" ? 1.8 : 1}
          />
        </g>
      );
    });
    const nodes = placed.drawn.map(({ item: it, x0, x1 }) => {
      if (dense && it.kind === "spur") return null;
      const y = rowY(it.row);
      if (it.link) {
        const list = linkPairs.get(it.link) ?? [];
        list.push({ x: (x0 + x1) / 2, y });
        linkPairs.set(it.link, list);
      }
      return (
        <ItemMark
          key={it.id}
          it={it}
          x0={x0}
          x1={x1}
          y={y}
          h={box.rowH - 3}
          boxY={box.y}
          boxH={box.h}
          selected={it.id === selectedId}
          onHover={onHover}
          onSelect={onSelect}
          onZoomToItem={onZoomToItem}
          onLoPointerDown={onLoPointerDown}
          onLoNudge={onLoNudge}
        />
      );
    });
    const links = [...linkPairs.values()]
      .filter((p) => p.length === 2)
      .map((p, i) => {
        const [a, b] = p as [{ x: number; y: number }, { x: number; y: number }];
        const yTop = a.y - 1;
        return (
          <path
            key={`link-${i}`}
            d={`M ${a.x} ${yTop} C ${a.x} ${yTop - 6}, ${b.x} ${yTop - 6}, ${b.x} ${yTop}`}
            fill="none"
            stroke="#1b4a50"
            strokeWidth={1}
            strokeDasharray="2 2"
            aria-hidden="true"
          />
        );
      });
    return (
      <g>
        {links}
        {denseNodes}
        {dense ? (
          <text x={inner - 4} y={box.y + box.h - 4} fontSize={9.5} fill="#6b7280" textAnchor="end">
            {spurCount} spur products drawn together: zoom in to reach each one, or use the table view
          </text>
        ) : null}
        {nodes}
        {placed.offLeft.length > 0 ? (
          <text
            x={4}
            y={box.y + box.h / 2 + 4}
            fontSize={10}
            fill="#2d545e"
            aria-label={`${placed.offLeft.length} items to the left`}
          >
            ◂ {placed.offLeft.length}
          </text>
        ) : null}
        {placed.offRight.length > 0 ? (
          <text
            x={inner - 4}
            y={box.y + box.h / 2 + 4}
            fontSize={10}
            fill="#2d545e"
            textAnchor="end"
            aria-label={`${placed.offRight.length} items to the right`}
          >
            {placed.offRight.length} ▸
          </text>
        ) : null}
      </g>
    );
  },
  (a, b) =>
    a.box === b.box &&
    a.domain[0] === b.domain[0] &&
    a.domain[1] === b.domain[1] &&
    a.inner === b.inner &&
    a.selectedId === b.selectedId &&
    a.onSelect === b.onSelect &&
    a.onLoNudge === b.onLoNudge &&
    a.onLoPointerDown === b.onLoPointerDown &&
    sameItems(a.items, b.items),
);

/** The lane view's chart: lanes stacked over a shared GHz axis and an IF axis, zoomable and pannable. */
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
  }, [inner]);

  // Background drag pans; LO drag moves the LO.
  const drag = useRef<
    | { kind: "pan"; axis: "ghz" | "if"; lastX: number; startX: number; pointer: number; captured: boolean }
    | { kind: "lo"; chain: string }
    | null
  >(null);
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
    [onLoDrag, onSelect],
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

  return (
    <div className="relative">
      <svg
        ref={svgRef}
        width={width}
        height={layout.height}
        role="group"
        aria-label="Lane view chart: RF, optical-offset and IF lanes. Tab to an item; Enter shows its details, Z zooms to it."
        className="select-none touch-none"
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={onPointerUp}
        onPointerCancel={() => (drag.current = null)}
        onClick={() => {
          if (!dragged.current) onSelect(null);
          dragged.current = false;
        }}
        data-testid="lane-chart"
      >
        <defs>
          <pattern
            id="hl-pat-protected"
            width="6"
            height="6"
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <rect width="6" height="6" fill="#f2f6f7" />
            <line x1="0" y1="0" x2="0" y2="6" stroke="#c5d3d8" strokeWidth="2" />
          </pattern>
          <pattern
            id="hl-pat-blocked"
            width="6"
            height="6"
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(-45)"
          >
            <rect width="6" height="6" fill="#f8e1df" />
            <line x1="0" y1="0" x2="0" y2="6" stroke="#d98c86" strokeWidth="2" />
          </pattern>
          <pattern id="hl-pat-cross" width="5" height="5" patternUnits="userSpaceOnUse">
            <path d="M0 0 L5 5 M5 0 L0 5" stroke={FAMILY_LOOK["carrier-beat"].colour} strokeWidth="0.8" />
          </pattern>
          <pattern id="hl-pat-diag" width="5" height="5" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1="0" y1="0" x2="0" y2="5" stroke={FAMILY_LOOK["lock-lo"].colour} strokeWidth="1.2" />
          </pattern>
          <pattern id="hl-pat-vert" width="4" height="4" patternUnits="userSpaceOnUse">
            <line x1="1" y1="0" x2="1" y2="4" stroke={FAMILY_LOOK["lock-self"].colour} strokeWidth="1" />
          </pattern>
          <pattern id="hl-pat-dots" width="4" height="4" patternUnits="userSpaceOnUse">
            <circle cx="2" cy="2" r="0.9" fill={FAMILY_LOOK.harmonic.colour} />
          </pattern>
          <pattern id="hl-pat-horiz" width="4" height="4" patternUnits="userSpaceOnUse">
            <line x1="0" y1="2" x2="4" y2="2" stroke={FAMILY_LOOK.intermod.colour} strokeWidth="0.9" />
          </pattern>
          <clipPath id="hl-clip">
            <rect x={-1} y={0} width={inner + 2} height={layout.height} />
          </clipPath>
        </defs>
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

function Tooltip({ hover }: { hover: Hover }) {
  const vw = typeof window === "undefined" ? 1200 : window.innerWidth;
  return (
    <div
      role="tooltip"
      className="pointer-events-none fixed z-20 max-w-xs rounded border border-ink-faint bg-white px-3 py-2 text-xs text-ink shadow-md"
      style={{ left: Math.min(hover.x + 14, vw - 300), top: hover.y + 14 }}
    >
      <div className="mb-1 font-semibold">{hover.item.label}</div>
      <table>
        <tbody>
          {hover.item.facts.map(([k, v]) => (
            <tr key={k}>
              <td className="pr-2 align-top text-ink-soft">{k}</td>
              <td className="tabular-nums">{v}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {hover.item.severity ? (
        <div className="mt-1" style={{ color: SEVERITY_COLOUR[hover.item.severity] }}>
          {hover.item.severity}: {hover.item.codes.join(", ")}
        </div>
      ) : null}
    </div>
  );
}

export { AXIS_H };
