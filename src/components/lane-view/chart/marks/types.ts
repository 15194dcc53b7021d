import type React from "react";
import type { LaneItem } from "@/lib/lanes";

/** Where one item is drawn: its x span, its row (y, h) and its lane's box (boxY, boxH), in lane pixels. */
export interface MarkPlace {
  it: LaneItem;
  x0: number;
  x1: number;
  y: number;
  h: number;
  boxY: number;
  boxH: number;
  selected: boolean;
}

/** The props every mark's group carries: focus, name, hover, select, zoom and LO nudge (see `ItemMark`). */
export interface MarkCommon {
  tabIndex: number;
  role: "button";
  "aria-label": string;
  "data-item": string;
  "data-kind": LaneItem["kind"];
  className: string;
  onPointerEnter: (e: React.PointerEvent) => void;
  onPointerLeave: () => void;
  onFocus: (e: React.FocusEvent<SVGGElement>) => void;
  onBlur: () => void;
  onClick: (e: React.MouseEvent) => void;
  onKeyDown: (e: React.KeyboardEvent) => void;
}
