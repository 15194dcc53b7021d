"use client";

import { useId, useState } from "react";
import { AxisBottom, AxisLeft } from "@visx/axis";
import { scaleLinear } from "@visx/scale";
import { envelopePlot, type EnvelopePanel } from "@/lib/lanes";
import type { EnvelopeCurve } from "@/lib/plan";
import { fmtNumber } from "./format";

const WIDTH = 360;
const PANEL = 92;
const GAP = 30;
const M = { left: 52, right: 12, top: 16, bottom: 46 };
const COLOUR = { curve: "#12343b", limit: "#b3261e", envelope: "#d7e8e4", cursor: "#a15c00" };

const AXIS_LABEL = { lo: "LO shift u (MHz)", temperature: "Resonator temperature offset t (K)" } as const;

/**
 * One channel's NEΔT (top panel) and mode response (bottom panel) against
 * the LO shift or the temperature offset, with the requirement and the
 * half-power limit as dashed lines and the operating envelope shaded
 * (docs/decisions/029). With `interactive`, the figure takes keyboard focus
 * and the arrow keys move a cursor whose values are read out; a table of the
 * same points is given beside it. Static SVG otherwise (the printed report).
 */
export function ChannelEnvelopePlot({
  curve,
  title,
  interactive = true,
}: {
  curve: EnvelopeCurve;
  title: string;
  interactive?: boolean;
}) {
  const inner = { width: WIDTH - M.left - M.right, height: PANEL };
  const plot = envelopePlot(curve, inner);
  const x = scaleLinear({ domain: [...plot.xDomain], range: [0, inner.width] });
  const [cursor, setCursor] = useState<number | null>(null);
  const id = useId();
  const height = M.top + 2 * PANEL + GAP + M.bottom;
  const p = cursor === null ? null : curve.points[cursor];
  const unit = curve.unit;
  const readout = p
    ? `${curve.axis === "lo" ? "u" : "t"} = ${fmtNumber(p.x, 3)} ${unit}: NEΔT ${p.nedtK === null ? "none" : `${fmtNumber(p.nedtK, 3)} K`}, mode response ${fmtNumber(p.modeResponse, 4)}`
    : "Focus the plot and use the arrow keys to read values.";
  const summary = `${title}: NEΔT and mode response against ${AXIS_LABEL[curve.axis]}, envelope ±${fmtNumber(curve.envelope[1], 3)} ${unit}${
    curve.requiredNedtK === null ? "" : `, requirement ${curve.requiredNedtK} K`
  }.`;
  return (
    <figure className="text-xs" data-testid={`envelope-plot-${curve.channelId}-${curve.axis}`}>
      <figcaption className="font-semibold">{title}</figcaption>
      <svg
        width={WIDTH}
        height={height}
        role="img"
        aria-label={summary}
        aria-describedby={interactive ? `${id}-readout` : undefined}
        tabIndex={interactive ? 0 : undefined}
        className="focus:outline focus:outline-2 focus:outline-ink"
        onKeyDown={
          interactive
            ? (e) => {
                const n = curve.points.length;
                const step = e.shiftKey ? 10 : 1;
                const at = cursor ?? Math.floor(n / 2);
                let next: number | null = null;
                if (e.key === "ArrowRight") next = Math.min(n - 1, cursor === null ? at : at + step);
                else if (e.key === "ArrowLeft") next = Math.max(0, cursor === null ? at : at - step);
                else if (e.key === "Home") next = 0;
                else if (e.key === "End") next = n - 1;
                else if (e.key === "Escape") setCursor(null);
                if (next !== null) {
                  e.preventDefault();
                  setCursor(next);
                }
              }
            : undefined
        }
        onBlur={interactive ? () => setCursor(null) : undefined}
      >
        <Panel
          top={M.top}
          panel={plot.nedt}
          envelopePx={plot.envelopePx}
          label="NEΔT (K)"
          limitLabel={curve.requiredNedtK === null ? null : `required ${curve.requiredNedtK} K`}
          width={inner.width}
          cursorX={p ? x(p.x) : null}
        />
        <Panel
          top={M.top + PANEL + GAP}
          panel={plot.mode}
          envelopePx={plot.envelopePx}
          label="Mode response"
          limitLabel="half power"
          width={inner.width}
          cursorX={p ? x(p.x) : null}
        />
        <AxisBottom
          top={M.top + 2 * PANEL + GAP}
          left={M.left}
          scale={x}
          numTicks={6}
          label={AXIS_LABEL[curve.axis]}
          labelOffset={16}
          labelProps={{ fontSize: 11, fill: "#2d545e", textAnchor: "middle" }}
          tickLabelProps={{ fontSize: 10, fill: "#12343b" }}
          stroke="#12343b"
          tickStroke="#12343b"
        />
      </svg>
      {plot.nedt.clipped > 0 ? (
        <p className="text-ink-soft">
          {plot.nedt.clipped} points above {fmtNumber(plot.nedt.domain[1], 3)} K are drawn on the top edge.
        </p>
      ) : null}
      {interactive ? (
        <>
          <p id={`${id}-readout`} aria-live="polite" className="tabular-nums text-ink-soft">
            {readout}
          </p>
          <details>
            <summary className="cursor-pointer">Table of the plotted values</summary>
            <CurveTable curve={curve} />
          </details>
        </>
      ) : null}
    </figure>
  );
}

