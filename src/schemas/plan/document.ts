// (Longer than most files: the whole plan document's schema, entity by entity with the version 2 fields beside the version 1 ones, is kept in one place so the format and docs/plan-format.md can be read side by side.)
import { z } from "zod";
import {
  channelShape,
  channelV2Shape,
  chainNoiseShape,
  chainShape,
  chainV2Shape,
  channelNoiseShape,
  detectorNoiseShape,
  detectorShape,
  documentRules as r,
  FIELD_DEFAULTS,
  laserNoiseShape,
  laserShape,
  lockShape,
  MAX_REACH_INTERVALS,
  planIdSchema as id,
  resonatorNoiseShape,
  resonatorShape,
  resonatorV2Shape,
  settingsShape,
} from "../fields";
import { dwellShape, MAX_DWELLS, scheduleShape } from "../schedule-fields";
import { crossFieldIssues } from "./cross-field";
import { noiseFieldIssues } from "./cross-field-noise";
import {
  PLAN_FORMAT,
  PLAN_FORMAT_V1,
  PLAN_FORMATS,
  VERSION_2_FIELDS,
  VERSION_2_NOISE_FIELDS,
  versionIssues,
  withVersion2Fields,
} from "./versions";

/**
 * The zod schema of the plan document, versions `heterolane.plan/1` and
 * `heterolane.plan/2` (docs/plan-format.md §2 "The plan document" and §12
 * "Version 2"): types, signs, ranges, strict objects and list limits. The
 * numeric rules come from the shared field rules (`../fields.ts`) in their
 * document dialect; the rules that relate several fields are
 * `crossFieldIssues` (`cross-field.ts`); which fields belong to version 2,
 * and their defaults, is `versions.ts`. Every document parses to a plan of
 * the current version with every field written out.
 */

export { PLAN_FORMAT, PLAN_FORMAT_V1, PLAN_FORMATS } from "./versions";

/** List limits (docs/plan-format.md §2.10 "List limits"). */
export const PLAN_LIMITS = {
  channels: 256,
  chains: 64,
  lasers: 64,
  resonators: 64,
  detectors: 64,
  reachPerLaser: MAX_REACH_INTERVALS,
} as const;

const settingsSchema = z.strictObject(settingsShape(r));

const reachSchema = z.strictObject({
  minGHz: r.number(),
  maxGHz: r.number(),
});

/** A version 2 field: optional in the document (its default is filled in after the version check). */
const optionalV2 = <T extends z.ZodType>(schema: T, value: unknown, description: string) =>
  schema
    .optional()
    .meta({ default: value, description: `${description} (version 2; default ${JSON.stringify(value)})` });

/** One dwell of an observation schedule: a chain of the laser pair and how long each cycle stays on it. */
const dwellSchema = z.strictObject({
  chain: id(),
  ...dwellShape(r),
});

/** A laser pair's observation schedule (docs/plan-format.md, "Observation schedules"), or null. */
const scheduleSchema = z
  .strictObject({
    ...scheduleShape(r),
    dwells: z.array(dwellSchema).min(1).max(MAX_DWELLS),
  })
  .nullable();
/** The noise-budget fields of an entity (docs/plan-format.md §14.1), each optional with its default. */
function noiseFields<S extends Record<string, z.ZodType>>(
  shape: S,
  defaults: { [K in keyof S]: unknown },
  descriptions: { [K in keyof S]: string },
): { [K in keyof S]: ReturnType<typeof optionalV2<S[K]>> } {
  const out: Record<string, z.ZodType> = {};
  for (const k of Object.keys(shape) as (keyof S & string)[]) {
    out[k] = optionalV2(shape[k] as S[typeof k], defaults[k], descriptions[k]);
  }
  return out as { [K in keyof S]: ReturnType<typeof optionalV2<S[K]>> };
}

const laserSchema = z.strictObject({
  id: id(),
  ...laserShape(r, {
    reach: z.array(reachSchema).max(PLAN_LIMITS.reachPerLaser),
    lock: z.strictObject(lockShape(r)),
  }),
  schedule: optionalV2(
    scheduleSchema,
    VERSION_2_FIELDS.lasers.schedule,
    "the laser pair's observation schedule: dwells on its chains in turn, repeated every cycle, or null",
  ),
  ...noiseFields(laserNoiseShape(r), VERSION_2_NOISE_FIELDS.lasers, {
    carrierRinDBcPerHz: "relative intensity noise of the carrier at the IF offsets, dBc/Hz, or null",
    loRinDBcPerHz: "relative intensity noise of the LO at the IF offsets, dBc/Hz, or null",
    carrierFloorDBcPerHz:
      "broadband noise floor of the carrier laser at the signal's offset from it (about the RF frequency), dBc/Hz, or null",
    loFloorDBcPerHz:
      "broadband noise floor of the LO laser at the residual carrier's offset from it (about the LO offset), dBc/Hz, or null",
    carrierPreFilterDB: "rejection of the carrier's broadband floor by a filter before the resonator, dB",
    loPreFilterDB: "rejection of the LO's broadband floor by a filter before the detector, dB",
  }),
});

