import { formatPath, type Issue } from "../issues";
import type { Plan } from "./document";

/**
 * Hard ranges of the plan's numbers where physics or a laboratory bench sets
 * them (ADR 030, docs/plan-format.md §15 "Hard ranges"). The plan format
 * itself accepts any finite number (the engine bounds its work whatever it
 * is given, ADR 018); these ranges are checked when a plan is stored — every
 * save and import of the workspace re-checks the whole plan — so a value no
 * bench can produce is a field error, while a revision stored before the
 * ranges existed still loads and is refused only at its next save.
 *
 * One row per field, in document order; a new field adds its row here (and
 * to the table in docs/plan-format.md). `min`/`max` are inclusive unless
 * `above`/`below` are set (then the edge itself is refused).
 */
export interface Bound {
  /** The list the entity sits in, or "settings". */
  entity: "settings" | "lasers" | "resonators" | "detectors" | "chains" | "channels";
  /** The field's path inside the entity, e.g. ["lock", "modulationMHz"]. */
  field: readonly string[];
  min?: number;
  max?: number;
  /** Refuse values at or below `min` (an open lower edge). */
  above?: boolean;
  /** Refuse values at or above `max` (an open upper edge). */
  below?: boolean;
  /** What the edge stands for, in the words of the field error ("no bench laser emits below 150 THz"). */
  reason: string;
}

/** Largest LO offset, RF and IF frequency, GHz: 20 THz, far beyond any microwave-photonic receiver. */
const MAX_FREQUENCY_GHZ = 20_000;
/** Why a reach edge has the LO offset's range. */
export const REACH_REASON = "a laser pair's reach beyond ±20 THz is beyond any difference frequency in use";
/** Largest optical power, mW: 10 W, beyond the output of a bench fibre amplifier (a kilowatt is refused). */
const MAX_OPTICAL_MW = 10_000;

export const PLAN_BOUNDS: readonly Bound[] = [
  { entity: "settings", field: ["guardMHz"], max: 100_000, reason: "a guard of more than 100 GHz leaves no IF band" },
  { entity: "settings", field: ["imageRejectionDB"], min: -200, max: 200, reason: "±200 dB is beyond any measurement" },
  { entity: "settings", field: ["replicaLimitDB"], min: -400, max: 400, reason: "±400 dB is beyond any measurement" },
  {
    entity: "lasers",
    field: ["carrierTHz"],
    min: 150,
    max: 400,
    reason: "a bench laser carrier lies between 150 THz (2 µm) and 400 THz (750 nm)",
  },
  {
    entity: "lasers",
    field: ["carrierPowerMW"],
    max: MAX_OPTICAL_MW,
    reason: "10 W is beyond a bench fibre amplifier",
  },
  { entity: "lasers", field: ["loPowerMW"], max: MAX_OPTICAL_MW, reason: "10 W is beyond a bench fibre amplifier" },
  { entity: "lasers", field: ["stepMHz"], max: 1_000_000, reason: "a tuning step above 1 THz is no step" },
  {
    entity: "lasers",
    field: ["driftMHz"],
    max: 1_000_000,
    reason: "a drift above 1 THz is beyond any bench laser pair",
  },
  {
    entity: "lasers",
    field: ["lock", "modulationMHz"],
    max: 100_000,
    reason: "a lock modulation above 100 GHz is beyond any phase modulator",
  },
  {
    entity: "resonators",
    field: ["fsrGHz"],
    below: true,
    max: 150_000,
    reason: "the free spectral range must be below the lowest carrier, 150 THz",
  },
  {
    entity: "resonators",
    field: ["loadedQ"],
    min: 10,
    max: 1e12,
    reason:
      "a loaded Q below 10 is no resonance, and above 10¹² is beyond any optical resonator reported (crystalline discs reach about 10¹¹)",
  },
  {
    entity: "resonators",
    field: ["fsrShiftMHzPerK"],
    min: -10_000,
    max: 10_000,
    reason: "an FSR shift above 10 GHz per kelvin is beyond any material",
  },
  { entity: "detectors", field: ["minGHz"], max: MAX_FREQUENCY_GHZ, reason: "no photodiode passes above 20 THz" },
  { entity: "detectors", field: ["maxGHz"], max: MAX_FREQUENCY_GHZ, reason: "no photodiode passes above 20 THz" },
  {
    entity: "detectors",
    field: ["maxInputMW"],
    max: MAX_OPTICAL_MW,
    reason: "10 W is beyond the input of any photodiode",
  },
  { entity: "detectors", field: ["sampleRateGHz"], max: 1_000, reason: "no digitiser samples faster than 1 THz" },
  {
    entity: "chains",
    field: ["loOffsetGHz"],
    min: -MAX_FREQUENCY_GHZ,
    max: MAX_FREQUENCY_GHZ,
    reason: "an LO offset beyond ±20 THz is beyond any laser pair's difference frequency in use",
  },
  { entity: "chains", field: ["rfInput", "minGHz"], max: MAX_FREQUENCY_GHZ, reason: "RF inputs stop below 20 THz" },
  { entity: "chains", field: ["rfInput", "maxGHz"], max: MAX_FREQUENCY_GHZ, reason: "RF inputs stop below 20 THz" },
  { entity: "chains", field: ["pathLossDB"], max: 100, reason: "a path loss above 100 dB leaves no light" },
  { entity: "chains", field: ["carrierRejectionDB"], max: 200, reason: "200 dB is beyond any measurement" },
  {
    entity: "channels",
    field: ["centerGHz"],
    max: MAX_FREQUENCY_GHZ,
    reason: "a channel above 20 THz is no radiometer channel",
  },
  { entity: "channels", field: ["bandwidthMHz"], max: 1_000_000, reason: "no radiometer passband is wider than 1 THz" },
  { entity: "channels", field: ["dsbOffsetGHz"], max: 10_000, reason: "no DSB offset exceeds 10 THz" },
  { entity: "channels", field: ["integrationMs"], max: 86_400_000, reason: "no integration lasts longer than a day" },
  {
    entity: "channels",
    field: ["antennaK"],
    max: 10_000,
    reason: "an antenna temperature above 10 000 K is hotter than the Sun's photosphere filling the beam",
  },
  {
    entity: "channels",
    field: ["receiverK"],
    max: 1e8,
    reason: "a receiver noise temperature above 10⁸ K is no receiver",
  },
  {
    entity: "channels",
    field: ["gainStability"],
    max: 1,
    reason: "gain fluctuations above 100 % leave nothing to measure",
  },
  {
    entity: "channels",
    field: ["requiredNedtK"],
    max: 10_000,
    reason: "no requirement asks for an NEΔT above 10 000 K",
  },
  {
    entity: "channels",
    field: ["centreToleranceMHz"],
    max: 1_000_000,
    reason: "a centre tolerance above 1 THz tolerates anything",
  },
];

