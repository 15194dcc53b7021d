import { z } from "zod";
import { formatPath } from "./issues";

/**
 * The plan document `heterolane.plan/1` (docs: plan-format, "Input document").
 *
 * Field rules (types, signs, ranges, strict objects, list limits) live in the
 * zod schema; the rules that relate several fields (every `min` below its
 * `max`, `dsbOffsetGHz` above half the bandwidth, unique ids, references that
 * resolve, one chain per laser) live in `crossFieldIssues`, which runs on the
 * raw input as well so that they are reported even when other fields are
 * invalid. `parsePlan` reports every issue, each with a JSON path such as
 * `channels[2].bandwidthMHz`.
 */

export const PLAN_FORMAT = "heterolane.plan/1" as const;

/** List limits of the contract. */
export const PLAN_LIMITS = {
  channels: 256,
  chains: 64,
  lasers: 64,
  resonators: 64,
  detectors: 64,
  reachPerLaser: 64,
} as const;

// JSON numbers only: zod 4's z.number() already refuses NaN and ±Infinity
// (an overflowing literal such as 1e999 parses to Infinity). A negative zero
// becomes 0, so the parsed plan survives a JSON round trip unchanged.
const finite = () => z.number().overwrite((v) => (v === 0 ? 0 : v));
const num = () => finite();
const positive = () => finite().gt(0);
const nonNegative = () => finite().min(0);
const id = () => z.string().min(1);

const settingsSchema = z.strictObject({
  guardMHz: nonNegative(),
  imageRejectionDB: num(),
  spurMaxOrder: finite().int().min(2).max(9),
  replicaLimitDB: num(),
});

const reachSchema = z.strictObject({
  minGHz: num(),
  maxGHz: num(),
});

const lockSchema = z.strictObject({
  modulationMHz: positive(),
  modulationIndex: finite().gt(0).lt(2.4),
  orders: finite().int().min(1),
});

const laserSchema = z.strictObject({
  id: id(),
  carrierTHz: positive(),
  carrierPowerMW: positive(),
  loPowerMW: positive(),
  reach: z.array(reachSchema).max(PLAN_LIMITS.reachPerLaser),
  stepMHz: nonNegative(),
  driftMHz: nonNegative(),
  lock: lockSchema,
});

const resonatorSchema = z.strictObject({
  id: id(),
  fsrGHz: positive(),
  loadedQ: positive(),
});

const detectorSchema = z.strictObject({
  id: id(),
  minGHz: nonNegative(),
  maxGHz: positive(),
  maxInputMW: positive(),
  sampleRateGHz: positive().nullable().default(null),
});

const rfInputSchema = z.strictObject({
  minGHz: positive(),
  maxGHz: positive(),
});

const chainSchema = z.strictObject({
  id: id(),
  laser: id(),
  resonator: id(),
  detector: id(),
  mode: finite().int().min(1),
  sideband: z.enum(["upper", "lower"]),
  loOffsetGHz: num(),
  rfInput: rfInputSchema,
  tapFraction: finite().min(0).lt(1),
  pathLossDB: nonNegative(),
  carrierRejectionDB: nonNegative().default(0),
  sharedIf: z.boolean().default(false),
});

const channelSchema = z.strictObject({
  id: id(),
  name: z.string(),
  chain: id(),
  centerGHz: positive(),
  bandwidthMHz: positive(),
  dsbOffsetGHz: positive().nullable().default(null),
  integrationMs: positive(),
  antennaK: nonNegative(),
  receiverK: nonNegative(),
  gainStability: nonNegative(),
  requiredNedtK: nonNegative().nullable().default(null),
});

const planFieldsSchema = z.strictObject({
  format: z.literal(PLAN_FORMAT),
  name: z.string().min(1),
  settings: settingsSchema,
  lasers: z.array(laserSchema).max(PLAN_LIMITS.lasers),
  resonators: z.array(resonatorSchema).max(PLAN_LIMITS.resonators),
  detectors: z.array(detectorSchema).max(PLAN_LIMITS.detectors),
  chains: z.array(chainSchema).max(PLAN_LIMITS.chains),
  channels: z.array(channelSchema).max(PLAN_LIMITS.channels),
});

/** A path into the document: object keys and array indices. */
type PathSegment = string | number;
interface RawIssue {
  path: PathSegment[];
  message: string;
}

