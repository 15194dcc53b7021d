import type { ScheduleResult } from "./schedule-types";

/**
 * Types of the result document `heterolane.result/2`
 * (docs/plan-format.md §7 "The result document", §4 "Rules and findings"
 * and §12.7 "The result document of version 2"). Its zod schema is
 * `src/schemas/result.ts`.
 */

export const RESULT_FORMAT = "heterolane.result/2" as const;

/** The severities of findings, worst first. */
export const SEVERITIES = ["error", "warning", "info"] as const;
export type Severity = (typeof SEVERITIES)[number];

/** Every finding code, in rules-table order (the order findings are listed in). */
export const RULE_ORDER = [
  "lo-uncovered",
  "lo-in-band",
  "dsb-lo-off-centre",
  "lo-off-step",
  "band-outside-rf-input",
  "mode-detuned",
  "centre-drift",
  "band-wider-than-mode",
  "if-outside-detector",
  "slot-overlap",
  "image-response",
  "spur-in-slot",
  "nyquist-straddle",
  "alias-overlap",
  "noise-folding",
  "lock-replica",
  "lock-inside-mode",
  "carrier-dominates-lo",
  "pd-overload",
  "thermal-noise-limited",
  "laser-noise-dominates",
  "nedt-unmet",
  "in-protected-band",
  "schedule-overrun",
  "retune-blocked",
  "shared-nedt-unmet",
  "carrier-outside-telecom",
  "q-beyond-lithium-niobate",
  "receiver-noise-implausible",
] as const;

export type FindingCode = (typeof RULE_ORDER)[number];

/** Rank of a code in the rules table (0-based). */
export function ruleRank(code: FindingCode): number {
  return RULE_ORDER.indexOf(code);
}

/**
 * Severity of each rule (docs/plan-format.md §4.1 "The rules"). `slot-overlap` is a
 * warning instead when the chain has `sharedIf`; `spur-in-slot` is info for
 * the harmonic and intermodulation families.
 */
export const RULE_SEVERITY: Readonly<Record<FindingCode, Severity>> = {
  "lo-uncovered": "error",
  "lo-in-band": "error",
  "dsb-lo-off-centre": "warning",
  "lo-off-step": "warning",
  "band-outside-rf-input": "error",
  "mode-detuned": "error",
  "centre-drift": "error",
  "band-wider-than-mode": "warning",
  "if-outside-detector": "error",
  "slot-overlap": "error",
  "image-response": "error",
  "spur-in-slot": "error",
  "nyquist-straddle": "error",
  "alias-overlap": "error",
  "noise-folding": "warning",
  "lock-replica": "warning",
  "lock-inside-mode": "warning",
  "carrier-dominates-lo": "warning",
  "pd-overload": "error",
  "thermal-noise-limited": "warning",
  "laser-noise-dominates": "warning",
  "nedt-unmet": "error",
  "in-protected-band": "info",
  "schedule-overrun": "error",
  "retune-blocked": "error",
  "shared-nedt-unmet": "warning",
  "carrier-outside-telecom": "warning",
  "q-beyond-lithium-niobate": "warning",
  "receiver-noise-implausible": "warning",
};

/** Codes of the per-chain rules (`channel: null`). */
export const CHAIN_LEVEL_CODES: readonly FindingCode[] = [
  "lo-uncovered",
  "lo-off-step",
  "noise-folding",
  "lock-inside-mode",
  "carrier-dominates-lo",
  "pd-overload",
  "schedule-overrun",
  "retune-blocked",
  "thermal-noise-limited",
  "laser-noise-dominates",
  "carrier-outside-telecom",
  "q-beyond-lithium-niobate",
];

const L_DEPENDENT = [
  "lo-uncovered",
  "lo-in-band",
  "if-outside-detector",
  "slot-overlap",
  "image-response",
  "spur-in-slot",
  "nyquist-straddle",
  "alias-overlap",
] as const satisfies readonly FindingCode[];

/** A code of `L_DEPENDENT_ERROR_CODES`. */
export type LDependentErrorCode = (typeof L_DEPENDENT)[number];

/**
 * Error rules whose outcome depends on the LO offset L, in rules-table
 * order (docs/plan-format.md §4.1 "The rules", column "depends on L"; `slot-overlap`
 * only while it is an error, i.e. the chain is not `sharedIf`): these, and
 * only these, shape the feasibility map.
 */
export const L_DEPENDENT_ERROR_CODES: readonly FindingCode[] = L_DEPENDENT;

/** Spur families, in table order. */
export const SPUR_FAMILIES = ["carrier-beat", "lock-lo", "lock-self", "harmonic", "intermod"] as const;
export type SpurFamily = (typeof SPUR_FAMILIES)[number];

/** A JSON value, for the `data` object of a finding. */
export type JsonValue = null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };

export interface Finding {
  code: FindingCode;
  severity: Severity;
  chain: string;
  /** null for the per-chain rules. */
  channel: string | null;
  /** One plain-English sentence (or two) with the numbers and how far from passing. */
  message: string;
  data: { [key: string]: JsonValue };
}

