// (Longer than most files: every entity's field rules sit together so that the plan document and the forms, which both build on them, read one list; split by entity they would scatter the two dialects.)
import { z } from "zod";

/**
 * The field rules that the plan document (`plan/document.ts`) and the
 * workspace forms (`workspace.ts`) share, written once: which numbers each
 * field of the plan's entities takes (finite, positive, non-negative, whole,
 * bounded), the sideband choice, the id rules, and the two rules that relate
 * fields (every `min` below its `max`; a DSB offset beyond half the
 * bandwidth).
 *
 * A rule is built in one of two dialects, which differ only in wording and
 * in one normalisation:
 * - `documentRules` carry no message of their own (`parsePlan` words every
 *   issue with its error map, `plan/messages.ts`) and read a negative zero
 *   as 0, so a parsed plan survives a JSON round trip unchanged;
 * - `formRules` carry, on every check, the message a form shows beside the
 *   field.
 *
 * Text and integers that reach the database follow one rule, written here
 * and used by every schema (docs/decisions/023-hardening.md): text holds no
 * control characters (tab and line breaks only where a field is multi-line)
 * and no lone UTF-16 surrogates (they cannot be written as UTF-8), and a
 * whole number in a form fits the `integer` column it is stored in.
 *
 * The entity tables below return the shared fields in plan-document order
 * (so parsed objects and issue lists keep that order); each schema adds its
 * own id and reference fields, its defaults and its wording of the
 * cross-field rules.
 */

export interface FieldRules {
  /** Any finite number; `what` names it in the form message ("a number" unless told). */
  number(what?: string): z.ZodNumber;
  /** A finite number above 0. */
  positive(): z.ZodNumber;
  /** A finite number of 0 or more. */
  nonNegative(): z.ZodNumber;
  /** A whole number of `min` or more (counts, orders, mode numbers, versions). */
  count(min: number): z.ZodNumber;
  /** A whole number from `min` to `max`. */
  countBetween(min: number, max: number): z.ZodNumber;
  /** A share from 0 to below 1 (the lock tap fraction). */
  fraction(): z.ZodNumber;
  /** A phase-modulation index above 0 and below the first zero of J0. */
  modulationIndex(): z.ZodNumber;
  /** true or false. */
  flag(): z.ZodBoolean;
  /** `upper` or `lower`. */
  sideband(): z.ZodEnum<{ upper: "upper"; lower: "lower" }>;
  /** A temperature excursion in K: 0 up to `MAX_TEMPERATURE_EXCURSION_K`. */
  temperatureExcursion(): z.ZodNumber;
  /** `slot` or `occupied`: which IF band a channel's filter passes. */
  ifFilter(): z.ZodEnum<{ slot: "slot"; occupied: "occupied" }>;
  /** An efficiency or coupling share: above 0, at most 1. */
  efficiency(): z.ZodNumber;
  /** `entered` or `computed`: where a channel's receiver temperature comes from. */
  receiverKSource(): z.ZodEnum<{ entered: "entered"; computed: "computed" }>;
}

/** The largest value of a PostgreSQL `integer` column (2³¹ − 1; PostgreSQL manual §8.1.1 "Integer Types"). */
export const INT4_MAX = 2_147_483_647;

/** The largest modulation index accepted: just below the first zero of J0 (2.405), so the carrier keeps power. */
export const MAX_MODULATION_INDEX = 2.4;
/** Most reach intervals one laser pair may list (docs/plan-format.md §2.10 "List limits"). */
export const MAX_REACH_INTERVALS = 64;
export const SIDEBANDS = ["upper", "lower"] as const;
/** The IF filter of a channel passes its nominal slot, or the occupied band (the slot widened by the LO drift). */
export const IF_FILTERS = ["slot", "occupied"] as const;
/** The largest resonator temperature excursion a chain may state (K): well beyond any controlled resonator. */
export const MAX_TEMPERATURE_EXCURSION_K = 50;
/** A channel's receiver temperature is the one entered (measured), or the one its noise budget computes. */
export const RECEIVER_K_SOURCES = ["entered", "computed"] as const;

