/**
 * Types of the `schedules` section of the result document
 * `heterolane.result/2` (docs/plan-format.md §13.5): one entry per laser
 * pair with an observation schedule. Its zod schema is in
 * `src/schemas/result.ts`.
 */

/** One dwell of a schedule as the engine worked it out. */
export interface ScheduleDwellResult {
  chain: string;
  dwellMs: number;
  /** |ΔL|: how far laser 2 moves into this dwell from the dwell before it (GHz). */
  loStepGHz: number;
  /** The retune into the dwell (ms): `retuneMs + retuneMsPerGHz·|ΔL|`, or 0 when the LO does not move. */
  retuneMs: number;
  /** The carrier's relock (ms) when the previous dwell's chain uses another resonator, else 0. */
  relockMs: number;
  /** `dwellMs − retuneMs − relockMs`, at least 0. */
  usableMs: number;
  /** `usableMs / cycleMs`: the share of each cycle the chain integrates. */
  dutyCycle: number;
}

/** The figures of one channel of a scheduled chain. */
export interface ScheduleChannelResult {
  id: string;
  chain: string;
  /** The channel's own integration time (ms). */
  integrationMs: number;
  /** `integrationMs × dutyCycle` of its chain (ms): what its NEΔT is worked out with. */
  effectiveIntegrationMs: number;
  /** NEΔT with the effective integration: the same values as the channel's `nedtK` and `envelope.worstNedtK`. */
  nedtK: number | null;
  worstNedtK: number | null;
  /** NEΔT had the chain the laser pair to itself (the full integration time). */
  unsharedNedtK: number | null;
  unsharedWorstNedtK: number | null;
  requiredNedtK: number | null;
}

/** The dwell split that meets every requirement of a schedule with the largest common margin (§13.6). */
export interface BestSplitResult {
  /** `closed-form` when no channel of the schedule has gain drift, else `search` (a bisection on the margin). */
  method: "closed-form" | "search";
  /**
   * The smallest `1 − worstNedtK/requiredNedtK` over the channels with a
   * requirement at this split: ≥ 0 when every requirement is met.
   */
  commonMargin: number;
  /** The margin of the schedule as written, worked out the same way. */
  currentMargin: number;
  /** The dwells of the split, in schedule order (ms, rounded down to 1 µs so they fit in the cycle). */
  dwellsMs: number[];
  /** The worst NEΔT each channel with a requirement would have at this split, in the order of `channels`. */
  worstNedtK: (number | null)[];
}

export interface ScheduleResult {
  laser: string;
  /** The cycle the schedule was planned with (`cycleMs`). */
  plannedCycleMs: number;
  /** The sum of the dwells. */
  busyMs: number;
  /** The time one cycle takes: the larger of `plannedCycleMs` and `busyMs`. */
  cycleMs: number;
  /** `cycleMs − busyMs`: time of each cycle spent on no chain. */
  idleMs: number;
  dwells: ScheduleDwellResult[];
  channels: ScheduleChannelResult[];
  /** Null when no channel of the schedule has a required NEΔT (nothing to split for) or the switches fill the cycle. */
  bestSplit: BestSplitResult | null;
}
