import { SPUR_FAMILIES } from "@/lib/plan";

/** Row of every item kind inside its lane (0 = top). */
export const RF_ROWS = { reference: 0, input: 1, mode: 2, channel: 3, image: 4 } as const;
export const OPTICAL_ROWS = { reach: 0, map: 1, signal: 2, lo: 3 } as const;
/** IF lane: detector and Nyquist edges, slots, then one row per spur family (the engine's `SPUR_FAMILIES` order). */
export const IF_ROWS = { detector: 0, slot: 1, spur0: 2 } as const;
/** Rows of an IF lane. */
export const IF_LANE_ROWS = IF_ROWS.spur0 + SPUR_FAMILIES.length;
