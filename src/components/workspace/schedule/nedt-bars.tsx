"use client";

import { AxisLeft } from "@visx/axis";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar, Line } from "@visx/shape";
import type { ScheduleResult } from "@/lib/plan";

const W = 720;
const ROW = 30;
const M = { left: 70, right: 90, top: 6 };

/**
 * Per channel of a schedule, its worst NEΔT with the split as saved and,
 * when the result has one, with the best split (docs/plan-format.md §13.6),
 * against the channel's requirement (the vertical tick).
 */
export function NedtBars({ schedule }: { schedule: ScheduleResult }) {
  const rows = schedule.channels.map((c, i) => ({
    id: c.id,
    current: c.worstNedtK,
    best: schedule.bestSplit?.worstNedtK[i] ?? null,
    required: c.requiredNedtK,
  }));
  const max = Math.max(1e-9, ...rows.flatMap((r) => [r.current ?? 0, r.best ?? 0, r.required ?? 0])) * 1.1;
  const H = M.top + rows.length * ROW + 6;
  const x = scaleLinear({ domain: [0, max], range: [0, W - M.left - M.right] });
  const y = scaleBand({ domain: rows.map((r) => r.id), range: [0, rows.length * ROW], padding: 0.15 });
  const bh = y.bandwidth() / 2;
  return (
    <figure data-testid={`nedt-bars-${schedule.laser}`} className="space-y-1">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="w-full"
        role="img"
        aria-label="Worst NEΔT per channel against its requirement"
      >
        <Group left={M.left} top={M.top}>
          <AxisLeft scale={y} hideTicks tickLabelProps={{ fontSize: 11 }} />
          {rows.map((r) => {
            const top = y(r.id) ?? 0;
            const failing = (v: number | null) => r.required !== null && v !== null && v > r.required;
            return (
              <g key={r.id} data-bar-channel={r.id}>
                {r.current !== null ? (
                  <Bar x={0} y={top} width={x(r.current)} height={bh} fill={failing(r.current) ? "#b91c1c" : "#1d4ed8"}>
                    <title>{`${r.id} as saved: ${r.current.toFixed(3)} K`}</title>
                  </Bar>
                ) : null}
                {r.best !== null ? (
                  <Bar x={0} y={top + bh} width={x(r.best)} height={bh} fill={failing(r.best) ? "#fca5a5" : "#93c5fd"}>
                    <title>{`${r.id} with the best split: ${r.best.toFixed(3)} K`}</title>
                  </Bar>
                ) : null}
                {r.required !== null ? (
                  <Line
                    from={{ x: x(r.required), y: top - 2 }}
                    to={{ x: x(r.required), y: top + 2 * bh + 2 }}
                    stroke="#0f172a"
                    strokeWidth={2}
                  >
                    <title>{`required ${r.required} K`}</title>
                  </Line>
                ) : null}
                <text x={W - M.left - M.right + 6} y={top + bh} fontSize={10} fill="#475569">
                  {r.current !== null ? `${r.current.toFixed(2)} K` : "–"}
                  {r.best !== null ? ` → ${r.best.toFixed(2)} K` : ""}
                </text>
              </g>
            );
          })}
        </Group>
      </svg>
      <figcaption className="text-xs text-ink-soft">
        Worst NEΔT over the operating envelope: dark bars as saved, light bars with the best split; the black tick is
        the requirement (red: above it).
      </figcaption>
    </figure>
  );
}