function Panel({
  top,
  panel,
  envelopePx,
  label,
  limitLabel,
  width,
  cursorX,
}: {
  top: number;
  panel: EnvelopePanel;
  envelopePx: readonly [number, number];
  label: string;
  limitLabel: string | null;
  width: number;
  cursorX: number | null;
}) {
  const y = scaleLinear({ domain: [...panel.domain], range: [PANEL, 0] });
  return (
    <g transform={`translate(${M.left},${top})`}>
      <rect
        x={envelopePx[0]}
        width={Math.max(0, envelopePx[1] - envelopePx[0])}
        y={0}
        height={PANEL}
        fill={COLOUR.envelope}
      >
        <title>Operating envelope</title>
      </rect>
      <rect x={0} y={0} width={width} height={PANEL} fill="none" stroke="#c5d6d3" />
      {panel.limitY !== null ? (
        <g>
          <line x1={0} x2={width} y1={panel.limitY} y2={panel.limitY} stroke={COLOUR.limit} strokeDasharray="4 3" />
          {limitLabel ? (
            <text x={width - 2} y={panel.limitY - 3} textAnchor="end" fontSize={9} fill={COLOUR.limit}>
              {limitLabel}
            </text>
          ) : null}
        </g>
      ) : null}
      <path d={panel.path} fill="none" stroke={COLOUR.curve} strokeWidth={1.6} />
      {cursorX !== null ? <line x1={cursorX} x2={cursorX} y1={0} y2={PANEL} stroke={COLOUR.cursor} /> : null}
      <AxisLeft
        scale={y}
        numTicks={4}
        label={label}
        labelOffset={34}
        labelProps={{ fontSize: 11, fill: "#2d545e", textAnchor: "middle" }}
        tickLabelProps={{ fontSize: 10, fill: "#12343b" }}
        stroke="#12343b"
        tickStroke="#12343b"
      />
    </g>
  );
}

/** Every fifth point of the curve and the envelope's ends, as a table (the plot's text alternative). */
export function CurveTable({ curve }: { curve: EnvelopeCurve }) {
  const n = curve.points.length;
  const stride = Math.max(1, Math.round((n - 1) / 20));
  const rows = curve.points.filter((pt, i) => i % stride === 0 || i === n - 1 || curve.envelope.includes(pt.x));
  return (
    <table className="mt-1 text-xs tabular-nums">
      <thead>
        <tr>
          <th scope="col" className="px-1 text-left">
            {curve.axis === "lo" ? "u (MHz)" : "t (K)"}
          </th>
          <th scope="col" className="px-1 text-left">
            NEΔT (K)
          </th>
          <th scope="col" className="px-1 text-left">
            Mode response
          </th>
          <th scope="col" className="px-1 text-left">
            In envelope
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map((pt) => (
          <tr key={pt.x}>
            <td className="px-1">{fmtNumber(pt.x, 3)}</td>
            <td className="px-1">{pt.nedtK === null ? "—" : fmtNumber(pt.nedtK, 3)}</td>
            <td className="px-1">{fmtNumber(pt.modeResponse, 4)}</td>
            <td className="px-1">{pt.x >= curve.envelope[0] && pt.x <= curve.envelope[1] ? "yes" : "no"}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