/**
 * The complete schema of `heterolane.plan/1`, cross-field rules included.
 * Prefer `parsePlan`: it also reports the cross-field rules when other
 * fields are invalid, and formats paths and messages.
 */
export const planSchema = planFieldsSchema.superRefine((plan, ctx) => {
  for (const issue of crossFieldIssues(plan)) {
    ctx.addIssue({ code: "custom", path: issue.path, message: issue.message });
  }
});

/** The parsed plan: defaults applied, omitted nullable fields set to null. */
export type Plan = z.output<typeof planSchema>;
/** The plan as written in JSON (optional fields may be omitted). */
export type PlanInput = z.input<typeof planSchema>;
export type PlanSettings = Plan["settings"];
export type PlanLaser = Plan["lasers"][number];
export type PlanReach = PlanLaser["reach"][number];
export type PlanLock = PlanLaser["lock"];
export type PlanResonator = Plan["resonators"][number];
export type PlanDetector = Plan["detectors"][number];
export type PlanChain = Plan["chains"][number];
export type PlanChannel = Plan["channels"][number];

/** One reason a document is not a valid plan. */
export type PlanIssue = { path: string; message: string };

export type ParsePlanResult = { ok: true; plan: Plan } | { ok: false; issues: PlanIssue[] };

// ---------------------------------------------------------------------------
// Cross-field rules, written against unknown input so they can run on a
// document that has other faults. Each rule only fires when the fields it
// compares are themselves well-formed.

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
function isFiniteNumber(v: unknown): v is number {
  return typeof v === "number" && Number.isFinite(v);
}
function isId(v: unknown): v is string {
  return typeof v === "string" && v.length > 0;
}
/** Shortest decimal text of a number, for messages. */
function fmt(n: number): string {
  return String(Number(n.toPrecision(12)));
}

function minBelowMax(obj: unknown, path: PathSegment[], out: RawIssue[]): void {
  if (!isRecord(obj)) return;
  const lo = obj.minGHz;
  const hi = obj.maxGHz;
  if (isFiniteNumber(lo) && isFiniteNumber(hi) && !(lo < hi)) {
    out.push({ path: [...path, "minGHz"], message: `must be below maxGHz (${fmt(hi)})` });
  }
}

const LIST_KIND = {
  lasers: "laser",
  resonators: "resonator",
  detectors: "detector",
  chains: "chain",
  channels: "channel",
} as const;
type ListKey = keyof typeof LIST_KIND;

/**
 * Ids of one list: `ids` holds the first index of every valid id; `complete`
 * is false when the list is missing or some entry lacks a valid id (then a
 * reference that does not resolve may be meant for that entry, and is not
 * reported).
 */
function collectIds(doc: Record<string, unknown>, key: ListKey, out: RawIssue[]) {
  const list = doc[key];
  const ids = new Map<string, number>();
  if (!Array.isArray(list)) return { ids, complete: false };
  let complete = true;
  list.forEach((entry, i) => {
    const v = isRecord(entry) ? entry.id : undefined;
    if (!isId(v)) {
      complete = false;
      return;
    }
    const first = ids.get(v);
    if (first === undefined) ids.set(v, i);
    else out.push({ path: [key, i, "id"], message: `duplicates the id "${v}" of ${key}[${first}]` });
  });
  return { ids, complete };
}

/**
 * The rules of the contract that relate several fields. Works on any
 * value: parts that are malformed are skipped (the field rules report them).
 */
