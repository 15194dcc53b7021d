"use client";

import type { Chain, ChainResult, Detector, Laser, Resonator } from "@/queries/types";
import { formatGHz, formatInterval, formatMHz, formatNumber, formatQ } from "./format";
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

export function LaserItem({ laser, onEdit }: { laser: Laser; onEdit?: () => void }) {
  return (
    <div className="rounded border border-ink/10 p-3">
      <ItemHeader title={laser.key} onEdit={onEdit} label="laser pair" />
      <Dl
        rows={[
          ["Carrier", `${formatNumber(laser.carrierTHz, 3)} THz`],
          ["Carrier power", `${formatNumber(laser.carrierPowerMW, 2)} mW`],
          ["LO power", `${formatNumber(laser.loPowerMW, 2)} mW`],
          ["Reach", laser.reach.map((r) => formatInterval([r.minGHz, r.maxGHz], "GHz")).join(", ")],
          ["Step · drift", `${formatMHz(laser.stepMHz)} MHz · ±${formatMHz(laser.driftMHz)} MHz`],
          [
            "PDH lock",
            `${formatMHz(laser.lock.modulationMHz)} MHz, β ${formatNumber(laser.lock.modulationIndex, 2)}, ${laser.lock.orders} order${laser.lock.orders === 1 ? "" : "s"}`,
          ],
        ]}
      />
      <LaserSafetyNote className="mt-2" />
    </div>
  );
}

export function ResonatorItem({ resonator, linewidthMHz, onEdit }: { resonator: Resonator; linewidthMHz?: number | null; onEdit?: () => void }) {
  return (
    <div className="rounded border border-ink/10 p-3">
      <ItemHeader title={resonator.key} onEdit={onEdit} label="resonator" />
      <Dl
        rows={[
          ["FSR", `${formatGHz(resonator.fsrGHz)} GHz`],
          ["Loaded Q", formatQ(resonator.loadedQ)],
          ...(linewidthMHz != null ? ([["Linewidth", `${formatMHz(linewidthMHz, 2)} MHz`]] as [string, string][]) : []),
        ]}
      />
    </div>
  );
}

export function DetectorItem({ detector, onEdit }: { detector: Detector; onEdit?: () => void }) {
  return (
    <div className="rounded border border-ink/10 p-3">
      <ItemHeader title={detector.key} onEdit={onEdit} label="detector" />
      <Dl
        rows={[
          ["IF band", formatInterval([detector.minGHz, detector.maxGHz], "GHz")],
          ["Max input per photodiode", `${formatNumber(detector.maxInputMW, 2)} mW`],
          ["Sample rate", detector.sampleRateGHz === null ? "not digitised directly" : `${formatGHz(detector.sampleRateGHz)} GHz`],
        ]}
      />
      <LaserSafetyNote className="mt-2" />
    </div>
  );
}

export function HardwareColumn<T extends { id: string }>({
  items,
  render,
  emptyText,
}: {
  items: T[];
  render: (item: T) => React.ReactNode;
  emptyText: string;
}) {
  if (items.length === 0) return <Empty>{emptyText}</Empty>;
  return <div className="space-y-2">{items.map((i) => <div key={i.id}>{render(i)}</div>)}</div>;
}

export function ChainItem({
  chain,
  result,
  keys,
  onEdit,
}: {
  chain: Chain;
  result: ChainResult | undefined;
  keys: { laser: string; resonator: string; detector: string };
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
          ["RF input", formatInterval([chain.rfInput.minGHz, chain.rfInput.maxGHz])],
          ["Path", `tap ${formatNumber(chain.tapFraction, 3)}, loss ${formatNumber(chain.pathLossDB, 1)} dB, notch ${formatNumber(chain.carrierRejectionDB, 1)} dB${chain.sharedIf ? ", shared IF" : ""}`],
          ...(result
            ? ([
                ["Per-photodiode input", `${formatNumber(result.pdInputMW, 3)} mW`],
                ["Feasible LO", result.feasibleGHz.length === 0 ? "none" : result.feasibleGHz.map((iv) => formatInterval(iv)).join(", ")],
                [
                  "Place",
                  result.placeGHz === null ? `no place (${result.placeReason ?? "unknown"})` : `${formatGHz(result.placeGHz)} GHz`,
                ],
              ] as [string, string][])
            : []),
        ]}
      />
    </div>
  );
}
