import type React from "react";
import type { LaneItem } from "@/lib/lanes";
import { KIND_LOOK, SEVERITY_COLOUR } from "../../vocabulary";
import { itemAria } from "./item-aria";
import type { MarkCommon, MarkPlace } from "./types";

/** The LO (laser 2): a line with a handle, dragged with the pointer or moved with the arrow keys. */
export function loMark(
  { it, x0, x1, y, h, boxY, boxH, selected }: MarkPlace,
  common: MarkCommon,
  onLoPointerDown: ((item: LaneItem, e: React.PointerEvent) => void) | undefined,
) {
  const look = KIND_LOOK[it.kind];
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
