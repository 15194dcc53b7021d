/**
 * Input schemas of the mission workspace: one schema per entity form, shared
 * by the conform forms (`parseWithZod` from `@conform-to/zod/v4`), the route
 * handlers under `app/api/v1/missions/**` and the server services.
 *
 * Field names and units are exactly those of the plan document
 * (docs: plan-format.md, `heterolane.plan/1`); `key` is the plan-document id
 * ("LP1", "R1", "A", "wv1"). Chains reference hardware by row uuid
 * (`laserId`, `resonatorId`, `detectorId`), channels their chain by `chainId`.
 *
 * Create schemas describe a whole entity. Updates (PATCH) send any subset of
 * the fields plus the `version` the client last read; the server merges the
 * subset into the current row and validates the merged entity with the create
 * schema, so cross-field rules (min below max) hold after every update.
 */
import { z } from "zod";

const finite = (what = "a number") =>
  z.number({ error: (iss) => (iss.input === undefined ? "is required" : `must be ${what}`) });
const positive = () => finite().gt(0, { error: "must be greater than 0" });
const nonNegative = () => finite().gte(0, { error: "must be 0 or more" });
const positiveInt = () =>
  finite("a whole number").int({ error: "must be a whole number" }).gte(1, { error: "must be 1 or more" });

/** A plan-document id: non-empty, without surrounding spaces, unique per mission and entity kind. */
export const entityKeySchema = z
  .string({ error: "is required" })
  .min(1, { error: "is required" })
  .max(64, { error: "must be at most 64 characters" })
  .refine((s) => s.trim() === s, { error: "must not start or end with a space" });

export const versionSchema = finite("a whole number")
  .int({ error: "must be a whole number" })
  .gte(1, { error: "must be 1 or more" });

const uuidSchema = z.uuid({ error: "must be the id of an existing row" });

/** A closed interval [minGHz, maxGHz] with min below max. */
export const intervalGHzSchema = z
  .object({ minGHz: finite(), maxGHz: finite() }, { error: "is required" })
  .strict()
  .refine((v) => v.minGHz < v.maxGHz, { error: "must be above minGHz", path: ["maxGHz"] });

// ---------------------------------------------------------------- missions

export const missionCreateSchema = z
  .object({
    name: z.string({ error: "is required" }).trim().min(1, { error: "is required" }).max(200, {
      error: "must be at most 200 characters",
    }),
    description: z.string().trim().max(4000, { error: "must be at most 4000 characters" }).optional(),
  })
  .strict();
export type MissionCreateInput = z.infer<typeof missionCreateSchema>;

export const missionUpdateSchema = missionCreateSchema.partial().extend({ version: versionSchema }).strict();
export type MissionUpdateInput = z.infer<typeof missionUpdateSchema>;

// ---------------------------------------------------------------- settings

export const settingsFields = z
  .object({
    guardMHz: nonNegative(),
    imageRejectionDB: finite(),
    spurMaxOrder: finite("a whole number")
      .int({ error: "must be a whole number" })
      .gte(2, { error: "must be 2 or more" })
      .lte(9, { error: "must be 9 or less" }),
    replicaLimitDB: finite(),
  })
  .strict();
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

export const lockSchema = z
  .object(
    {
      modulationMHz: positive(),
      modulationIndex: finite()
        .gt(0, { error: "must be greater than 0" })
        .lt(2.4, { error: "must be below 2.4 (the first zero of J0)" }),
      orders: positiveInt(),
    },
    { error: "is required" },
  )
  .strict();

export const laserSchema = z
  .object({
    key: entityKeySchema,
    carrierTHz: positive(),
    carrierPowerMW: positive(),
    loPowerMW: positive(),
    reach: z.array(intervalGHzSchema).max(64, { error: "may hold at most 64 intervals" }),
    stepMHz: nonNegative(),
    driftMHz: nonNegative(),
    lock: lockSchema,
  })
  .strict();
export type LaserInput = z.infer<typeof laserSchema>;

export const resonatorSchema = z
  .object({
    key: entityKeySchema,
    fsrGHz: positive(),
    loadedQ: positive(),
  })
  .strict();
export type ResonatorInput = z.infer<typeof resonatorSchema>;