function buildRules(dialect: "document" | "form"): FieldRules {
  const form = dialect === "form";
  /** The message of one check, in the form dialect only. */
  const say = (message: string) => (form ? { error: message } : undefined);
  // JSON numbers only: zod 4's z.number() already refuses NaN and ±Infinity
  // (an overflowing literal such as 1e999 parses to Infinity).
  const number = (what = "a number") =>
    form
      ? z.number({ error: (iss) => (iss.input === undefined ? "is required" : `must be ${what}`) })
      : z.number().overwrite((v) => (v === 0 ? 0 : v));
  // The form dialect stores its whole numbers in integer columns, so it bounds them; the plan
  // document (checked without storing) does not, and the import path checks what it stores.
  const whole = () => {
    const n = number("a whole number").int(say("must be a whole number"));
    return form ? n.lte(INT4_MAX, say(`must be ${INT4_MAX} or less`)) : n;
  };
  return {
    number: (what) => number(what),
    positive: () => number().gt(0, say("must be greater than 0")),
    nonNegative: () => number().gte(0, say("must be 0 or more")),
    count: (min) => whole().gte(min, say(`must be ${min} or more`)),
    countBetween: (min, max) =>
      whole()
        .gte(min, say(`must be ${min} or more`))
        .lte(max, say(`must be ${max} or less`)),
    fraction: () => number().gte(0, say("must be 0 or more")).lt(1, say("must be below 1")),
    modulationIndex: () =>
      number()
        .gt(0, say("must be greater than 0"))
        .lt(MAX_MODULATION_INDEX, say(`must be below ${MAX_MODULATION_INDEX} (the first zero of J0)`)),
    flag: () => (form ? z.boolean({ error: "must be true or false" }) : z.boolean()),
    sideband: () => (form ? z.enum(SIDEBANDS, { error: "must be upper or lower" }) : z.enum(SIDEBANDS)),
    temperatureExcursion: () =>
      number()
        .gte(0, say("must be 0 or more"))
        .lte(MAX_TEMPERATURE_EXCURSION_K, say(`must be ${MAX_TEMPERATURE_EXCURSION_K} or less`)),
    ifFilter: () => (form ? z.enum(IF_FILTERS, { error: "must be slot or occupied" }) : z.enum(IF_FILTERS)),
    efficiency: () => number().gt(0, say("must be greater than 0")).lte(1, say("must be 1 or less")),
    receiverKSource: () =>
      form ? z.enum(RECEIVER_K_SOURCES, { error: "must be entered or computed" }) : z.enum(RECEIVER_K_SOURCES),
  };
}

/** The rules as the plan document states them (messages from `parsePlan`'s error map). */
export const documentRules: FieldRules = buildRules("document");
/** The rules as the workspace forms state them (a message on every check). */
export const formRules: FieldRules = buildRules("form");

// ---------------------------------------------------------------- text

/** C0 controls, DEL and C1 controls. */
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/;
/** The same without tab, line feed and carriage return (a form's text area sends CR LF line breaks). */
const CONTROL_MULTI_LINE = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

const codePoint = (ch: string) => `U+${ch.charCodeAt(0).toString(16).toUpperCase().padStart(4, "0")}`;

/**
 * What is wrong with a text value, in the words of a field error, or null:
 * a control character (NUL and the like; in multi-line text tab and line
 * breaks are allowed) or a lone surrogate.
 */
export function textProblem(value: string, options: { multiLine?: boolean } = {}): string | null {
  const control = value.match(options.multiLine ? CONTROL_MULTI_LINE : CONTROL);
  if (control)
    return `must not contain control characters (found ${codePoint(control[0])}${
      options.multiLine ? "; tabs and line breaks are fine" : ""
    })`;
  const lone = value.match(LONE_SURROGATE);
  if (lone) return `is not valid Unicode text (a lone surrogate ${codePoint(lone[0])})`;
  return null;
}

/** Adds the text rule to a string schema (a field error naming the character). */
export function withTextRule<S extends z.ZodType<string, string>>(schema: S, options: { multiLine?: boolean } = {}): S {
  return schema.superRefine((value, ctx) => {
    const problem = typeof value === "string" ? textProblem(value, options) : null;
    if (problem) ctx.addIssue({ code: "custom", message: problem, input: value });
  }) as unknown as S;
}

/** Single-line text: any string without control characters. */
export const lineTextSchema = (message = "must be text") => withTextRule(z.string({ error: message }));