const at = (o: unknown, field: readonly string[]): unknown =>
  field.reduce<unknown>((v, k) => (v && typeof v === "object" ? (v as Record<string, unknown>)[k] : undefined), o);

/** What a value outside a bound is told, e.g. "must be at most 400 (a bench laser carrier …)". */
function refusal(b: Bound, v: number): string | null {
  if (b.min !== undefined && (b.above ? v <= b.min : v < b.min))
    return `must be ${b.above ? "above" : "at least"} ${b.min} (${b.reason})`;
  if (b.max !== undefined && (b.below ? v >= b.max : v > b.max))
    return `must be ${b.below ? "below" : "at most"} ${b.max} (${b.reason})`;
  return null;
}

/** A laser pair's reach intervals, each edge within the LO offset's range. */
function reachIssues(l: Plan["lasers"][number], i: number, issues: Issue[]): void {
  l.reach.forEach((iv, j) => {
    for (const edge of ["minGHz", "maxGHz"] as const)
      if (Math.abs(iv[edge]) > MAX_FREQUENCY_GHZ)
        issues.push({
          path: formatPath(["lasers", i, "reach", j, edge]),
          message: `must be between -${MAX_FREQUENCY_GHZ} and ${MAX_FREQUENCY_GHZ} (${REACH_REASON})`,
        });
  });
}

/**
 * Every number of a parsed plan outside its hard range, as issues with the
 * document path (`lasers[0].carrierTHz`), in document order. Empty for a
 * plan within every range. (An FSR below the carrier needs no rule of its
 * own: every FSR is below 150 000 GHz and every carrier at least 150 THz.)
 */
export function planBoundIssues(plan: Plan): Issue[] {
  const issues: Issue[] = [];
  const lists: Record<Bound["entity"], readonly unknown[]> = {
    settings: [plan.settings],
    lasers: plan.lasers,
    resonators: plan.resonators,
    detectors: plan.detectors,
    chains: plan.chains,
    channels: plan.channels,
  };
  for (const entity of ["settings", "lasers", "resonators", "detectors", "chains", "channels"] as const)
    lists[entity].forEach((row, i) => {
      for (const b of PLAN_BOUNDS) {
        if (b.entity !== entity) continue;
        const v = at(row, b.field);
        if (typeof v !== "number") continue;
        const message = refusal(b, v);
        if (message)
          issues.push({
            path: formatPath(entity === "settings" ? ["settings", ...b.field] : [entity, i, ...b.field]),
            message,
          });
      }
      if (entity === "lasers") reachIssues(plan.lasers[i]!, i, issues);
    });
  return issues;
}
