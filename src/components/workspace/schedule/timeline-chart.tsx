"use client";

import { AxisBottom } from "@visx/axis";
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import { Bar } from "@visx/shape";
import type { ScheduleResult } from "@/lib/plan";
import { timelineSegments } from "@/lib/schedule";

const W = 720;
const H = 86;
const M = { left: 8, right: 8, top: 8 };
const BAR_H = 34;

const FILL: Record<string, string> = { relock: "#b91c1c", retune: "#d97706", idle: "#e2e8f0" };
const DWELL_FILLS = ["#1d4ed8", "#0f766e", "#7c3aed", "#be185d", "#4d7c0f", "#0369a1"];

/**
 * One cycle of a laser pair's schedule (docs/plan-format.md §13.3): each
 * dwell's relock, retune and usable time in order, then the idle rest, on a
 * millisecond axis.
 */
export function TimelineChart({ schedule }: { schedule: ScheduleResult }) {
  const segs = timelineSegments(schedule);
  const x = scaleLinear({ domain: [0, schedule.cycleMs], range: [0, W - M.left - M.right] });
  const colour = new Map(schedule.dwells.map((d, j) => [d.chain, DWELL_FILLS[j % DWELL_FILLS.length]!]));
  return (
    <figure data-testid={`timeline-${schedule.laser}`} className="space-y-1">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="w-full"
        role="img"
        aria-label={`One ${schedule.cycleMs} ms cycle of laser pair ${schedule.laser}`}
      >
        <Group left={M.left} top={M.top}>
          {segs.map((s, i) => {
            const w = Math.max(0.5, x(s.endMs) - x(s.startMs));
            const fill = s.kind === "dwell" ? colour.get(s.chain ?? "") : FILL[s.kind];
            return (
              <g key={i} data-kind={s.kind}>
                <Bar x={x(s.startMs)} y={0} width={w} height={BAR_H} fill={fill} stroke="white" strokeWidth={0.5}>
                  <title>{`${s.kind === "dwell" ? `dwell on ${s.chain}` : s.kind === "idle" ? "idle" : `${s.kind} into ${s.chain}`}: ${(s.endMs - s.startMs).toFixed(3)} ms`}</title>
                </Bar>
                {s.kind === "dwell" && w > 40 ? (
                  <text x={x(s.startMs) + w / 2} y={BAR_H / 2 + 4} textAnchor="middle" fontSize={11} fill="white">
                    {s.chain}
                  </text>
                ) : null}
              </g>
            );
          })}
          <AxisBottom
            top={BAR_H + 2}
            scale={x}
            numTicks={8}
            tickFormat={(v) => `${Number(v)}`}
            tickLabelProps={{ fontSize: 10 }}
            label="ms"
            labelProps={{ fontSize: 10 }}
          />
        </Group>
      </svg>
      <figcaption className="flex flex-wrap gap-3 text-xs text-ink-soft">
        <Legend fill={FILL.relock!}>relock</Legend>
        <Legend fill={FILL.retune!}>retune</Legend>
        {schedule.dwells.map((d) => (
          <Legend key={d.chain} fill={colour.get(d.chain)!}>
            {d.chain}: {(d.dutyCycle * 100).toFixed(1)} % duty
          </Legend>
        ))}
        {schedule.idleMs > 0 ? <Legend fill={FILL.idle!}>idle {schedule.idleMs.toFixed(3)} ms</Legend> : null}
      </figcaption>
    </figure>
  );
}

function Legend({ fill, children }: { fill: string; children: React.ReactNode }) {
  return (
    <span className="inline-flex items-center gap-1">
      <span aria-hidden className="inline-block h-2.5 w-2.5 rounded-sm" style={{ background: fill }} />
      {children}
    </span>
  );
}
