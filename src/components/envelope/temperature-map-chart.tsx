"use client";

import { AxisBottom, AxisLeft } from "@visx/axis";
import { scaleLinear } from "@visx/scale";
import type { TemperatureCells, TemperatureCellState } from "@/lib/lanes";
import type { TemperatureMap } from "@/lib/plan";
import { fmtNumber, fmtWindow } from "./format";

const WIDTH = 560;
const HEIGHT = 220;
const M = { left: 56, right: 70, top: 12, bottom: 38 };

export const CELL_LOOK: Record<TemperatureCellState, { fill: string; name: string }> = {
  feasible: { fill: "#8fc9a8", name: "feasible LO offsets" },
  excluded: { fill: "#e4e1dc", name: "excluded by a map rule" },
  temperature: { fill: "#e8a9a3", name: "no LO passes (mode-detuned or centre-drift)" },
};

export interface TemperatureChartProps {
  map: TemperatureMap;
  cells: TemperatureCells;
  /** The chain's LO offset (GHz). */
  loGHz: number;
  /** The exact temperature window (K) and margin from the result. */
  windowK: readonly (readonly [number, number])[];
  marginK: number | null;
  /** Keyboard focus and the table alternative (off in the printed report). */
  interactive?: boolean;
}

/**
 * The chain's feasibility map over LO offset (x, GHz) and resonator
 * temperature offset (y, K) (docs/decisions/029): each row of the engine's
 * temperature map drawn as a strip of feasible and excluded LO offsets, the
 * chain's LO as a vertical line, its temperature control ±Te as dashed
 * lines, and the exact temperature window (which also holds the NEΔT
 * requirement, not a rule of the map) as a bar at the right.
 */
