import { z } from "zod";
import { NOISE_TERMS, RESULT_FORMAT, RULE_ORDER, SEVERITIES, SPUR_FAMILIES } from "@/lib/plan/types";

/**
 * The zod schema of the result document `heterolane.result/2`
 * (docs/plan-format.md §7 "The result document" and §12.7 "The result
 * document of version 2"): what `checkPlan` writes, the CLI prints,
 * `POST /api/v1/check` answers and every saved revision stores. Strict at
 * every level, so a field the format does not list is refused. The engine's
 * own types are `src/lib/plan/types.ts`; the tests parse every result the
 * engine gives with this schema, and its JSON Schema is
 * `docs/schema/result.schema.json`.
 */

/** A finite number (the result never holds NaN or ±Infinity: such a figure is written as null). */
const num = () => z.number();
const pair = () => z.tuple([num(), num()]).meta({ description: "[lo, hi] in the unit of the field name" });
const nullable = <T extends z.ZodType>(t: T) => t.nullable();

const codeSchema = z.enum(RULE_ORDER);

export const envelopePointSchema = z
  .strictObject({
    loShiftMHz: num().meta({ description: "LO shift u from the plan's offset, MHz" }),
    temperatureOffsetK: num().meta({ description: "resonator temperature offset t from its set point, K" }),
  })
  .meta({ id: "EnvelopePoint", description: "A point of the operating envelope" });

export const channelEnvelopeSchema = z
  .strictObject({
    worstNedtK: nullable(num()),
    worstNedtAt: nullable(envelopePointSchema),
    worstRadiometricBandwidthMHz: nullable(num()),
    worstRadiometricBandwidthAt: nullable(envelopePointSchema),
    worstImageRejectionDB: nullable(num()),
    worstImageRejectionAt: nullable(envelopePointSchema),
    worstModeResponse: num().gte(0).lte(1),
    worstModeResponseAt: envelopePointSchema,
    centreErrorMHz: nullable(num().gte(0)),
    centreErrorAt: nullable(envelopePointSchema),
  })
  .meta({ id: "ChannelEnvelope", description: "A channel's figures over the operating envelope (§12.7)" });

export const chainResultSchema = z
  .strictObject({
    id: z.string(),
    linewidthMHz: num(),
    pdInputMW: num(),
    feasibleGHz: z.array(pair()),
    excludedGHz: z.array(z.strictObject({ bandGHz: pair(), codes: z.array(codeSchema).min(1) })),
    placeGHz: nullable(num()),
    placeReason: z.union([z.null(), z.literal("no-feasible-interval"), z.literal("no-grid-point")]),
    temperatureWindowK: z.array(pair()),
    temperatureMarginK: nullable(num()),
    optimalLoPowerMW: nullable(num().gt(0)).optional().meta({
      description:
        "LO power that minimises the receiver temperature without pd-overload, mW, or null; only with a noise budget (§14.5)",
    }),
  })
  .meta({ id: "ChainResult" });

export const noiseBudgetSchema = z
  .strictObject({
    source: z.enum(["computed", "entered"]),
    totalK: num().gte(0),
    terms: z.array(z.strictObject({ term: z.enum(NOISE_TERMS), kelvin: num().gte(0) })),
    enteredK: nullable(num().gte(0)),
    ratio: nullable(num()),
    conversionEfficiency: num().gt(0).lte(1),
    conversionEfficiencySource: z.enum(["entered", "computed"]),
  })
  .meta({
    id: "NoiseBudget",
    description:
      "A channel's receiver temperature computed from the hardware, term by term, in K at the antenna (§14.4)",
  });

export const channelResultSchema = z
  .strictObject({
    id: z.string(),
    ifSlotGHz: nullable(pair()),
    occupiedGHz: nullable(pair()),
    imageGHz: nullable(pair()),
    imageRejectionDB: nullable(num()),
    radiometricBandwidthMHz: nullable(num()),
    nedtK: nullable(num()),
    lockReplicaDB: num(),
    envelope: channelEnvelopeSchema,
    noiseBudget: noiseBudgetSchema.optional(),
  })
  .meta({ id: "ChannelResult" });

export const spurSchema = z
  .strictObject({
    chain: z.string(),
    family: z.enum(SPUR_FAMILIES),
    order: z.number().int().gte(1),
    bandGHz: pair(),
    source: z.string(),
    hits: z.array(z.string()),
  })
  .meta({ id: "Spur" });

type JsonValue = null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };
const jsonValueSchema: z.ZodType<JsonValue> = z.lazy(() =>
  z.union([z.null(), z.boolean(), num(), z.string(), z.array(jsonValueSchema), z.record(z.string(), jsonValueSchema)]),
);

export const findingSchema = z
  .strictObject({
    code: codeSchema,
    severity: z.enum(SEVERITIES),
    chain: z.string(),
    channel: nullable(z.string()),
    message: z.string().min(1),
    data: z.record(z.string(), jsonValueSchema),
  })
  .meta({ id: "Finding" });

export const scheduleDwellResultSchema = z
  .strictObject({
    chain: z.string(),
    dwellMs: num(),
    loStepGHz: num().gte(0),
    retuneMs: num().gte(0),
    relockMs: num().gte(0),
    usableMs: num().gte(0),
    dutyCycle: num().gte(0).lte(1),
  })
  .meta({ id: "ScheduleDwell", description: "One dwell of an observation schedule (§13.5)" });

export const scheduleChannelResultSchema = z
  .strictObject({
    id: z.string(),
    chain: z.string(),
    integrationMs: num(),
    effectiveIntegrationMs: num().gte(0),
    nedtK: nullable(num()),
    worstNedtK: nullable(num()),
    unsharedNedtK: nullable(num()),
    unsharedWorstNedtK: nullable(num()),
    requiredNedtK: nullable(num()),
  })
  .meta({ id: "ScheduleChannel", description: "A channel of a scheduled chain (§13.5)" });

export const bestSplitResultSchema = z
  .strictObject({
    method: z.enum(["closed-form", "search"]),
    commonMargin: num(),
    currentMargin: num(),
    dwellsMs: z.array(num()),
    worstNedtK: z.array(nullable(num())),
  })
  .meta({ id: "BestSplit", description: "The dwell split with the largest common NEΔT margin (§13.6)" });

export const scheduleResultSchema = z
  .strictObject({
    laser: z.string(),
    plannedCycleMs: num(),
    busyMs: num(),
    cycleMs: num(),
    idleMs: num().gte(0),
    dwells: z.array(scheduleDwellResultSchema),
    channels: z.array(scheduleChannelResultSchema),
    bestSplit: nullable(bestSplitResultSchema),
  })
  .meta({ id: "ScheduleResult", description: "A laser pair's observation schedule as checked (§13.5)" });

export const resultDocumentSchema = z
  .strictObject({
    format: z.literal(RESULT_FORMAT),
    chains: z.array(chainResultSchema),
    channels: z.array(channelResultSchema),
    spurs: z.array(spurSchema),
    findings: z.array(findingSchema),
    schedules: z.array(scheduleResultSchema).optional().meta({
      description: "One entry per laser pair with an observation schedule; left out when the plan has none",
    }),
  })
  .meta({
    title: "Heterolane result document",
    description: "The result of checking a plan document (docs/plan-format.md §7 and §12.7).",
  });

export type ResultDocumentParsed = z.infer<typeof resultDocumentSchema>;
