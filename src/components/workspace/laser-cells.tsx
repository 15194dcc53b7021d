import type { ReactNode } from "react";
import { OpticalFrequency } from "@/components/tools";
import type { Laser } from "@/queries/types";
import { formatInterval, formatMHz, formatNumber } from "./format";

/** Column headings of a laser-pair table (overview and report), units in every label. */
export const LASER_HEADERS = [
  "Laser pair",
  "Carrier (THz)",
  "Carrier power (mW)",
  "LO power (mW)",
  "Reach (GHz)",
  "Step (MHz)",
  "Drift (± MHz)",
  "PDH lock",
] as const;

/** The cells of a laser pair's row (overview and report), in the order of LASER_HEADERS. */
export function laserCells(l: Laser): ReactNode[] {
  return [
    l.key,
    <>
      {formatNumber(l.carrierTHz, 3)}
      <OpticalFrequency thz={l.carrierTHz} className="block text-xs" />
    </>,
    formatNumber(l.carrierPowerMW, 2),
    formatNumber(l.loPowerMW, 2),
    l.reach.map((r) => formatInterval([r.minGHz, r.maxGHz], "")).join(", "),
    formatMHz(l.stepMHz),
    formatMHz(l.driftMHz),
    <>
      {formatMHz(l.lock.modulationMHz)} MHz, β {formatNumber(l.lock.modulationIndex, 2)}, {l.lock.orders}{" "}
      {l.lock.orders === 1 ? "order" : "orders"}
    </>,
  ];
}
