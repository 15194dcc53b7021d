import type { LaneItem } from "@/lib/lanes";
import { SEVERITY_COLOUR } from "../vocabulary";

/** The item under the pointer (or focused) and where to show its tooltip, in viewport pixels. */
export interface Hover {
  item: LaneItem;
  x: number;
  y: number;
}

/** An item's facts and findings beside the pointer. */
export function Tooltip({ hover }: { hover: Hover }) {
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
