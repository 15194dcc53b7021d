import type { Plan } from "@/schemas/plan";
import type { PlaceReason } from "./types";

/** The allowance of every comparison (docs/plan-format.md §1.4 "The 1e-9 allowance"), GHz. */
const TOL = 1e-9;

export interface Placement {
  placeGHz: number | null;
  placeReason: PlaceReason;
}

/**
 * Where to set the LO (docs/plan-format.md §6.5 "Place"): among
 * the feasible intervals that hold at least one multiple of the laser's
 * step (any point when the step is 0), take the widest (widths compared
 * after rounding to 1 kHz; equal widths go to the interval whose midpoint
 * has the smaller |L|, and then to the lower one), and round its midpoint
 * to the nearest multiple of the step inside it (an exact half step goes
 * to the multiple with the smaller |L|). Multiples are formed as
 * `k·stepMHz/1000` so that e.g. 18016·10 MHz is exactly 180.16 GHz; edges
 * and half steps are compared with the 1e-9 GHz allowance.
 */
export function placeLo(plan: Plan, chainId: string, feasibleGHz: readonly (readonly [number, number])[]): Placement {
  const chain = plan.chains.find((c) => c.id === chainId);
  const laser = chain && plan.lasers.find((l) => l.id === chain.laser);
  if (!laser) throw new Error(`no chain with id "${chainId}" (or its laser)`);
  if (feasibleGHz.length === 0) return { placeGHz: null, placeReason: "no-feasible-interval" };
  const stepMHz = laser.stepMHz;
  const value = (k: number) => (k * stepMHz) / 1000;

  /** Range of step indices inside [lo, hi], or null. */
  const multiples = (lo: number, hi: number): [number, number] | null => {
    if (stepMHz === 0) return null;
    let kLo = Math.ceil((lo * 1000) / stepMHz);
    let kHi = Math.floor((hi * 1000) / stepMHz);
    // one correction step each way for rounding (the index estimate is off by at most one;
    // loops here could never end when k·step cannot change by one step in double precision)
    if (value(kLo - 1) >= lo - TOL) kLo--;
    else if (value(kLo) < lo - TOL) kLo++;
    if (value(kHi + 1) <= hi + TOL) kHi++;
    else if (value(kHi) > hi + TOL) kHi--;
    return Number.isFinite(kLo) && Number.isFinite(kHi) && kLo <= kHi ? [kLo, kHi] : null;
  };

  let best: { lo: number; hi: number; widthKHz: number; mid: number; ks: [number, number] | null } | null = null;
  for (const [lo, hi] of feasibleGHz) {
    const ks = multiples(lo, hi);
    if (stepMHz > 0 && ks === null) continue;
    const widthKHz = Math.round((hi - lo) * 1e6);
    const mid = (lo + hi) / 2;
    if (
      best === null ||
      widthKHz > best.widthKHz ||
      (widthKHz === best.widthKHz && Math.abs(mid) < Math.abs(best.mid) - TOL)
    ) {
      best = { lo, hi, widthKHz, mid, ks };
    }
  }
  if (best === null) return { placeGHz: null, placeReason: "no-grid-point" };
  if (best.ks === null) return { placeGHz: best.mid, placeReason: null };

  const [kLo, kHi] = best.ks;
  const clamp = (k: number) => Math.min(kHi, Math.max(kLo, k));
  const below = clamp(Math.floor((best.mid * 1000) / stepMHz));
  const above = clamp(below + 1);
  const dBelow = Math.abs(best.mid - value(below));
  const dAbove = Math.abs(best.mid - value(above));
  let k: number;
  if (Math.abs(dBelow - dAbove) <= TOL) k = Math.abs(value(below)) <= Math.abs(value(above)) ? below : above;
  else k = dBelow < dAbove ? below : above;
  return { placeGHz: value(k), placeReason: null };
}