/** Multi-line text (notes, comments, descriptions): tabs and line breaks allowed. */
export const multiLineTextSchema = (message = "must be text") =>
  withTextRule(z.string({ error: message }), { multiLine: true });

/** A query or path parameter: single-line text of at most `max` characters. */
export const paramTextSchema = (max = 200, missing = "is required") =>
  withTextRule(z.string({ error: missing }).max(max, { error: `must be at most ${max} characters` }));

// ---------------------------------------------------------------- ids

/** An id in the plan document (and a reference to one): any non-empty string without control characters. */
export const planIdSchema = () => withTextRule(z.string().min(1));

/**
 * A plan-document id as the workspace stores it (`key`): a plan id that is
 * also at most 64 characters and has no surrounding spaces.
 */
export const entityKeySchema = withTextRule(
  z
    .string({ error: "is required" })
    .min(1, { error: "is required" })
    .max(64, { error: "must be at most 64 characters" })
    .refine((s) => s.trim() === s, { error: "must not start or end with a space" }),
);

/** A reference to a stored row (chains name their hardware, channels their chain). */
export const rowIdSchema = z.uuid({ error: "must be the id of an existing row" });

/** Required single-line text of a form, trimmed: a mission's or a channel's name. */
export const requiredTextSchema = (max: number) =>
  withTextRule(
    z
      .string({ error: "is required" })
      .trim()
      .min(1, { error: "is required" })
      .max(max, { error: `must be at most ${max} characters` }),
  );

/** Optional multi-line text of a form, trimmed (a mission's description, a note). */
export const optionalMultiLineTextSchema = (max: number) =>
  withTextRule(
    z
      .string({ error: "must be text" })
      .trim()
      .max(max, { error: `must be at most ${max} characters` }),
    { multiLine: true },
  );

// ---------------------------------------------------------------- rules that relate fields

/** An interval is well formed when its lower edge lies below its upper edge. */
export const isOrdered = (minGHz: number, maxGHz: number): boolean => minGHz < maxGHz;

/** Half a channel's bandwidth in GHz. */
export const halfBandGHz = (bandwidthMHz: number): number => bandwidthMHz / 2000;

/** A DSB offset must exceed half the bandwidth, or the two passbands would touch at the centre. */
export const dsbOffsetClears = (dsbOffsetGHz: number, bandwidthMHz: number): boolean =>
  dsbOffsetGHz > halfBandGHz(bandwidthMHz);

// ---------------------------------------------------------------- the entities' shared fields, in document order

export const settingsShape = (r: FieldRules) => ({
  guardMHz: r.nonNegative(),
  imageRejectionDB: r.number(),
  spurMaxOrder: r.countBetween(2, 9),
  replicaLimitDB: r.number(),
});

export const lockShape = (r: FieldRules) => ({
  modulationMHz: r.positive(),
  modulationIndex: r.modulationIndex(),
  orders: r.count(1),
});

/** A laser pair's fields after its id; `reach` and `lock` are the caller's objects (strictness and wording differ). */
export const laserShape = <Reach extends z.ZodType, Lock extends z.ZodType>(
  r: FieldRules,
  parts: { reach: Reach; lock: Lock },
) => ({
  carrierTHz: r.positive(),
  carrierPowerMW: r.positive(),
  loPowerMW: r.positive(),
  reach: parts.reach,
  stepMHz: r.nonNegative(),
  driftMHz: r.nonNegative(),
  lock: parts.lock,
});

export const resonatorShape = (r: FieldRules) => ({
  fsrGHz: r.positive(),
  loadedQ: r.positive(),
});

export const detectorShape = (r: FieldRules) => ({
  minGHz: r.nonNegative(),
  maxGHz: r.positive(),
  maxInputMW: r.positive(),
  sampleRateGHz: r.positive().nullable(),
});

/** A chain's fields after its hardware references; `rfInput` is the caller's interval object. */
export const chainShape = <RfInput extends z.ZodType>(r: FieldRules, parts: { rfInput: RfInput }) => ({
  mode: r.count(1),
  sideband: r.sideband(),
  loOffsetGHz: r.number(),
  rfInput: parts.rfInput,
  tapFraction: r.fraction(),
  pathLossDB: r.nonNegative(),
  carrierRejectionDB: r.nonNegative(),
  sharedIf: r.flag(),
});