const detectorFields = z
  .object({
    key: entityKeySchema,
    minGHz: nonNegative(),
    maxGHz: positive(),
    maxInputMW: positive(),
    sampleRateGHz: positive().nullable(),
  })
  .strict();
const minBelowMax = { error: "must be above minGHz", path: ["maxGHz"] };

export const detectorSchema = detectorFields
  .extend({ sampleRateGHz: positive().nullable().default(null) })
  .refine((v) => v.minGHz < v.maxGHz, minBelowMax);
export type DetectorInput = z.infer<typeof detectorSchema>;

// ---------------------------------------------------------------- chains and channels

export const sidebandSchema = z.enum(["upper", "lower"], { error: "must be upper or lower" });

const chainFields = z
  .object({
    key: entityKeySchema,
    laserId: uuidSchema,
    resonatorId: uuidSchema,
    detectorId: uuidSchema,
    mode: positiveInt(),
    sideband: sidebandSchema,
    loOffsetGHz: finite(),
    rfInput: intervalGHzSchema,
    tapFraction: finite().gte(0, { error: "must be 0 or more" }).lt(1, { error: "must be below 1" }),
    pathLossDB: nonNegative(),
    carrierRejectionDB: nonNegative(),
    sharedIf: z.boolean({ error: "must be true or false" }),
  })
  .strict();

export const chainSchema = chainFields.extend({
  carrierRejectionDB: nonNegative().default(0),
  sharedIf: z.boolean({ error: "must be true or false" }).default(false),
});
export type ChainInput = z.infer<typeof chainSchema>;

const channelFields = z
  .object({
    key: entityKeySchema,
    name: z.string({ error: "is required" }).trim().min(1, { error: "is required" }).max(200, {
      error: "must be at most 200 characters",
    }),
    chainId: uuidSchema,
    centerGHz: positive(),
    bandwidthMHz: positive(),
    dsbOffsetGHz: positive().nullable(),
    integrationMs: positive(),
    antennaK: nonNegative(),
    receiverK: nonNegative(),
    gainStability: nonNegative(),
    requiredNedtK: nonNegative().nullable(),
  })
  .strict();

export const channelSchema = channelFields
  .extend({
    dsbOffsetGHz: positive().nullable().default(null),
    gainStability: nonNegative().default(0),
    requiredNedtK: nonNegative().nullable().default(null),
  })
  .refine((v) => v.dsbOffsetGHz === null || v.dsbOffsetGHz > v.bandwidthMHz / 2000, {
    error: "must be more than half the bandwidth (bandwidthMHz/2000 GHz)",
    path: ["dsbOffsetGHz"],
  });
export type ChannelInput = z.infer<typeof channelSchema>;

// Updates: any subset of the fields (no defaults, so an omitted field keeps
// its stored value) plus the version last read.
export const laserUpdateSchema = laserSchema.partial().extend({ version: versionSchema }).strict();
export const resonatorUpdateSchema = resonatorSchema.partial().extend({ version: versionSchema }).strict();
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
  chain: z.string().min(1).optional(),
  channel: z.string().min(1).optional(),
  code: z.string().min(1).optional(),
});
export type FindingsQuery = z.infer<typeof findingsQuerySchema>;

export const deleteQuerySchema = z.object({ version: numberParam(versionSchema) });

export const tuningMapQuerySchema = z.object({
  laserId: uuidSchema,
  gapMHz: numberParam(finite().gt(0, { error: "must be greater than 0" })),
  apply: flag,
});
export type TuningMapQuery = z.infer<typeof tuningMapQuerySchema>;

export const channelsUploadQuerySchema = z.object({ apply: flag });

export const detectorResponseQuerySchema = z.object({
  detectorId: uuidSchema,
  dropDB: numberParam(finite().gt(0, { error: "must be greater than 0" })).default(3),
  apply: flag,
});
export type DetectorResponseQuery = z.infer<typeof detectorResponseQuerySchema>;

/** Upload limits (docs/decisions/010-workspace-data.md). */
export const UPLOAD_MAX_BYTES = 5 * 1024 * 1024;
export const UPLOAD_MAX_ROWS = 100_000;