export function crossFieldIssues(input: unknown): RawIssue[] {
  const out: RawIssue[] = [];
  if (!isRecord(input)) return out;
  const lists = {} as Record<ListKey, { ids: Map<string, number>; complete: boolean }>;
  for (const key of Object.keys(LIST_KIND) as ListKey[]) lists[key] = collectIds(input, key, out);

  const lasers = input.lasers;
  if (Array.isArray(lasers)) {
    lasers.forEach((laser, i) => {
      if (!isRecord(laser) || !Array.isArray(laser.reach)) return;
      laser.reach.forEach((r, j) => minBelowMax(r, ["lasers", i, "reach", j], out));
    });
  }
  const detectors = input.detectors;
  if (Array.isArray(detectors)) detectors.forEach((d, i) => minBelowMax(d, ["detectors", i], out));

  const chains = input.chains;
  if (Array.isArray(chains)) {
    const laserServes = new Map<string, string | number>();
    chains.forEach((chain, i) => {
      if (!isRecord(chain)) return;
      minBelowMax(chain.rfInput, ["chains", i, "rfInput"], out);
      for (const [field, listKey] of [
        ["laser", "lasers"],
        ["resonator", "resonators"],
        ["detector", "detectors"],
      ] as const) {
        const ref = chain[field];
        const target = lists[listKey];
        if (isId(ref) && target.complete && !target.ids.has(ref)) {
          out.push({
            path: ["chains", i, field],
            message: `refers to ${LIST_KIND[listKey]} "${ref}", which does not exist`,
          });
        }
      }
      const laserRef = chain.laser;
      if (isId(laserRef)) {
        const earlier = laserServes.get(laserRef);
        if (earlier === undefined) laserServes.set(laserRef, isId(chain.id) ? chain.id : i);
        else {
          const who = typeof earlier === "string" ? `chain "${earlier}"` : `chains[${earlier}]`;
          out.push({
            path: ["chains", i, "laser"],
            message: `laser "${laserRef}" already serves ${who}; a laser serves one chain`,
          });
        }
      }
    });
  }

  const channels = input.channels;
  if (Array.isArray(channels)) {
    channels.forEach((channel, i) => {
      if (!isRecord(channel)) return;
      const ref = channel.chain;
      if (isId(ref) && lists.chains.complete && !lists.chains.ids.has(ref)) {
        out.push({ path: ["channels", i, "chain"], message: `refers to chain "${ref}", which does not exist` });
      }
      const d = channel.dsbOffsetGHz;
      const bw = channel.bandwidthMHz;
      if (isFiniteNumber(d) && d > 0 && isFiniteNumber(bw) && bw > 0 && !(d > bw / 2000)) {
        out.push({
          path: ["channels", i, "dsbOffsetGHz"],
          message: `must be greater than half the bandwidth (${fmt(bw / 2000)} GHz)`,
        });
      }
    });
  }
  return out;
}

// ---------------------------------------------------------------------------
// Paths and messages.

