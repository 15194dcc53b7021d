import { markerPath, orderShape } from "../../vocabulary";
import { spurFamilyLook, spurMarkerPaint } from "./spur-look";
import type { MarkCommon, MarkPlace } from "./types";

/** One spur product: its band (when wide enough to see) in the family's pattern and its order's marker. */
export function spurMark({ it, x0, x1, y, h, selected }: MarkPlace, common: MarkCommon) {
  const { colour, pattern } = spurFamilyLook(it.family);
  const cx = (x0 + x1) / 2;
  const wide = x1 - x0 > 6;
  const paint = spurMarkerPaint(it.severity, colour);
  return (
    <g {...common}>
      {wide ? (
        <rect
          x={x0}
          y={y + 1}
          width={x1 - x0}
          height={h - 2}
          fill={`url(#${pattern})`}
          stroke={colour}
          strokeWidth={0.8}
        />
      ) : null}
      <path
        d={markerPath(orderShape(it.order), 3)}
        transform={`translate(${cx},${y + h / 2})`}
        fill={paint.fill}
        stroke={paint.stroke}
        strokeWidth={paint.strokeWidth}
      />
      {selected ? (
        <rect x={x0 - 2} y={y - 1} width={x1 - x0 + 4} height={h + 2} fill="none" stroke="#111" strokeWidth={1.5} />
      ) : null}
    </g>
  );
}
