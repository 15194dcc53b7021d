import type { LaneItem } from "@/lib/lanes";
import { markerPathAt, orderShape } from "../../vocabulary";
import { spurFamilyLook, spurMarkerPaint } from "./spur-look";

/** Above this many visible spur products in one lane, they are drawn as merged paths (zoom in, or use the table view, to reach each one). */
export const DENSE_SPURS = 120;

interface Merged {
  family: LaneItem["family"];
  severity: LaneItem["severity"];
  bands: string[];
  marks: string[];
}

/**
 * A dense lane's spurs drawn together: one band path and one marker path per
 * family and severity, not focusable (too many to tab through).
 */
export function DenseSpurs({
  drawn,
  rowY,
  rowH,
}: {
  drawn: readonly { item: LaneItem; x0: number; x1: number }[];
  rowY: (row: number) => number;
  rowH: number;
}) {
  const merged = new Map<string, Merged>();
  for (const { item: it, x0, x1 } of drawn) {
    if (it.kind !== "spur") continue;
    const key = `${it.family}|${it.severity}`;
    const m = merged.get(key) ?? { family: it.family, severity: it.severity, bands: [], marks: [] };
    const y = rowY(it.row);
    const h = rowH - 3;
    if (x1 - x0 > 6) m.bands.push(`M ${x0.toFixed(1)} ${y + 1} H ${x1.toFixed(1)} V ${y + h - 1} H ${x0.toFixed(1)} Z`);
    m.marks.push(markerPathAt(orderShape(it.order), (x0 + x1) / 2, y + h / 2, 3));
    merged.set(key, m);
  }
  return [...merged.entries()].map(([key, m]) => {
    const { colour, pattern } = spurFamilyLook(m.family);
    const paint = spurMarkerPaint(m.severity, colour);
    return (
      <g key={`dense-${key}`} aria-hidden="true">
        {m.bands.length ? (
          <path d={m.bands.join(" ")} fill={`url(#${pattern})`} stroke={colour} strokeWidth={0.8} />
        ) : null}
        <path d={m.marks.join(" ")} fill={paint.fill} stroke={paint.stroke} strokeWidth={paint.strokeWidth} />
      </g>
    );
  });
}