// The one path formatter (`channels[2].bandwidthMHz`), shared with the server's 400 answers.
export { formatPath };

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
function issueMessage(iss: z.core.$ZodRawIssue): string {
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
      return iss.inclusive ? `must be at least ${fmt(m)}` : `must be greater than ${fmt(m)}`;
    }
    case "too_big": {
      const m = Number(iss.maximum);
      if (iss.origin === "array") return `must have at most ${m} items`;
      if (iss.origin === "string") return `must be at most ${m} characters`;
      return iss.inclusive ? `must be at most ${fmt(m)}` : `must be below ${fmt(m)}`;
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

// Reading order: keys in the order the contract lists them, indices ascending.
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
  "fsrGHz",
  "loadedQ",
  "minGHz",
  "maxGHz",
  "maxInputMW",
  "sampleRateGHz",
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
  "chain",
  "centerGHz",
  "bandwidthMHz",
  "dsbOffsetGHz",
  "integrationMs",
  "antennaK",
  "receiverK",
  "gainStability",
  "requiredNedtK",
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

function toRawIssues(issues: readonly z.core.$ZodIssue[]): RawIssue[] {
  const out: RawIssue[] = [];
  for (const iss of issues) {
    const path = iss.path.map((p) => (typeof p === "number" ? p : String(p)));
    if (iss.code === "unrecognized_keys") {
      for (const key of iss.keys) out.push({ path: [...path, key], message: "unknown key" });
    } else out.push({ path, message: iss.message });
  }
  return out;
}

/**
 * Validates a plan document (already parsed from JSON). Never throws: every
 * problem comes back as an issue with its JSON path, in document order.
 */
export function parsePlan(input: unknown): ParsePlanResult {
  const result = planSchema.safeParse(input, { error: issueMessage });
  if (result.success) return { ok: true, plan: result.data };
  const raw = [...toRawIssues(result.error.issues), ...crossFieldIssues(input)];
  const seen = new Set<string>();
  const unique: RawIssue[] = [];
  for (const issue of raw) {
    const key = `${formatPath(issue.path)}\u0000${issue.message}`;
    if (seen.has(key)) continue;
    seen.add(key);
    unique.push(issue);
  }
  unique.sort((a, b) => comparePaths(a.path, b.path));
  return { ok: false, issues: unique.map((i) => ({ path: formatPath(i.path), message: i.message })) };
}

/**
 * Validates a plan given as JSON text. A syntax error is one issue with the
 * empty path and the position (line and column) where parsing stopped.
 */
export function parsePlanText(text: string): ParsePlanResult {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  let value: unknown;
  try {
    value = JSON.parse(body);
  } catch {
    return { ok: false, issues: [{ path: "", message: jsonSyntaxMessage(body) }] };
  }
  return parsePlan(value);
}

function jsonSyntaxMessage(text: string): string {
  const pos = jsonErrorOffset(text);
  const before = text.slice(0, pos);
  const line = before.split("\n").length;
  const column = pos - before.lastIndexOf("\n");
  const reason = pos >= text.length ? "unexpected end of input" : `unexpected ${JSON.stringify(text[pos])}`;
  return `not valid JSON: ${reason} at line ${line}, column ${column}`;
}

/**
 * Offset of the first character at which `text` stops being JSON (RFC 8259
 * grammar); `text.length` when the input ends early. Only called after
 * `JSON.parse` failed, because Node's message does not always give a position.
 */
export function jsonErrorOffset(text: string): number {
  let i = 0;
  const n = text.length;
  const ws = () => {
    while (i < n && (text[i] === " " || text[i] === "\t" || text[i] === "\n" || text[i] === "\r")) i++;
  };
  class Stop {
    constructor(readonly at: number) {}
  }
  const fail = (): never => {
    throw new Stop(i);
  };
  const expect = (word: string) => {
    for (const ch of word) {
      if (text[i] !== ch) fail();
      i++;
    }
  };
  const digits = () => {
    const start = i;
    while (i < n && text[i]! >= "0" && text[i]! <= "9") i++;
    if (i === start) fail();
  };
  const number = () => {
    if (text[i] === "-") i++;
    if (text[i] === "0") i++;
    else digits();
    if (text[i] === ".") {
      i++;
      digits();
    }
    if (text[i] === "e" || text[i] === "E") {
      i++;
      if (text[i] === "+" || text[i] === "-") i++;
      digits();
    }
  };
  const string = () => {
    expect('"');
    for (;;) {
      if (i >= n) fail();
      const c = text.charCodeAt(i);
      if (c === 0x22) {
        i++;
        return;
      }
      if (c < 0x20) fail();
      if (c === 0x5c) {
        i++;
        const esc = text[i];
        if (esc === "u") {
          i++;
          for (let k = 0; k < 4; k++) {
            if (!/[0-9a-fA-F]/.test(text[i] ?? "")) fail();
            i++;
          }
        } else if (esc !== undefined && '"\\/bfnrt'.includes(esc)) i++;
        else fail();
      } else i++;
    }
  };
  // Iterative over nesting so deep documents cannot overflow the stack.
  const stack: ("{" | "[")[] = [];
  const value = () => {
    ws();
    const c = text[i];
    if (c === "{" || c === "[") {
      stack.push(c);
      i++;
      ws();
      if (text[i] === (c === "{" ? "}" : "]")) {
        i++;
        stack.pop();
        return false;
      }
      if (c === "{") {
        string();
        ws();
        expect(":");
      }
      return true; // a container was opened: its first value comes next
    }
    if (c === '"') string();
    else if (c === "t") expect("true");
    else if (c === "f") expect("false");
    else if (c === "n") expect("null");
    else if (c === "-" || (c !== undefined && c >= "0" && c <= "9")) number();
    else fail();
    return false;
  };
  try {
    for (;;) {
      if (value()) continue;
      // After a complete value: close containers or move to the next member.
      for (;;) {
        ws();
        const top = stack[stack.length - 1];
        if (top === undefined) {
          if (i < n) fail();
          return n;
        }
        if (text[i] === ",") {
          i++;
          if (top === "{") {
            ws();
            string();
            ws();
            expect(":");
          }
          break;
        }
        expect(top === "{" ? "}" : "]");
        stack.pop();
      }
    }
  } catch (e) {
    if (e instanceof Stop) return Math.min(e.at, n);
    throw e;
  }
}
