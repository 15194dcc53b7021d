/**
 * Input schemas of the mission workspace: one schema per entity form, shared
 * by the conform forms (`parseWithZod` from `@conform-to/zod/v4`), the route
 * handlers under `app/api/v1/missions/**` and the server services.
 *
 * Field names and units are exactly those of the plan document
 * (docs/plan-format.md §2 "The plan document" and §12.1 "The new fields" of
 * version 2); `key` is the plan-document id
 * ("LP1", "R1", "A", "wv1"). Chains reference hardware by row uuid
 * (`laserId`, `resonatorId`, `detectorId`), channels their chain by `chainId`.
 *
 * Create schemas describe a whole entity. Updates (PATCH) send any subset of
 * the fields plus the `version` the client last read; the server merges the
 * subset into the current row and validates the merged entity with the create
 * schema, so cross-field rules (min below max) hold after every update.
 */
import { z } from "zod";
import {
  chainShape,
  chainV2Shape,
  channelShape,
  channelV2Shape,
  detectorShape,
  dsbOffsetClears,
  entityKeySchema,
  FIELD_DEFAULTS,
  formRules as r,
  isOrdered,
  laserShape,
  lockShape,
  MAX_REACH_INTERVALS,
  optionalMultiLineTextSchema,
  paramTextSchema,
  requiredTextSchema,
  resonatorShape,
  resonatorV2Shape,
  rowIdSchema,
  settingsShape,
} from "./fields";
import { intrinsicQClears, noiseFormCreate, noiseFormFields } from "./workspace-noise";

export { entityKeySchema };

export const versionSchema = r.count(1);

/** A closed interval [minGHz, maxGHz] with min below max. */
export const intervalGHzSchema = z
  .object({ minGHz: r.number(), maxGHz: r.number() }, { error: "is required" })
  .strict()
  .refine((v) => isOrdered(v.minGHz, v.maxGHz), { error: "must be above minGHz", path: ["maxGHz"] });

// ---------------------------------------------------------------- missions

export const missionCreateSchema = z
  .object({
    name: requiredTextSchema(200),
    description: optionalMultiLineTextSchema(4000).optional(),
  })
  .strict();
export type MissionCreateInput = z.infer<typeof missionCreateSchema>;

export const missionUpdateSchema = missionCreateSchema.partial().extend({ version: versionSchema }).strict();
export type MissionUpdateInput = z.infer<typeof missionUpdateSchema>;

// ---------------------------------------------------------------- settings

export const settingsFields = z.object(settingsShape(r)).strict();
export type SettingsFields = z.infer<typeof settingsFields>;

/** PUT …/settings: the whole settings object plus the version last read. */
export const settingsUpdateSchema = settingsFields.extend({ version: versionSchema }).strict();
export type SettingsUpdateInput = z.infer<typeof settingsUpdateSchema>;

export const DEFAULT_SETTINGS: SettingsFields = {
  guardMHz: 50,
  imageRejectionDB: 25,
  spurMaxOrder: 5,
  replicaLimitDB: -20,
};

// ---------------------------------------------------------------- hardware

export const lockSchema = z.object(lockShape(r), { error: "is required" }).strict();

const laserFields = z
  .object({
    key: entityKeySchema,
    ...laserShape(r, {
      reach: z
        .array(intervalGHzSchema)
        .max(MAX_REACH_INTERVALS, { error: `may hold at most ${MAX_REACH_INTERVALS} intervals` }),
      lock: lockSchema,
    }),
    ...noiseFormFields.laser,
  })
  .strict();
export const laserSchema = laserFields.extend(noiseFormCreate.laser);
export type LaserInput = z.infer<typeof laserSchema>;

const resonatorFields = z
  .object({
    key: entityKeySchema,
    ...resonatorShape(r),
    ...resonatorV2Shape(r),
    ...noiseFormFields.resonator,
  })
  .strict();
export const resonatorSchema = resonatorFields
  .extend({
    fsrShiftMHzPerK: resonatorFields.shape.fsrShiftMHzPerK.default(FIELD_DEFAULTS.resonator.fsrShiftMHzPerK),
    ...noiseFormCreate.resonator,
  })
  .refine(intrinsicQClears, { error: "must exceed loadedQ", path: ["intrinsicQ"] });
export type ResonatorInput = z.infer<typeof resonatorSchema>;

const detectorFields = z
  .object({
    key: entityKeySchema,
    ...detectorShape(r),
    ...noiseFormFields.detector,
  })
  .strict();

export const detectorSchema = detectorFields
  .extend({
    sampleRateGHz: detectorFields.shape.sampleRateGHz.default(FIELD_DEFAULTS.detector.sampleRateGHz),
    ...noiseFormCreate.detector,
  })
  .refine((v) => isOrdered(v.minGHz, v.maxGHz), { error: "must be above minGHz", path: ["maxGHz"] });
export type DetectorInput = z.infer<typeof detectorSchema>;

// ---------------------------------------------------------------- chains and channels

export const sidebandSchema = r.sideband();

const chainFields = z
  .object({
    key: entityKeySchema,
    laserId: rowIdSchema,
    resonatorId: rowIdSchema,
    detectorId: rowIdSchema,
    ...chainShape(r, { rfInput: intervalGHzSchema }),
    ...chainV2Shape(r),
    ...noiseFormFields.chain,
  })
  .strict();

