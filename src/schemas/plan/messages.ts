import type { z } from "zod";
import type { RawIssue } from "./cross-field";
import { formatPath, type PathSegment } from "./format-path";

/**
 * How `parsePlan` words and orders its issues: plain messages for zod's
 * issues (the per-parse error map; the document dialect of the field rules
 * carries no messages of its own), and one reading order for every issue,
 * field rules and cross-field rules together, without repeats.
 */

/** One reason a document is not a valid plan. */
export type PlanIssue = { path: string; message: string };

/** Shortest decimal text of a number, for messages. */
export function formatNumber(n: number): string {
  return String(Number(n.toPrecision(12)));
}

function describeValue(v: unknown): string {
  if (v === null) return "null";
  if (Array.isArray(v)) return "an array";
  if (typeof v === "number") return Number.isNaN(v) ? "NaN" : Number.isFinite(v) ? "a number" : "an infinite number";
  if (typeof v === "string") return "a string";
  if (typeof v === "boolean") return "a boolean";
  if (typeof v === "object") return "an object";
  return typeof v;
}

const EXPECTED: Record<string, string> = {
  number: "a finite number",
  int: "an integer",
  string: "a string",
  boolean: "true or false",
  object: "an object",
  array: "an array",
  null: "null",
};

/** Plain messages for zod's issues (passed as the per-parse error map). */
export function issueMessage(iss: z.core.$ZodRawIssue): string {
  switch (iss.code) {
    case "invalid_type": {
      if (iss.input === undefined) return "is required";
      if (iss.expected === "int") return "must be an integer";
      if (iss.expected === "number" && typeof iss.input === "number") return "must be a finite number";
      const expected = EXPECTED[iss.expected] ?? iss.expected;
      // A nullable field: z.number().nullable() reports the inner type.
      return `must be ${expected}, not ${describeValue(iss.input)}`;
    }
    case "too_small": {
      const m = Number(iss.minimum);
      if (iss.origin === "array") return `must have at least ${m} item${m === 1 ? "" : "s"}`;
      if (iss.origin === "string") return "must not be empty";
      return iss.inclusive ? `must be at least ${formatNumber(m)}` : `must be greater than ${formatNumber(m)}`;
    }
    case "too_big": {
      const m = Number(iss.maximum);
      if (iss.origin === "array") return `must have at most ${m} items`;
      if (iss.origin === "string") return `must be at most ${m} characters`;
      return iss.inclusive ? `must be at most ${formatNumber(m)}` : `must be below ${formatNumber(m)}`;
    }
    case "invalid_value":
      if (iss.input === undefined) return "is required";
      return `must be ${iss.values.map((v) => JSON.stringify(v)).join(" or ")}`;
    case "unrecognized_keys":
      return "unknown key";
    case "custom":
      return iss.message ?? "is not valid";
    default:
      return "is not valid";
  }
}

// Reading order: keys in the order docs/plan-format.md §2.11 "Validation reports" lists them, indices ascending.
const KEY_ORDER = [
  "format",
  "name",
  "settings",
  "guardMHz",
  "imageRejectionDB",
  "spurMaxOrder",
  "replicaLimitDB",
  "lasers",
  "resonators",
  "detectors",
  "chains",
  "channels",
  "id",
  "carrierTHz",
  "carrierPowerMW",
  "loPowerMW",
  "reach",
  "stepMHz",
  "driftMHz",
  "lock",
  "modulationMHz",
  "modulationIndex",
  "orders",
  "schedule",
  "cycleMs",
  "retuneMs",
  "retuneMsPerGHz",
  "relockMs",
  "dwells",
  "carrierRinDBcPerHz",
  "loRinDBcPerHz",
  "carrierFloorDBcPerHz",
  "loFloorDBcPerHz",
  "carrierPreFilterDB",
  "loPreFilterDB",
  "fsrGHz",
  "loadedQ",
  "fsrShiftMHzPerK",
  "intrinsicQ",
  "conversionEfficiency",
  "g0Hz",
  "mmWaveQ",
  "mmWaveCouplingRatio",
  "minGHz",
  "maxGHz",
  "maxInputMW",
  "sampleRateGHz",
  "responsivityAPerW",
  "quantumEfficiency",
  "noiseCurrentPAPerRtHz",
  "cmrrDB",
  "laser",
  "resonator",
  "detector",
  "mode",
  "sideband",
  "loOffsetGHz",
  "rfInput",
  "tapFraction",
  "pathLossDB",
  "carrierRejectionDB",
  "sharedIf",
  "temperatureExcursionK",
  "frontEndLossDB",
  "frontEndTemperatureK",
  "chain",
  "dwellMs",
  "centerGHz",
  "bandwidthMHz",
  "dsbOffsetGHz",
  "integrationMs",
  "antennaK",
  "receiverK",
  "gainStability",
  "requiredNedtK",
  "ifFilter",
  "centreToleranceMHz",
  "receiverKSource",
];
const KEY_RANK = new Map(KEY_ORDER.map((k, i) => [k, i]));

function comparePaths(a: readonly PathSegment[], b: readonly PathSegment[]): number {
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i++) {
    const x = a[i] as PathSegment;
    const y = b[i] as PathSegment;
    if (x === y) continue;
    if (typeof x === "number" && typeof y === "number") return x - y;
    if (typeof x === "number") return -1;
    if (typeof y === "number") return 1;
    const rx = KEY_RANK.get(x) ?? KEY_ORDER.length;
    const ry = KEY_RANK.get(y) ?? KEY_ORDER.length;
    if (rx !== ry) return rx - ry;
    return x < y ? -1 : 1;
  }
  return a.length - b.length;
}

/** zod's issues as raw issues: one per unknown key, the others with their message from the error map. */
export function toRawIssues(issues: readonly z.core.$ZodIssue[]): RawIssue[] {
  const out: RawIssue[] = [];
  for (const iss of issues) {
    const path = iss.path.map((p) => (typeof p === "number" ? p : String(p)));
    if (iss.code === "unrecognized_keys") {
      for (const key of iss.keys) out.push({ path: [...path, key], message: "unknown key" });
    } else out.push({ path, message: iss.message });
  }
  return out;
}

/** Every issue once (same path and message), in document reading order, with its path formatted. */
export function orderIssues(raw: readonly RawIssue[]): PlanIssue[] {
  const seen = new Set<string>();
  const unique: RawIssue[] = [];
  for (const issue of raw) {
    const key = `${formatPath(issue.path)}\u0000${issue.message}`;
    if (seen.has(key)) continue;
    seen.add(key);
    unique.push(issue);
  }
  unique.sort((a, b) => comparePaths(a.path, b.path));
  return unique.map((i) => ({ path: formatPath(i.path), message: i.message }));
}
