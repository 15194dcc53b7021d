import { memo } from "react";
import type React from "react";
import type { LaneItem } from "@/lib/lanes";
import type { Hover } from "../tooltip";
import { bandMark } from "./band-mark";
import { itemAria } from "./item-aria";
import { carrierMark, lineMark, lockSidebandMark } from "./line-marks";
import { loMark } from "./lo-mark";
import { spurMark } from "./spur-mark";
import type { MarkCommon, MarkPlace } from "./types";

export interface ItemMarkProps extends MarkPlace {
  onHover: (h: Hover | null) => void;
  onSelect: (item: LaneItem) => void;
  onZoomToItem: (item: LaneItem) => void;
  onLoPointerDown?: (item: LaneItem, e: React.PointerEvent) => void;
  onLoNudge?: (chain: string, steps: number) => void;
}

/**
 * One item of a lane, focusable and named for screen readers: hover or
 * focus shows its tooltip, a click or Enter selects it, Z zooms to it, and
 * on the LO the arrow keys nudge it by one tuning step (shift: 100). Skipped
 * on re-render when its place, look and findings are unchanged.
 */
export const ItemMark = memo(
  function ItemMark({ onHover, onSelect, onZoomToItem, onLoPointerDown, onLoNudge, ...place }: ItemMarkProps) {
    const { it } = place;
    const common: MarkCommon = {
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
    switch (it.kind) {
      case "line-centre":
      case "nyquist-edge":
        return lineMark(place, common);
      case "carrier":
        return carrierMark(place, common);
      case "lock-sideband":
        return lockSidebandMark(place, common);
      case "lo":
        return loMark(place, common, onLoPointerDown);
      case "spur":
        return spurMark(place, common);
      default:
        return bandMark(place, common);
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
