import { KIND_LOOK, markerPath, orderShape } from "../../vocabulary";
import type { MarkCommon, MarkPlace } from "./types";

// Marks drawn as a vertical line: line centres and Nyquist edges across the
// lane, the carrier at 0, and the lock sidebands with their order marker.
// Render functions rather than components, so each item stays one component.

/** A line centre (with its diamond) or a Nyquist edge: a dashed line across the lane. */
export function lineMark({ it, x0, x1, y, h, boxY, boxH, selected }: MarkPlace, common: MarkCommon) {
  const look = KIND_LOOK[it.kind];
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
}

/** The carrier (laser 1) at offset 0. */
export function carrierMark({ it, x0, x1, boxY, boxH, selected }: MarkPlace, common: MarkCommon) {
  const look = KIND_LOOK[it.kind];
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
}

/** A lock sideband ±m·fm: a short line topped by its order's marker. */
export function lockSidebandMark({ it, x0, x1, y, h, selected }: MarkPlace, common: MarkCommon) {
  const look = KIND_LOOK[it.kind];
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
}