export function TemperatureMapChart({
  map,
  cells,
  loGHz,
  windowK,
  marginK,
  interactive = true,
}: TemperatureChartProps) {
  const w = WIDTH - M.left - M.right;
  const h = HEIGHT - M.top - M.bottom;
  const x = scaleLinear({ domain: [...cells.loDomain], range: [0, w] });
  const y = scaleLinear({ domain: [...cells.temperatureDomain], range: [h, 0] });
  const clampY = (t: number) => y(Math.min(cells.temperatureDomain[1], Math.max(cells.temperatureDomain[0], t)));
  const te = map.excursionK;
  const summary = `Chain ${map.chainId}: feasibility over LO offset and resonator temperature offset. LO ${fmtNumber(loGHz, 7)} GHz, temperature control ±${fmtNumber(te, 3)} K, temperature window ${fmtWindow(windowK)}${
    marginK === null ? "" : `, margin ${fmtNumber(marginK, 3)} K`
  }.`;
  return (
    <figure className="text-xs" data-testid={`temperature-map-${map.chainId}`}>
      <figcaption className="font-semibold">Chain {map.chainId}: LO offset × resonator temperature</figcaption>
      <svg
        width={WIDTH}
        height={HEIGHT}
        role="img"
        aria-label={summary}
        tabIndex={interactive ? 0 : undefined}
        className="focus:outline focus:outline-2 focus:outline-ink"
      >
        <g transform={`translate(${M.left},${M.top})`}>
          {cells.cells.map((c, i) => {
            const x0 = x(Math.max(cells.loDomain[0], c.loGHz[0]));
            const x1 = x(Math.min(cells.loDomain[1], c.loGHz[1]));
            const y0 = y(c.temperatureK[1]);
            const y1 = y(c.temperatureK[0]);
            return (
              <rect
                key={i}
                x={x0}
                width={Math.max(0.5, x1 - x0)}
                y={y0}
                height={Math.max(0.5, y1 - y0)}
                fill={CELL_LOOK[c.state].fill}
              >
                <title>
                  {`${fmtNumber(c.loGHz[0], 6)}–${fmtNumber(c.loGHz[1], 6)} GHz at ${fmtNumber((c.temperatureK[0] + c.temperatureK[1]) / 2, 3)} K: ${CELL_LOOK[c.state].name}${c.codes.length ? ` (${c.codes.join(", ")})` : ""}`}
                </title>
              </rect>
            );
          })}
          {
            <g stroke="#12343b" strokeDasharray="5 3">
              <line x1={0} x2={w} y1={clampY(te)} y2={clampY(te)} />
              <line x1={0} x2={w} y1={clampY(-te)} y2={clampY(-te)} />
            </g>
          }
          <text x={w + 4} y={clampY(te) - 2} fontSize={9} fill="#12343b">
            +Te
          </text>
          <text x={w + 4} y={clampY(-te) + 9} fontSize={9} fill="#12343b">
            −Te
          </text>
          <line x1={x(loGHz)} x2={x(loGHz)} y1={0} y2={h} stroke="#a15c00" strokeWidth={2}>
            <title>{`LO ${fmtNumber(loGHz, 7)} GHz`}</title>
          </line>
          {windowK.map(([a, b], i) => (
            <rect key={i} x={w + 30} width={8} y={clampY(b)} height={Math.max(1, clampY(a) - clampY(b))} fill="#2e7d32">
              <title>{`Temperature window ${fmtNumber(a, 4)} to ${fmtNumber(b, 4)} K`}</title>
            </rect>
          ))}
          <text x={w + 34} y={h + 12} fontSize={9} textAnchor="middle" fill="#2e7d32">
            window
          </text>
          <AxisLeft
            scale={y}
            numTicks={5}
            label="Temperature offset t (K)"
            labelOffset={36}
            labelProps={{ fontSize: 11, fill: "#2d545e", textAnchor: "middle" }}
            tickLabelProps={{ fontSize: 10, fill: "#12343b" }}
            stroke="#12343b"
            tickStroke="#12343b"
          />
          <AxisBottom
            top={h}
            scale={x}
            numTicks={7}
            label="LO offset L (GHz)"
            labelProps={{ fontSize: 11, fill: "#2d545e", textAnchor: "middle" }}
            tickLabelProps={{ fontSize: 10, fill: "#12343b" }}
            stroke="#12343b"
            tickStroke="#12343b"
          />
        </g>
      </svg>
      <ul className="mt-1 flex flex-wrap gap-3">
        {Object.values(CELL_LOOK).map((l) => (
          <li key={l.name} className="flex items-center gap-1">
            <span className="inline-block h-3 w-3" style={{ background: l.fill }} aria-hidden="true" />
            {l.name}
          </li>
        ))}
        <li>dashed: ±Te · orange: the LO · green bar: the exact temperature window</li>
      </ul>
      <p className="text-ink-soft">
        The map holds the feasibility-map rules and the temperature rules; the NEΔT requirement is not a map rule, so
        the window bar (from the full check) may be narrower than the green at the LO.
      </p>
      {interactive ? (
        <details>
          <summary className="cursor-pointer">Table of the map</summary>
          <table className="mt-1 text-xs tabular-nums">
            <thead>
              <tr>
                {["t (K)", "LO passes", "Feasible LO offsets (GHz)", "Temperature rules failing"].map((hd) => (
                  <th key={hd} scope="col" className="px-1 text-left">
                    {hd}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {map.rows.map((r) => (
                <tr key={r.temperatureOffsetK}>
                  <td className="px-1">{fmtNumber(r.temperatureOffsetK, 4)}</td>
                  <td className="px-1">{cells.passingRowsK.includes(r.temperatureOffsetK) ? "yes" : "no"}</td>
                  <td className="px-1">
                    {r.feasibleGHz.length
                      ? r.feasibleGHz.map(([a, b]) => `${fmtNumber(a, 6)}–${fmtNumber(b, 6)}`).join(", ")
                      : "none"}
                  </td>
                  <td className="px-1">{r.temperatureCodes.join(", ") || "none"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      ) : null}
    </figure>
  );
}