const resonatorV2 = resonatorV2Shape(r);
const resonatorSchema = z.strictObject({
  id: id(),
  ...resonatorShape(r),
  fsrShiftMHzPerK: optionalV2(
    resonatorV2.fsrShiftMHzPerK,
    VERSION_2_FIELDS.resonators.fsrShiftMHzPerK,
    "change of the FSR per kelvin of resonator temperature, MHz/K, signed",
  ),
  ...noiseFields(resonatorNoiseShape(r), VERSION_2_NOISE_FIELDS.resonators, {
    intrinsicQ: "intrinsic (unloaded) Q of the optical modes, above loadedQ, or null",
    conversionEfficiency: "measured photon conversion efficiency η of the wanted mode, 0 < η ≤ 1, or null",
    g0Hz: "single-photon electro-optic coupling rate g₀/2π, Hz, or null",
    mmWaveQ: "loaded Q of the mm-wave mode, or null",
    mmWaveCouplingRatio: "coupling share κ_ex/κ of the mm-wave mode, 0 < r ≤ 1, or null",
  }),
});

const detector = detectorShape(r);
const detectorSchema = z.strictObject({
  id: id(),
  ...detector,
  sampleRateGHz: detector.sampleRateGHz.default(FIELD_DEFAULTS.detector.sampleRateGHz),
  ...noiseFields(detectorNoiseShape(r), VERSION_2_NOISE_FIELDS.detectors, {
    responsivityAPerW: "responsivity of each photodiode, A/W, or null",
    quantumEfficiency: "quantum efficiency of the photodiodes, 0 < η ≤ 1, or null",
    noiseCurrentPAPerRtHz: "input-referred current noise density of the balanced receiver, pA/√Hz, or null",
    cmrrDB: "common-mode rejection of the balanced pair, dB, or null",
  }),
});

const chain = chainShape(r, {
  // The plan's RF input is a physical band: both edges above 0.
  rfInput: z.strictObject({
    minGHz: r.positive(),
    maxGHz: r.positive(),
  }),
});
const chainSchema = z.strictObject({
  id: id(),
  laser: id(),
  resonator: id(),
  detector: id(),
  ...chain,
  carrierRejectionDB: chain.carrierRejectionDB.default(FIELD_DEFAULTS.chain.carrierRejectionDB),
  sharedIf: chain.sharedIf.default(FIELD_DEFAULTS.chain.sharedIf),
  temperatureExcursionK: optionalV2(
    chainV2Shape(r).temperatureExcursionK,
    VERSION_2_FIELDS.chains.temperatureExcursionK,
    "± excursion of the resonator temperature about its set point while observing, K",
  ),
  ...noiseFields(chainNoiseShape(r), VERSION_2_NOISE_FIELDS.chains, {
    frontEndLossDB: "loss between the antenna and the resonator, dB",
    frontEndTemperatureK: "physical temperature of that loss, K",
  }),
});

const channel = channelShape(r);
const channelSchema = z.strictObject({
  id: id(),
  name: z.string(),
  chain: id(),
  ...channel,
  dsbOffsetGHz: channel.dsbOffsetGHz.default(FIELD_DEFAULTS.channel.dsbOffsetGHz),
  requiredNedtK: channel.requiredNedtK.default(FIELD_DEFAULTS.channel.requiredNedtK),
  ifFilter: optionalV2(
    channelV2Shape(r).ifFilter,
    VERSION_2_FIELDS.channels.ifFilter,
    '"slot": the IF filter passes the nominal slot; "occupied": the slot widened by the LO drift',
  ),
  centreToleranceMHz: optionalV2(
    channelV2Shape(r).centreToleranceMHz,
    VERSION_2_FIELDS.channels.centreToleranceMHz,
    "allowed error of the effective centre of each passband, MHz, or null",
  ),
  ...noiseFields(channelNoiseShape(r), VERSION_2_NOISE_FIELDS.channels, {
    receiverKSource: '"entered": NEΔT uses receiverK; "computed": NEΔT uses the noise budget\'s total',
  }),
});

/** The field rules of the whole document, without the cross-field rules. */
const planFieldsSchema = z.strictObject({
  format: z.enum(PLAN_FORMATS),
  name: z.string().min(1),
  settings: settingsSchema,
  lasers: z.array(laserSchema).max(PLAN_LIMITS.lasers),
  resonators: z.array(resonatorSchema).max(PLAN_LIMITS.resonators),
  detectors: z.array(detectorSchema).max(PLAN_LIMITS.detectors),
  chains: z.array(chainSchema).max(PLAN_LIMITS.chains),
  channels: z.array(channelSchema).max(PLAN_LIMITS.channels),
});