export const chainSchema = chainFields.extend({
  carrierRejectionDB: chainFields.shape.carrierRejectionDB.default(FIELD_DEFAULTS.chain.carrierRejectionDB),
  sharedIf: chainFields.shape.sharedIf.default(FIELD_DEFAULTS.chain.sharedIf),
  temperatureExcursionK: chainFields.shape.temperatureExcursionK.default(FIELD_DEFAULTS.chain.temperatureExcursionK),
  ...noiseFormCreate.chain,
});
export type ChainInput = z.infer<typeof chainSchema>;

const channelFields = z
  .object({
    key: entityKeySchema,
    name: requiredTextSchema(200),
    chainId: rowIdSchema,
    ...channelShape(r),
    ...channelV2Shape(r),
    ...noiseFormFields.channel,
  })
  .strict();

export const channelSchema = channelFields
  .extend({
    dsbOffsetGHz: channelFields.shape.dsbOffsetGHz.default(FIELD_DEFAULTS.channel.dsbOffsetGHz),
    // The forms (unlike the plan document) let gain stability be left out: an ideal receiver.
    gainStability: channelFields.shape.gainStability.default(0),
    requiredNedtK: channelFields.shape.requiredNedtK.default(FIELD_DEFAULTS.channel.requiredNedtK),
    ifFilter: channelFields.shape.ifFilter.default(FIELD_DEFAULTS.channel.ifFilter),
    centreToleranceMHz: channelFields.shape.centreToleranceMHz.default(FIELD_DEFAULTS.channel.centreToleranceMHz),
    ...noiseFormCreate.channel,
  })
  .refine((v) => v.dsbOffsetGHz === null || dsbOffsetClears(v.dsbOffsetGHz, v.bandwidthMHz), {
    error: "must be more than half the bandwidth (bandwidthMHz/2000 GHz)",
    path: ["dsbOffsetGHz"],
  });
export type ChannelInput = z.infer<typeof channelSchema>;

// Updates: any subset of the fields (no defaults, so an omitted field keeps
// its stored value) plus the version last read.
export const laserUpdateSchema = laserFields.partial().extend({ version: versionSchema }).strict();
export const resonatorUpdateSchema = resonatorFields.partial().extend({ version: versionSchema }).strict();
export const detectorUpdateSchema = detectorFields.partial().extend({ version: versionSchema }).strict();
export const chainUpdateSchema = chainFields.partial().extend({ version: versionSchema }).strict();
export const channelUpdateSchema = channelFields.partial().extend({ version: versionSchema }).strict();
export type LaserUpdateInput = z.infer<typeof laserUpdateSchema>;
export type ResonatorUpdateInput = z.infer<typeof resonatorUpdateSchema>;
export type DetectorUpdateInput = z.infer<typeof detectorUpdateSchema>;
export type ChainUpdateInput = z.infer<typeof chainUpdateSchema>;
export type ChannelUpdateInput = z.infer<typeof channelUpdateSchema>;

/** The entity kinds of the workspace collections, in plan-document order. */
export const ENTITY_KINDS = ["lasers", "resonators", "detectors", "chains", "channels"] as const;
export type EntityKind = (typeof ENTITY_KINDS)[number];

export const entityCreateSchemas = {
  lasers: laserSchema,
  resonators: resonatorSchema,
  detectors: detectorSchema,
  chains: chainSchema,
  channels: channelSchema,
} as const;

export const entityUpdateSchemas = {
  lasers: laserUpdateSchema,
  resonators: resonatorUpdateSchema,
  detectors: detectorUpdateSchema,
  chains: chainUpdateSchema,
  channels: channelUpdateSchema,
} as const;

// ---------------------------------------------------------------- queries of list and upload routes

const flag = z
  .enum(["0", "1"], { error: "must be 0 or 1" })
  .default("0")
  .transform((v) => v === "1");
const numberParam = (what: z.ZodNumber) =>
  z
    .string({ error: "is required" })
    .trim()
    .min(1, { error: "is required" })
    .transform((s) => Number(s))
    .pipe(what);

export const findingsQuerySchema = z.object({
  severity: z.enum(["error", "warning", "info"], { error: "must be error, warning or info" }).optional(),
  chain: paramTextSchema(200).optional(),
  channel: paramTextSchema(200).optional(),
  code: paramTextSchema(200).optional(),
});
export type FindingsQuery = z.infer<typeof findingsQuerySchema>;

export const deleteQuerySchema = z.object({ version: numberParam(versionSchema) });

export const tuningMapQuerySchema = z.object({
  laserId: rowIdSchema,
  gapMHz: numberParam(r.positive()),
  apply: flag,
});
export type TuningMapQuery = z.infer<typeof tuningMapQuerySchema>;

export const detectorResponseQuerySchema = z.object({
  detectorId: rowIdSchema,
  dropDB: numberParam(r.positive()).default(3),
  apply: flag,
});
export type DetectorResponseQuery = z.infer<typeof detectorResponseQuerySchema>;

/** The page of a channel-list preview: `?offset=&limit=` (rows of the file, in file order). */
export const PREVIEW_PAGE_MAX = 1000;
export const channelsUploadQuerySchema = z.object({
  apply: flag,
  offset: numberParam(r.countBetween(0, 1_000_000)).default(0),
  limit: numberParam(r.countBetween(1, PREVIEW_PAGE_MAX)).default(200),
});
export type ChannelsUploadQuery = z.infer<typeof channelsUploadQuerySchema>;

/** `POST …/plan?baseRevision=N`: the revision the imported document was read at (409 when the plan has moved on). */
export const planImportQuerySchema = z.object({ baseRevision: numberParam(r.count(1)).optional() });

/** Upload limits (docs/decisions/010-workspace-data.md). */
export const UPLOAD_MAX_BYTES = 5 * 1024 * 1024;
export const UPLOAD_MAX_ROWS = 100_000;