export interface Spur {
  chain: string;
  family: SpurFamily;
  order: number;
  bandGHz: [number, number];
  /** Short text for people, e.g. `L−1·fm`, `2·fm`, `3·wv1`, `1·a1−2·a2`. */
  source: string;
  /** Ids (input order) of every channel whose occupied band the spur comes within guard of, directly or folded. */
  hits: string[];
}

export type PlaceReason = null | "no-feasible-interval" | "no-grid-point";

export interface ChainResult {
  id: string;
  linewidthMHz: number;
  pdInputMW: number;
  feasibleGHz: [number, number][];
  excludedGHz: { bandGHz: [number, number]; codes: FindingCode[] }[];
  placeGHz: number | null;
  placeReason: PlaceReason;
  /**
   * The temperature offsets (K, within ±50 K, edges to 1 mK) at which every
   * error rule of the chain holds at its LO for every LO shift within ±D,
   * as increasing intervals; empty when a rule that does not depend on the
   * temperature fails (docs/plan-format.md §12.6).
   */
  temperatureWindowK: [number, number][];
  /**
   * How far ±Te could grow (positive) or must shrink (negative) to fit in
   * one interval of the window (K, to 1 mK); null when the window is empty.
   */
  temperatureMarginK: number | null;
  /**
   * The LO power (mW) that minimises the receiver temperature of every
   * channel without `pd-overload`; null when none avoids it. Only present
   * when the chain has a noise budget (docs/plan-format.md §14.5).
   */
  optimalLoPowerMW?: number | null;
}

/** The terms of a noise budget, in the order the result lists them (docs/plan-format.md §14.4). */
export const NOISE_TERMS = [
  "front-end-loss",
  "quantum-limit",
  "conversion-loss",
  "carrier-shot-noise",
  "detector-noise",
  "carrier-floor",
  "lo-floor",
  "carrier-rin",
  "lo-rin",
] as const;
export type NoiseTerm = (typeof NOISE_TERMS)[number];

/** One term of a noise budget: kelvin referred to the antenna, ≥ 0. */
export interface NoiseTermEntry {
  term: NoiseTerm;
  kelvin: number;
}

/** A channel's receiver noise computed from the hardware (docs/plan-format.md §14.4). */
export interface NoiseBudget {
  /** `computed`: NEΔT uses `totalK`; `entered`: NEΔT uses the channel's `receiverK`. */
  source: "computed" | "entered";
  /** The sum of the terms (K). */
  totalK: number;
  terms: NoiseTermEntry[];
  /** The channel's `receiverK` when it is used (source `entered`), else null. */
  enteredK: number | null;
  /** `enteredK/totalK`, or null. */
  ratio: number | null;
  /** The photon conversion efficiency η the budget used, and where it came from. */
  conversionEfficiency: number;
  conversionEfficiencySource: "entered" | "computed";
}

/** A point of the operating envelope: LO shift u in MHz and resonator temperature offset t in K. */
export interface EnvelopePoint {
  loShiftMHz: number;
  temperatureOffsetK: number;
}

/**
 * A channel's figures over the operating envelope of its chain (LO shifts
 * within ±D, temperature offsets within ±Te), each with the point where it
 * occurs (docs/plan-format.md §12.7).
 */
export interface ChannelEnvelopeResult {
  /** Largest NEΔT; null without a slot, with an impossible occupied-band filter, or when not finite. */
  worstNedtK: number | null;
  worstNedtAt: EnvelopePoint | null;
  /** Smallest radiometric bandwidth; null as NEΔT, or when S ≡ 0. */
  worstRadiometricBandwidthMHz: number | null;
  worstRadiometricBandwidthAt: EnvelopePoint | null;
  /** Lowest image rejection; null for DSB, without a slot, with an impossible filter, or when nothing of the image gets in. */
  worstImageRejectionDB: number | null;
  worstImageRejectionAt: EnvelopePoint | null;
  /** Lowest response of the wanted mode at a received passband centre (linear, 0..1); given with or without a slot. */
  worstModeResponse: number;
  worstModeResponseAt: EnvelopePoint;
  /** Largest error of the effective centre of a passband (MHz); null with an impossible occupied-band filter. */
  centreErrorMHz: number | null;
  centreErrorAt: EnvelopePoint | null;
}

export interface ChannelResult {
  id: string;
  ifSlotGHz: [number, number] | null;
  occupiedGHz: [number, number] | null;
  imageGHz: [number, number] | null;
  imageRejectionDB: number | null;
  radiometricBandwidthMHz: number | null;
  nedtK: number | null;
  lockReplicaDB: number;
  /** The channel over the operating envelope (version 2). */
  envelope: ChannelEnvelopeResult;
  /** The receiver noise budget; only present when the chain's hardware gives one (version 2, §14). */
  noiseBudget?: NoiseBudget;
}

export interface ResultDocument {
  format: typeof RESULT_FORMAT;
  chains: ChainResult[];
  channels: ChannelResult[];
  spurs: Spur[];
  findings: Finding[];
  /**
   * One entry per laser pair with an observation schedule, in laser order
   * (docs/plan-format.md §13.5); left out when the plan has no schedule, so
   * such a plan's result is exactly what it was before schedules.
   */
  schedules?: ScheduleResult[];
}

export type { ScheduleResult, ScheduleDwellResult, ScheduleChannelResult, BestSplitResult } from "./schedule-types";