/**
 * The complete schema of the plan document, cross-field rules and the
 * version check included; its output is a plan of the current version
 * (`format` is `heterolane.plan/2`, every version 2 field filled in).
 * Prefer `parsePlan`: it also reports the cross-field rules when other
 * fields are invalid, and formats paths and messages.
 */
export const planSchema = planFieldsSchema
  .superRefine((plan, ctx) => {
    for (const issue of [...crossFieldIssues(plan), ...noiseFieldIssues(plan), ...versionIssues(plan)]) {
      ctx.addIssue({ code: "custom", path: issue.path, message: issue.message });
    }
  })
  .transform((plan) => ({
    ...plan,
    format: PLAN_FORMAT,
    lasers: plan.lasers.map((e) =>
      withVersion2Fields(withVersion2Fields(e, VERSION_2_NOISE_FIELDS.lasers), VERSION_2_FIELDS.lasers),
    ),
    detectors: plan.detectors.map((e) => withVersion2Fields(e, VERSION_2_NOISE_FIELDS.detectors)),
    resonators: plan.resonators.map((e) =>
      withVersion2Fields(withVersion2Fields(e, VERSION_2_NOISE_FIELDS.resonators), VERSION_2_FIELDS.resonators),
    ),
    chains: plan.chains.map((e) =>
      withVersion2Fields(withVersion2Fields(e, VERSION_2_NOISE_FIELDS.chains), VERSION_2_FIELDS.chains),
    ),
    channels: plan.channels.map((e) =>
      withVersion2Fields(withVersion2Fields(e, VERSION_2_NOISE_FIELDS.channels), VERSION_2_FIELDS.channels),
    ),
  }));

/** An entity schema without the fields version 2 added to it (a version 1 document's entity). */
function versionOne<S extends z.ZodObject>(schema: S, added: Record<string, unknown>) {
  const mask = Object.fromEntries(Object.keys(added).map((k) => [k, true])) as Record<string, true>;
  return schema.omit(mask as never);
}

/**
 * The two versions of the document as written (no defaults filled in, no
 * version upgrade, no cross-field rules), for the JSON Schema of the format
 * (`docs/schema/plan.schema.json`): a `heterolane.plan/2` document, or a
 * `heterolane.plan/1` document, which has none of the fields of
 * `VERSION_2_FIELDS`.
 */
export const planDocumentSchema = z
  .union([
    planFieldsSchema.extend({ format: z.literal(PLAN_FORMAT) }).meta({
      title: "heterolane.plan/2",
      description: "A plan document of version 2 (docs/plan-format.md §2 and §12).",
    }),
    planFieldsSchema
      .extend({
        format: z.literal(PLAN_FORMAT_V1),
        lasers: z
          .array(versionOne(laserSchema, { ...VERSION_2_NOISE_FIELDS.lasers, ...VERSION_2_FIELDS.lasers }))
          .max(PLAN_LIMITS.lasers),
        detectors: z.array(versionOne(detectorSchema, VERSION_2_NOISE_FIELDS.detectors)).max(PLAN_LIMITS.detectors),
        resonators: z
          .array(versionOne(resonatorSchema, { ...VERSION_2_NOISE_FIELDS.resonators, ...VERSION_2_FIELDS.resonators }))
          .max(PLAN_LIMITS.resonators),
        chains: z
          .array(versionOne(chainSchema, { ...VERSION_2_NOISE_FIELDS.chains, ...VERSION_2_FIELDS.chains }))
          .max(PLAN_LIMITS.chains),
        channels: z
          .array(versionOne(channelSchema, { ...VERSION_2_NOISE_FIELDS.channels, ...VERSION_2_FIELDS.channels }))
          .max(PLAN_LIMITS.channels),
      })
      .meta({
        title: "heterolane.plan/1",
        description: "A plan document of version 1 (docs/plan-format.md §2); read with the defaults of version 2.",
      }),
  ])
  .meta({
    title: "Heterolane plan document",
    description:
      "A frequency plan of a microwave-photonic radiometer (docs/plan-format.md). Rules between fields (§2.8) are not expressed here.",
  });

/** The parsed plan: defaults applied, omitted nullable fields set to null, version 2 fields filled in. */
export type Plan = z.output<typeof planSchema>;
/** The plan as written in JSON (optional fields may be omitted). */
export type PlanInput = z.input<typeof planSchema>;
export type PlanSettings = Plan["settings"];
export type PlanLaser = Plan["lasers"][number];
export type PlanReach = PlanLaser["reach"][number];
export type PlanLock = PlanLaser["lock"];
export type PlanSchedule = NonNullable<PlanLaser["schedule"]>;
export type PlanDwell = PlanSchedule["dwells"][number];
export type PlanResonator = Plan["resonators"][number];
export type PlanDetector = Plan["detectors"][number];
export type PlanChain = Plan["chains"][number];
export type PlanChannel = Plan["channels"][number];
