import type { Interval } from "@/queries/types";
import { formatGHz } from "../format";

/** Draws the current and the uploaded reach on one offset axis. */
export function ReachStrip({ current, next }: { current: Interval[]; next: Interval[] }) {
  const all = [...current, ...next];
  if (all.length === 0) return null;
  const lo = Math.min(...all.map((i) => i.minGHz));
  const hi = Math.max(...all.map((i) => i.maxGHz));
  const span = hi - lo || 1;
  const x = (v: number) => 8 + ((v - lo) / span) * 584;
  const row = (ivs: Interval[], y: number, cls: string) =>
    ivs.map((i, n) => (
      <rect
        key={n}
        x={x(i.minGHz)}
        y={y}
        width={Math.max(1.5, x(i.maxGHz) - x(i.minGHz))}
        height={12}
        className={cls}
      />
    ));
  return (
    <svg
      viewBox="0 0 600 58"
      className="w-full max-w-xl"
      role="img"
      aria-label="Current reach above, uploaded tuning map below"
    >
      <text x={8} y={10} className="fill-ink-soft text-[9px]">
        now
      </text>
      {row(current, 13, "fill-ink/30")}
      <text x={8} y={37} className="fill-ink-soft text-[9px]">
        uploaded
      </text>
      {row(next, 40, "fill-lane-optical")}
      <text x={8} y={58} className="fill-ink-soft text-[9px]">
        {formatGHz(lo, 2)} GHz
      </text>
      <text x={592} y={58} textAnchor="end" className="fill-ink-soft text-[9px]">
        {formatGHz(hi, 2)} GHz
      </text>
    </svg>
  );
}
