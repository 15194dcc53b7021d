import { KIND_LOOK, SEVERITY_COLOUR } from "../../vocabulary";
import type { MarkCommon, MarkPlace } from "./types";

/**
 * Every other item: a band from x0 to x1. Background bands (reach, detector
 * band, RF input, protected band) are square and keep their own outline;
 * the others are rounded and outlined in their finding's colour. A
 * protected band fills its whole lane.
 */
export function bandMark({ it, x0, x1, y, h, boxY, boxH, selected }: MarkPlace, common: MarkCommon) {
  const look = KIND_LOOK[it.kind];
  const sevStroke = it.severity ? SEVERITY_COLOUR[it.severity] : look.stroke;
  const outline = selected ? { stroke: "#111", strokeWidth: 2 } : {};
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
