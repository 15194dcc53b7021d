import { memo } from "react";
import type React from "react";
import { visibleItems, type Domain, type LaneItem } from "@/lib/lanes";
import { ROW_PAD, type LaneBox } from "../layout";
import { DENSE_SPURS, DenseSpurs } from "./marks/dense-spurs";
import { ItemMark } from "./marks/item-mark";
import type { Hover } from "./tooltip";

/** Items narrower than this many pixels are widened to it, so every item stays visible and clickable. */
const MIN_PX = 2;

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

/**
 * One lane's items in view, the links between paired items (a DSB
 * channel's two bands), merged spurs when there are too many to draw one
 * by one, and counts of the items off either edge. Re-rendered only when
 * its items, the view or the selection change.
 */
export const LaneRows = memo(
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
        {dense ? <DenseSpurs drawn={placed.drawn} rowY={rowY} rowH={box.rowH} /> : null}
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