/** A channel's fields after its id, name and chain reference. */
export const channelShape = (r: FieldRules) => ({
  centerGHz: r.positive(),
  bandwidthMHz: r.positive(),
  dsbOffsetGHz: r.positive().nullable(),
  integrationMs: r.positive(),
  antennaK: r.nonNegative(),
  receiverK: r.nonNegative(),
  gainStability: r.nonNegative(),
  requiredNedtK: r.nonNegative().nullable(),
});

// ---------------------------------------------------------------- fields of version 2 (the operating envelope)

/**
 * The fields `heterolane.plan/2` adds (docs/plan-format.md §12 "Version 2:
 * the operating envelope"), per entity, in document order. Which fields are
 * version-2-only, and the value a document without them is read with, is
 * listed once in `plan/versions.ts`.
 */
export const resonatorV2Shape = (r: FieldRules) => ({
  fsrShiftMHzPerK: r.number(),
});
export const chainV2Shape = (r: FieldRules) => ({
  temperatureExcursionK: r.temperatureExcursion(),
});
export const channelV2Shape = (r: FieldRules) => ({
  ifFilter: r.ifFilter(),
  centreToleranceMHz: r.positive().nullable(),
});

// ---------------------------------------------------------------- fields of version 2 (the noise budget)

/**
 * The noise-budget fields of `heterolane.plan/2` (docs/plan-format.md §14
 * "Version 2: the receiver noise budget"), per entity, in document order;
 * every one optional (`null` or a neutral default), listed with its default
 * in `plan/versions.ts`.
 */
export const laserNoiseShape = (r: FieldRules) => ({
  carrierRinDBcPerHz: r.number().nullable(),
  loRinDBcPerHz: r.number().nullable(),
  carrierFloorDBcPerHz: r.number().nullable(),
  loFloorDBcPerHz: r.number().nullable(),
  carrierPreFilterDB: r.nonNegative(),
  loPreFilterDB: r.nonNegative(),
});
export const resonatorNoiseShape = (r: FieldRules) => ({
  intrinsicQ: r.positive().nullable(),
  conversionEfficiency: r.efficiency().nullable(),
  g0Hz: r.positive().nullable(),
  mmWaveQ: r.positive().nullable(),
  mmWaveCouplingRatio: r.efficiency().nullable(),
});
export const detectorNoiseShape = (r: FieldRules) => ({
  responsivityAPerW: r.positive().nullable(),
  quantumEfficiency: r.efficiency().nullable(),
  noiseCurrentPAPerRtHz: r.nonNegative().nullable(),
  cmrrDB: r.nonNegative().nullable(),
});
export const chainNoiseShape = (r: FieldRules) => ({
  frontEndLossDB: r.nonNegative(),
  frontEndTemperatureK: r.nonNegative(),
});
export const channelNoiseShape = (r: FieldRules) => ({
  receiverKSource: r.receiverKSource(),
});

/** The values the noise-budget fields take when left out (none of them changes a result). */
export const NOISE_FIELD_DEFAULTS = {
  laser: {
    carrierRinDBcPerHz: null,
    loRinDBcPerHz: null,
    carrierFloorDBcPerHz: null,
    loFloorDBcPerHz: null,
    carrierPreFilterDB: 0,
    loPreFilterDB: 0,
  },
  resonator: { intrinsicQ: null, conversionEfficiency: null, g0Hz: null, mmWaveQ: null, mmWaveCouplingRatio: null },
  detector: { responsivityAPerW: null, quantumEfficiency: null, noiseCurrentPAPerRtHz: null, cmrrDB: null },
  chain: { frontEndLossDB: 0, frontEndTemperatureK: 290 },
  channel: { receiverKSource: "entered" },
} as const;

/** The values a complete entity takes for a field left out (the "if omitted" column of docs/plan-format.md §2.5–§2.7; the forms send partial updates without them). */
export const FIELD_DEFAULTS = {
  resonator: { fsrShiftMHzPerK: 0 },
  detector: { sampleRateGHz: null },
  chain: { carrierRejectionDB: 0, sharedIf: false, temperatureExcursionK: 0 },
  channel: { dsbOffsetGHz: null, requiredNedtK: null, ifFilter: "slot", centreToleranceMHz: null },
} as const;
