import { z } from "zod";
import {
  channelShape,
  chainShape,
  detectorShape,
  documentRules as r,
  FIELD_DEFAULTS,
  laserShape,
  lockShape,
  MAX_REACH_INTERVALS,
  planIdSchema as id,
  resonatorShape,
  settingsShape,
} from "../fields";
import { crossFieldIssues } from "./cross-field";

/**
 * The zod schema of the plan document `heterolane.plan/1`
 * (docs/plan-format.md §2 "The plan document"): types, signs, ranges,
 * strict objects and list limits. The numeric rules come from the shared field rules
 * (`../fields.ts`) in their document dialect; the rules that relate several
 * fields are `crossFieldIssues` (`cross-field.ts`).
 */

export const PLAN_FORMAT = "heterolane.plan/1" as const;

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

const resonatorSchema = z.strictObject({
  id: id(),
  ...resonatorShape(r),
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
});

const channel = channelShape(r);
const channelSchema = z.strictObject({
  id: id(),
  name: z.string(),
  chain: id(),
  ...channel,
  dsbOffsetGHz: channel.dsbOffsetGHz.default(FIELD_DEFAULTS.channel.dsbOffsetGHz),
  requiredNedtK: channel.requiredNedtK.default(FIELD_DEFAULTS.channel.requiredNedtK),
});

/** The field rules of the whole document, without the cross-field rules. */
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
