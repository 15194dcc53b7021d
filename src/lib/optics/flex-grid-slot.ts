import { GRID_ANCHOR_GHZ } from "./internals/constants";
import { OpticsInputError } from "./internals/errors";

export interface FlexGridSlot {
  centreTHz: number;
  widthGHz: number;
  lowerTHz: number;
  upperTHz: number;
}

/**
 * ITU-T G.694.1 (2012) flexible-grid slot: nominal central frequency
 * 193.1 THz + n × 6.25 GHz (n any integer), slot width 12.5 GHz × m (m ≥ 1).
 */
export function flexGridSlot(n: number, m: number): FlexGridSlot {
  if (!Number.isInteger(n)) throw new OpticsInputError("n", "must be an integer");
  if (!Number.isInteger(m) || m < 1) throw new OpticsInputError("m", "must be an integer of 1 or more");
  const centreGHz = GRID_ANCHOR_GHZ + n * 6.25;
  const widthGHz = 12.5 * m;
  return {
    centreTHz: centreGHz / 1000,
    widthGHz,
    lowerTHz: (centreGHz - widthGHz / 2) / 1000,
    upperTHz: (centreGHz + widthGHz / 2) / 1000,
  };
}
