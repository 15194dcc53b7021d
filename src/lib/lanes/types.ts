/**
 * The lane view's data model. The chart and the table view are both drawn
 * from one `LaneModel`; nothing is computed in the components.
 *
 * Input types are the subset of the `heterolane.plan/1` and
 * `heterolane.result/1` documents (docs/plan-format.md §2 and §7) the lane view reads,
 * written structurally so that the engine's own types are assignable to them.
 */

import type { Severity, SpurFamily } from "@/lib/plan";

/** The engine's severities and spur families (one definition each, in `@/lib/plan`). */
export type { Severity, SpurFamily };

export type GHzPair = readonly [number, number];

export interface LanePlanInput {
  readonly settings: { readonly guardMHz: number };
  readonly lasers: readonly {
    readonly id: string;
    readonly carrierTHz: number;
    readonly reach: readonly { readonly minGHz: number; readonly maxGHz: number }[];
    readonly stepMHz: number;
    readonly driftMHz: number;
    readonly lock: { readonly modulationMHz: number; readonly modulationIndex: number; readonly orders: number };
  }[];
  readonly resonators: readonly {
    readonly id: string;
    readonly fsrGHz: number;
    readonly loadedQ: number;
    /** Version 2 (optional here): FSR shift per kelvin, MHz/K. */
    readonly fsrShiftMHzPerK?: number;
  }[];
  readonly detectors: readonly {
    readonly id: string;
    readonly minGHz: number;
    readonly maxGHz: number;
    readonly sampleRateGHz?: number | null;
  }[];
  readonly chains: readonly {
    readonly id: string;
    readonly laser: string;
    readonly resonator: string;
    readonly detector: string;
    readonly mode: number;
    readonly sideband: "upper" | "lower";
    readonly loOffsetGHz: number;
    readonly rfInput: { readonly minGHz: number; readonly maxGHz: number };
    /** Version 2 (optional here): ± resonator temperature excursion, K. */
    readonly temperatureExcursionK?: number;
  }[];
  readonly channels: readonly {
    readonly id: string;
    readonly name: string;
    readonly chain: string;
    readonly centerGHz: number;
    readonly bandwidthMHz: number;
    readonly dsbOffsetGHz?: number | null;
    readonly requiredNedtK?: number | null;
    /** Version 2 (optional here): what the IF filter passes. */
    readonly ifFilter?: "slot" | "occupied";
  }[];
}

export interface LaneFindingInput {
  readonly code: string;
  readonly severity: Severity;
  readonly chain: string;
  readonly channel: string | null;
  readonly message: string;
  readonly data?: unknown;
}

export interface LaneResultInput {
  readonly chains: readonly {
    readonly id: string;
    readonly linewidthMHz: number;
    readonly feasibleGHz: readonly GHzPair[];
    readonly excludedGHz: readonly { readonly bandGHz: GHzPair; readonly codes: readonly string[] }[];
    readonly placeGHz: number | null;
    readonly placeReason: string | null;
  }[];
  readonly channels: readonly {
    readonly id: string;
    readonly ifSlotGHz: GHzPair | null;
    readonly occupiedGHz: GHzPair | null;
    readonly imageGHz: GHzPair | null;
    readonly imageRejectionDB: number | null;
    readonly nedtK: number | null;
    readonly lockReplicaDB: number;
  }[];
  readonly spurs: readonly {
    readonly chain: string;
    readonly family: string;
    readonly order: number;
    readonly bandGHz: GHzPair;
    readonly source: string;
    readonly hits: readonly string[];
  }[];
  readonly findings: readonly LaneFindingInput[];
}

/** Atmospheric line centres and protected passive bands (the engine's reference table). */
export interface LaneReferenceInput {
  readonly lines: readonly { readonly label: string; readonly centreGHz: number; readonly source: string }[];
  readonly protectedBands: readonly { readonly minGHz: number; readonly maxGHz: number; readonly source: string }[];
}

export type LaneKind = "rf" | "optical" | "if";

export type ItemKind =
  // RF lane
  | "protected-band"
  | "line-centre"
  | "rf-input"
  | "mode-passband"
  | "mode-drift"
  | "envelope-band"
  | "channel-band"
  | "image-band"
  // optical-offset lane
  | "reach"
  | "feasible"
  | "blocked"
  | "carrier"
  | "lock-sideband"
  | "sideband"
  | "lo"
  // IF lane
  | "detector-band"
  | "nyquist-edge"
  | "guard"
  | "occupied"
  | "if-slot"
  | "spur";

export interface LaneItem {
  /** Unique, stable across re-checks while the plan's ids stay the same. */
  readonly id: string;
  /** Lane id: `rf`, `optical:<chain>` or `if:<chain>`. */
  readonly lane: string;
  readonly kind: ItemKind;
  /** Row inside the lane (0 = top). */
  readonly row: number;
  /** Drawn extent on the lane's axis (GHz). Zero width for a line or a tone. */
  readonly lo: number;
  readonly hi: number;
  readonly chain: string | null;
  readonly channel: string | null;
  readonly label: string;
  /** Items that belong together (the two passbands of a DSB channel). */
  readonly link: string | null;
  readonly family: SpurFamily | null;
  readonly order: number | null;
  /** Rule codes: the codes blocking an interval, or the findings that concern the item. */
  readonly codes: readonly string[];
  /** Worst severity among the findings that concern the item, null when none. */
  readonly severity: Severity | null;
  /** The numbers a person needs, in display order (name → value with unit). */
  readonly facts: readonly (readonly [string, string])[];
}

export interface Lane {
  readonly id: string;
  readonly kind: LaneKind;
  readonly chain: string | null;
  readonly title: string;
  readonly rows: number;
  /** Axis the lane is drawn on: the shared GHz axis or the IF axis. */
  readonly axis: "ghz" | "if";
  /** −1 when the optical offsets of this lane are drawn mirrored (lower sideband), else +1. */
  readonly mirror: 1 | -1;
}

export interface LaneModel {
  readonly lanes: readonly Lane[];
  readonly items: readonly LaneItem[];
  /** Hull of every item on the shared GHz axis, and of every item on the IF axis. */
  readonly extentGHz: GHzPair;
  /** Hull of the plan's own bands and offsets (RF inputs, channels, images, reach, LO): the opening view. */
  readonly focusGHz: GHzPair;
  readonly extentIF: GHzPair;
}

export interface TableRow {
  readonly id: string;
  readonly lane: string;
  readonly kind: ItemKind;
  readonly label: string;
  readonly fromGHz: number;
  readonly toGHz: number;
  readonly chain: string;
  readonly channel: string;
  readonly family: string;
  readonly order: string;
  readonly codes: string;
  readonly severity: string;
  readonly facts: string;
}

export type Domain = readonly [number, number];
