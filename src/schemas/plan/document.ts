import { z } from "zod";
import {
  channelShape,
  channelV2Shape,
  chainShape,
  chainV2Shape,
  detectorShape,
  documentRules as r,
  FIELD_DEFAULTS,
  laserShape,
  lockShape,
  MAX_REACH_INTERVALS,
  planIdSchema as id,
  resonatorShape,
  resonatorV2Shape,
  settingsShape,
} from "../fields";
import { crossFieldIssues } from "./cross-field";
import { PLAN_FORMAT, PLAN_FORMATS, VERSION_2_FIELDS, versionIssues, withVersion2Fields } from "./versions";

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

const laserSchema = z.strictObject({
  id: id(),
  ...laserShape(r, {
    reach: z.array(reachSchema).max(PLAN_LIMITS.reachPerLaser),
    lock: z.strictObject(lockShape(r)),
  }),
});

/** A version 2 field: optional in the document (its default is filled in after the version check). */
const optionalV2 = <T extends z.ZodType>(schema: T, value: unknown) => schema.optional().meta({ default: value });

const resonatorV2 = resonatorV2Shape(r);
const resonatorSchema = z.strictObject({
  id: id(),
  ...resonatorShape(r),
  fsrShiftMHzPerK: optionalV2(resonatorV2.fsrShiftMHzPerK, VERSION_2_FIELDS.resonators.fsrShiftMHzPerK),
});

const detector = detectorShape(r);
const detectorSchema = z.strictObject({
  id: id(),
  ...detector,
  sampleRateGHz: detector.sampleRateGHz.default(FIELD_DEFAULTS.detector.sampleRateGHz),
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
  ),
});

const channel = channelShape(r);
const channelSchema = z.strictObject({
  id: id(),
  name: z.string(),
  chain: id(),
  ...channel,
  dsbOffsetGHz: channel.dsbOffsetGHz.default(FIELD_DEFAULTS.channel.dsbOffsetGHz),
  requiredNedtK: channel.requiredNedtK.default(FIELD_DEFAULTS.channel.requiredNedtK),
  ifFilter: optionalV2(channelV2Shape(r).ifFilter, VERSION_2_FIELDS.channels.ifFilter),
  centreToleranceMHz: optionalV2(channelV2Shape(r).centreToleranceMHz, VERSION_2_FIELDS.channels.centreToleranceMHz),
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
    for (const issue of [...crossFieldIssues(plan), ...versionIssues(plan)]) {
      ctx.addIssue({ code: "custom", path: issue.path, message: issue.message });
    }
  })
  .transform((plan) => ({
    ...plan,
    format: PLAN_FORMAT,
    resonators: plan.resonators.map((e) => withVersion2Fields(e, VERSION_2_FIELDS.resonators)),
    chains: plan.chains.map((e) => withVersion2Fields(e, VERSION_2_FIELDS.chains)),
    channels: plan.channels.map((e) => withVersion2Fields(e, VERSION_2_FIELDS.channels)),
  }));

/**
 * The schema of the document as written (no defaults filled in, no version
 * upgrade), for the JSON Schema of the format (`docs/schema/plan.schema.json`).
 */
export const planDocumentSchema = planFieldsSchema;

/** The parsed plan: defaults applied, omitted nullable fields set to null, version 2 fields filled in. */
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
