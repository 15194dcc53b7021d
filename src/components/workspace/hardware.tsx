"use client";

import { OpticalFrequency } from "@/components/tools";
import { fmtNumber, fmtWindow } from "@/components/envelope/format";
import { placeReasonText } from "@/lib/plan";
import type { Chain, ChainResult, Detector, Laser, Resonator } from "@/queries/types";
import { formatGHz, formatInterval, formatMHz, formatNumber, formatQ } from "./format";
import { LASER_HEADERS, laserCells } from "./laser-cells";
import { buttonClass, Empty, LaserSafetyNote } from "./ui";

function Dl({ rows }: { rows: [string, React.ReactNode][] }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-soft">{k}</dt>
          <dd className="tabular-nums">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

function ItemHeader({ title, onEdit, label }: { title: string; onEdit?: () => void; label: string }) {
  return (
    <div className="mb-1 flex items-center justify-between">
      <h3 className="font-semibold">{title}</h3>
      {onEdit ? (
        <button type="button" className={buttonClass.quiet} onClick={onEdit} aria-label={`Edit ${label} ${title}`}>
          Edit
        </button>
      ) : null}
    </div>
  );
}

const th = "whitespace-nowrap px-2 py-1 text-left text-xs font-medium text-ink-soft";
const td = "whitespace-nowrap px-2 py-1.5 tabular-nums align-top";
/** The overview's cell styles of a laser-pair row: the key stands out, the reach may wrap. */
const LASER_CELL_CLASS = [`${td} font-medium`, td, td, td, `${td} whitespace-normal`, td, td, td];

function EditCell({ onEdit, label }: { onEdit?: () => void; label: string }) {
  return onEdit ? (
    <td className="px-1 py-1 text-right">
      <button type="button" className={buttonClass.quiet} onClick={onEdit} aria-label={label}>
        Edit
      </button>
    </td>
  ) : null;
}

type Editable<T> = (row: T) => (() => void) | undefined;

export function LaserTable({ lasers, onEdit }: { lasers: Laser[]; onEdit: Editable<Laser> }) {
  if (lasers.length === 0) return <Empty>No laser pair yet.</Empty>;
  return (
    <>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" data-testid="lasers-table">
          <thead>
            <tr className="border-b border-ink/20">
              {LASER_HEADERS.map((h) => (
                <th key={h} className={th}>
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {lasers.map((l) => (
              <tr key={l.id} className="border-b border-ink/10">
                {laserCells(l).map((cell, i) => (
                  <td key={LASER_HEADERS[i]} className={LASER_CELL_CLASS[i]}>
                    {cell}
                  </td>
                ))}
                <EditCell onEdit={onEdit(l)} label={`Edit laser pair ${l.key}`} />
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <LaserSafetyNote className="mt-2" />
    </>
  );
}

export function ResonatorTable({
  resonators,
  linewidthMHz,
  onEdit,
  loading = false,
}: {
  loading?: boolean;
  resonators: Resonator[];
  linewidthMHz: (r: Resonator) => number | null | undefined;
  onEdit: Editable<Resonator>;
}) {
  if (loading) return null;
  if (resonators.length === 0) return <Empty>No resonator yet.</Empty>;
  return (
    <table className="w-full border-collapse text-sm" data-testid="resonators-table">
      <thead>
        <tr className="border-b border-ink/20">
          <th className={th}>Resonator</th>
          <th className={th}>FSR (GHz)</th>
          <th className={th}>Loaded Q</th>
          <th className={th}>Linewidth (MHz)</th>
        </tr>
      </thead>
      <tbody>
        {resonators.map((r) => (
          <tr key={r.id} className="border-b border-ink/10">
            <td className={`${td} font-medium`}>{r.key}</td>
            <td className={td}>{formatGHz(r.fsrGHz)}</td>
            <td className={td}>{formatQ(r.loadedQ)}</td>
            <td className={td}>{formatMHz(linewidthMHz(r), 2)}</td>
            <EditCell onEdit={onEdit(r)} label={`Edit resonator ${r.key}`} />
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function DetectorTable({ detectors, onEdit }: { detectors: Detector[]; onEdit: Editable<Detector> }) {
  if (detectors.length === 0) return <Empty>No detector yet.</Empty>;
  return (
    <>
      <table className="w-full border-collapse text-sm" data-testid="detectors-table">
        <thead>
          <tr className="border-b border-ink/20">
            <th className={th}>Detector</th>
            <th className={th}>IF band (GHz)</th>
            <th className={th}>Max input per photodiode (mW)</th>
            <th className={th}>Sample rate (GHz)</th>
          </tr>
        </thead>
        <tbody>
          {detectors.map((d) => (
            <tr key={d.id} className="border-b border-ink/10">
              <td className={`${td} font-medium`}>{d.key}</td>
              <td className={td}>{formatInterval([d.minGHz, d.maxGHz], "")}</td>
              <td className={td}>{formatNumber(d.maxInputMW, 2)}</td>
              <td className={td}>{d.sampleRateGHz === null ? "not sampled" : formatGHz(d.sampleRateGHz)}</td>
              <EditCell onEdit={onEdit(d)} label={`Edit detector ${d.key}`} />
            </tr>
          ))}
        </tbody>
      </table>
      <LaserSafetyNote className="mt-2" />
    </>
  );
}

export function ChainItem({
  chain,
  result,
  keys,
  carrierTHz,
  fsrGHz,
  onEdit,
}: {
  chain: Chain;
  result: ChainResult | undefined;
  keys: { laser: string; resonator: string; detector: string };
  /** The chain's laser-pair carrier, to show the LO as an optical frequency. */
  carrierTHz?: number;
  /** The chain's resonator FSR, to show the wanted sideband's mode as an optical frequency. */
  fsrGHz?: number;
  onEdit?: () => void;
}) {
  return (
    <div className="rounded border border-ink/10 p-3" data-chain={chain.key}>
      <ItemHeader title={`Chain ${chain.key}`} onEdit={onEdit} label="chain" />
      <Dl
        rows={[
          ["Hardware", `${keys.laser} · ${keys.resonator} · ${keys.detector}`],
          ["Mode · sideband", `k = ${chain.mode}, ${chain.sideband}`],
          ["LO offset", `${formatGHz(chain.loOffsetGHz)} GHz`],
          ...(carrierTHz !== undefined
            ? ([["LO (laser 2)", <OpticalFrequency key="lo" thz={loTHz(carrierTHz, chain.loOffsetGHz)} />]] as [
                string,
                React.ReactNode,
              ][])
            : []),
          ...(carrierTHz !== undefined && fsrGHz !== undefined
            ? ([
                [
                  "Sideband mode",
                  <OpticalFrequency
                    key="sb"
                    thz={loTHz(carrierTHz, (chain.sideband === "upper" ? 1 : -1) * chain.mode * fsrGHz)}
                  />,
                ],
              ] as [string, React.ReactNode][])
            : []),
          ["RF input", formatInterval([chain.rfInput.minGHz, chain.rfInput.maxGHz])],
          [
            "Path",
            `tap ${formatNumber(chain.tapFraction, 3)}, loss ${formatNumber(chain.pathLossDB, 1)} dB, notch ${formatNumber(chain.carrierRejectionDB, 1)} dB${chain.sharedIf ? ", shared IF" : ""}`,
          ],
          ...(result
            ? ([
                ["Per-photodiode input", `${formatNumber(result.pdInputMW, 3)} mW`],
                [
                  "Feasible LO",
                  result.feasibleGHz.length === 0
                    ? "none"
                    : result.feasibleGHz.map((iv) => formatInterval(iv)).join(", "),
                ],
                ["Temperature window", temperatureWindowText(chain.temperatureExcursionK, result)],
                [
                  "Suggested LO",
                  result.placeGHz === null
                    ? `none: ${placeReasonText(result.placeReason) ?? "no result"}`
                    : `${formatGHz(result.placeGHz)} GHz`,
                ],
              ] as [string, string][])
            : []),
        ]}
      />
    </div>
  );
}

/** The chain's temperature window at its LO, its temperature control ±Te and the margin (docs/decisions/029). */
function temperatureWindowText(excursionK: number, result: ChainResult): string {
  const m = result.temperatureMarginK;
  const verdict =
    result.temperatureWindowK.length === 0
      ? "no temperature passes at this LO"
      : m === null
        ? ""
        : m < 0
          ? `control ±${fmtNumber(excursionK, 3)} K must tighten by ${fmtNumber(-m, 3)} K`
          : `control ±${fmtNumber(excursionK, 3)} K, margin ${fmtNumber(m, 3)} K`;
  return `${fmtWindow(result.temperatureWindowK)}${verdict ? ` (${verdict})` : ""}`;
}

/** Laser 2's optical frequency: carrier + signed LO offset (GHz → THz). */
export function loTHz(carrierTHz: number, loOffsetGHz: number): number {
  return carrierTHz + loOffsetGHz / 1000;
}
