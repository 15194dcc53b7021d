import { z } from "zod";
import { planSchema } from "./plan";
import {
  chainSchema,
  channelSchema,
  detectorSchema,
  laserSchema,
  resonatorSchema,
  settingsFields,
  type EntityKind,
} from "./workspace";

/**
 * The answers of the `/api/v1` routes, for the OpenAPI description
 * (`/api/v1/openapi.json`, docs/decisions/024-api-tokens.md). Entities are
 * built from the same schemas the routes parse their input with (an entity is
 * its create schema plus id, version and timestamps); the plan document is
 * `planSchema` itself. Where an answer belongs to another area's evolving
 * format (the result document, review and upload answers) the schema names
 * the fields clients rely on and lets others through (`loose`), so a new field
 * is not a break. The integration test validates the answers of real requests
 * against the document.
 */

const iso = () => z.iso.datetime({ offset: true });
const stamps = { id: z.uuid(), version: z.int().min(1), createdAt: iso(), updatedAt: iso() };

export const revisionInfoSchema = z
  .object({
    number: z.int().min(1),
    errorCount: z.int().min(0),
    warningCount: z.int().min(0),
    infoCount: z.int().min(0),
  })
  .meta({ description: "The revision a save stored, with its finding counts." });

/** An entity as the routes answer it: its create fields (defaults applied) plus id, version and timestamps. */
const entity = <S extends z.ZodObject>(create: S) => create.extend(stamps);

export const entitySchemas = {
  lasers: entity(laserSchema),
  resonators: entity(resonatorSchema),
  // The detector and channel create schemas carry cross-field refinements, which `extend` may not keep: rebuilt from their shapes.
  detectors: z.object({ ...detectorSchema.shape, ...stamps }).strict(),
  chains: entity(chainSchema),
  channels: z.object({ ...channelSchema.shape, ...stamps }).strict(),
} satisfies Record<EntityKind, z.ZodType>;

export const entitySavedSchema = (kind: EntityKind) => entitySchemas[kind].extend({ revision: revisionInfoSchema });

export const missionSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  description: z.string(),
  status: z.string(),
  version: z.int().min(1),
  createdAt: iso(),
  updatedAt: iso(),
});

export const missionListSchema = z.object({
  missions: z.array(
    z.object({
      id: z.uuid(),
      name: z.string(),
      description: z.string(),
      status: z.string(),
      chainCount: z.int(),
      channelCount: z.int(),
      openErrors: z.int(),
      openWarnings: z.int(),
      waivedErrors: z.int().meta({ description: "Errors of the newest revision that carry a recorded waiver." }),
      updatedAt: iso(),
      version: z.int(),
    }),
  ),
});

export const missionSavedSchema = missionSchema.extend({ revision: revisionInfoSchema });
export const deletedSchema = z.object({ deleted: z.string() }).loose();

export const settingsSchema = settingsFields.extend({ version: z.int().min(1), updatedAt: iso() });
export const settingsSavedSchema = settingsSchema.extend({ revision: revisionInfoSchema });

/** The plan document as the server answers it: every default filled in. */
export const planDocumentSchema = planSchema;
export const planImportedSchema = z.object({ revision: revisionInfoSchema });

const findingSchema = z
  .object({
    code: z.string(),
    severity: z.enum(["error", "warning", "info"]),
    chain: z.string().nullable(),
    channel: z.string().nullable(),
    message: z.string(),
  })
  .loose();

export const resultDocumentSchema = z
  .object({
    format: z.string().regex(/^heterolane\.result\/\d+$/),
    chains: z.array(z.object({ id: z.string() }).loose()),
    channels: z.array(z.object({ id: z.string() }).loose()),
    spurs: z.array(z.unknown()),
    findings: z.array(findingSchema),
  })
  .loose()
  .meta({ description: "The result document (docs/plan-format.md)." });

const revisionSummary = {
  number: z.int().min(1),
  status: z.string(),
  authorName: z.string(),
  createdAt: iso(),
  summary: z.string(),
};

export const revisionListSchema = z.object({
  revisions: z.array(
    z.object({
      ...revisionSummary,
      errorCount: z.int(),
      warningCount: z.int(),
      infoCount: z.int(),
    }),
  ),
});

export const revisionSchema = z.object({ ...revisionSummary, plan: planSchema, result: resultDocumentSchema });

export const findingListSchema = z.object({
  revision: z.int().nullable(),
  findings: z.array(findingSchema.extend({ data: z.unknown() })),
});

export const activityListSchema = z.object({
  activity: z.array(
    z.object({
      at: iso(),
      actorName: z.string(),
      action: z.string(),
      entity: z.string(),
      summary: z.string(),
      revision: z.int().nullable(),
      revisionBefore: z.int().nullable(),
    }),
  ),
});

const waiverSchema = z
  .object({
    id: z.uuid(),
    findingKey: z.string(),
    code: z.string(),
    reason: z.string(),
    active: z.boolean(),
    version: z.int(),
  })
  .loose();

export const reviewOverviewSchema = z.object({ state: z.string(), baselineRevision: z.int().nullable() }).loose();
export const reviewTransitionSchema = z.object({}).loose().meta({ description: "The review after the change." });
export const commentSchema = z
  .object({ id: z.uuid(), revision: z.int().nullable(), authorName: z.string(), body: z.string(), createdAt: iso() })
  .loose();
export const commentListSchema = z.object({ comments: z.array(commentSchema) });
export const waiverListSchema = z.object({ waivers: z.array(waiverSchema) });
export { waiverSchema };
export const compareSchema = z.object({ from: z.unknown(), to: z.unknown() }).loose();
export const uploadAnswerSchema = z
  .object({})
  .loose()
  .meta({ description: "A preview of the parsed file, or (with apply=1) the saved rows and their revision." });

/** The error body of every refusal: `{ error: { code, message, issues? } }`, plus fields some codes add. */
export const errorSchema = z.object({
  error: z
    .object({
      code: z.string(),
      message: z.string(),
      issues: z
        .array(z.object({ path: z.string(), message: z.string() }).loose())
        .optional()
        .meta({ description: "Every rejected field, query parameter, file row or plan path." }),
    })
    .loose(),
});

/** A laser pair's observation schedule in the workspace (docs/plan-format.md §13), with the laser's version. */
export const scheduleAnswerSchema = z.object({
  laserId: z.uuid(),
  laserKey: z.string(),
  version: z.int().min(1),
  schedule: z
    .object({
      cycleMs: z.number(),
      retuneMs: z.number(),
      retuneMsPerGHz: z.number(),
      relockMs: z.number(),
      dwells: z.array(z.object({ chainId: z.uuid(), chainKey: z.string(), dwellMs: z.number() })),
    })
    .nullable(),
});
export const scheduleSavedSchema = scheduleAnswerSchema.extend({ revision: revisionInfoSchema });
