import { formatTicks, type Domain } from "@/lib/lanes";
import { MARGIN_LEFT, MARGIN_RIGHT } from "../layout";

/** A frequency axis across the chart: ticks, labels and its title with the unit in use. */
export function Axis({ domain, width, y, title }: { domain: Domain; width: number; y: number; title: string }) {
  const inner = width - MARGIN_LEFT - MARGIN_RIGHT;
  const set = formatTicks(domain, Math.max(3, Math.floor(inner / 90)));
  const k = inner / (domain[1] - domain[0]);
  return (
    <g transform={`translate(${MARGIN_LEFT},${y})`} aria-hidden="true">
      <line x1={0} x2={inner} y1={0} y2={0} stroke="#12343b" strokeWidth={1} />
      {set.ticks.map((t) => {
        const x = (t.value - domain[0]) * k;
        return (
          <g key={t.value} transform={`translate(${x},0)`}>
            <line y1={0} y2={-5} stroke="#12343b" />
            <text y={-8} textAnchor="middle" fontSize={11} fill="#12343b">
              {t.label}
            </text>
          </g>
        );
      })}
      <text x={-10} y={-8} textAnchor="end" fontSize={11} fill="#2d545e" fontWeight={600}>
        {title} ({set.unit === "MHz" ? `MHz from ${set.anchorLabel}` : "GHz"})
      </text>
    </g>
  );
}
