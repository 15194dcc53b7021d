import { GRID_ANCHOR_GHZ } from "./internals/constants";
import { OpticsInputError, requirePositive } from "./internals/errors";

/**
 * ITU-T G.694.1 grids: the fixed DWDM grids f = 193.1 THz + N × spacing for
 * spacings of 100, 50, 25 and 12.5 GHz (G.694.1, 2002 and later editions),
 * and the flexible grid's nominal central frequencies
 * f = 193.1 THz + n × 6.25 GHz (G.694.1, 2012 revision).
 */
export const GRID_SPACINGS_GHZ = [100, 50, 25, 12.5, 6.25] as const;
export type GridSpacingGHz = (typeof GRID_SPACINGS_GHZ)[number];

export interface GridChannel {
  spacingGHz: GridSpacingGHz;
  /** "fixed" for 100/50/25/12.5 GHz, "flexible" for the 6.25 GHz centre granularity. */
  grid: "fixed" | "flexible";
  /** Integer channel index N (fixed) or n (flexible) relative to the 193.1 THz anchor. */
  index: number;
  centreTHz: number;
  /** frequency − channel centre, GHz; |offset| ≤ spacing/2. */
  offsetGHz: number;
}

/**
 * Nearest grid channel to an optical frequency, with the signed offset from
 * its centre. An input exactly half-way between two channels goes to the
 * higher-frequency one (Math.round).
 */
export function nearestGridChannel(frequencyTHz: number, spacingGHz: GridSpacingGHz): GridChannel {
  requirePositive("frequencyTHz", frequencyTHz);
  if (!GRID_SPACINGS_GHZ.includes(spacingGHz)) {
    throw new OpticsInputError("spacingGHz", `must be one of ${GRID_SPACINGS_GHZ.join(", ")} GHz`);
  }
  const fGHz = frequencyTHz * 1000;
  const index = Math.round((fGHz - GRID_ANCHOR_GHZ) / spacingGHz);
  const centreGHz = GRID_ANCHOR_GHZ + index * spacingGHz;
  return {
    spacingGHz,
    grid: spacingGHz === 6.25 ? "flexible" : "fixed",
    index: index === 0 ? 0 : index,
    centreTHz: centreGHz / 1000,
    offsetGHz: fGHz - centreGHz,
  };
}
