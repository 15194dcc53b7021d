import { sql } from "drizzle-orm";
import {
  boolean,
  customType,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import { organization } from "./auth";
import {
  chainNoiseColumns,
  channelNoiseColumns,
  detectorNoiseColumns,
  laserNoiseColumns,
  resonatorNoiseColumns,
} from "./noise-columns";

/**
 * The mission workspace: a mission's hardware, receiver chains, channels and
 * plan settings (the editable draft), its immutable plan revisions with their
 * stored results and findings, uploaded files and the activity log.
 *
 * Numbers are `double precision` so a JS number survives the round trip
 * unchanged (PostgreSQL 12+ prints the shortest exact form), which keeps the
 * plan export/import round trip exact. Every editable row carries an integer
 * `version` for optimistic concurrency; `position` keeps the plan-document
 * order of each list.
 */

const bytea = customType<{ data: Buffer; driverData: Buffer }>({
  dataType() {
    return "bytea";
  },
});

const created = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
const updated = () => timestamp("updated_at", { withTimezone: true }).notNull().defaultNow();
const version = () => integer("version").notNull().default(1);
const missionRef = () =>
  uuid("mission_id")
    .notNull()
    .references(() => missions.id, { onDelete: "cascade" });

/** A mission, scoped to one team (the better-auth organization; deleting the team deletes its missions). */
export const missions = pgTable(
  "missions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    teamId: text("team_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    description: text("description").notNull().default(""),
    createdBy: text("created_by").notNull(),
    version: version(),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [index("missions_team_idx").on(t.teamId)],
);

/** The plan settings of a mission (one row per mission). */
export const planSettings = pgTable("plan_settings", {
  missionId: uuid("mission_id")
    .primaryKey()
    .references(() => missions.id, { onDelete: "cascade" }),
  guardMHz: doublePrecision("guard_mhz").notNull(),
  imageRejectionDB: doublePrecision("image_rejection_db").notNull(),
  spurMaxOrder: integer("spur_max_order").notNull(),
  replicaLimitDB: doublePrecision("replica_limit_db").notNull(),
  version: version(),
  createdAt: created(),
  updatedAt: updated(),
});

export type ReachInterval = { minGHz: number; maxGHz: number };

/**
 * A laser pair's observation schedule as stored (docs/plan-format.md §13):
 * its dwells name their chains by row id, so renaming a chain keeps it;
 * a dwell whose chain row is gone is left out when the plan is assembled.
 */
export type StoredSchedule = {
  cycleMs: number;
  retuneMs: number;
  retuneMsPerGHz: number;
  relockMs: number;
  dwells: { chainId: string; dwellMs: number }[];
};

export const lasers = pgTable(
  "lasers",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: missionRef(),
    key: text("key").notNull(),
    position: integer("position").notNull(),
    carrierTHz: doublePrecision("carrier_thz").notNull(),
    carrierPowerMW: doublePrecision("carrier_power_mw").notNull(),
    loPowerMW: doublePrecision("lo_power_mw").notNull(),
    reach: jsonb("reach").$type<ReachInterval[]>().notNull(),
    stepMHz: doublePrecision("step_mhz").notNull(),
    driftMHz: doublePrecision("drift_mhz").notNull(),
    lockModulationMHz: doublePrecision("lock_modulation_mhz").notNull(),
    lockModulationIndex: doublePrecision("lock_modulation_index").notNull(),
    lockOrders: integer("lock_orders").notNull(),
    /** The observation schedule (plan format version 2), or null. */
    schedule: jsonb("schedule").$type<StoredSchedule | null>(),
    ...laserNoiseColumns(),
    version: version(),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [uniqueIndex("lasers_mission_key_uq").on(t.missionId, t.key)],
);

export const resonators = pgTable(
  "resonators",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: missionRef(),
    key: text("key").notNull(),
    position: integer("position").notNull(),
    fsrGHz: doublePrecision("fsr_ghz").notNull(),
    loadedQ: doublePrecision("loaded_q").notNull(),
    /** Plan format 2: change of the FSR per kelvin of resonator temperature (MHz/K, signed). */
    fsrShiftMHzPerK: doublePrecision("fsr_shift_mhz_per_k").notNull().default(0),
    ...resonatorNoiseColumns(),
    version: version(),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [uniqueIndex("resonators_mission_key_uq").on(t.missionId, t.key)],
);

export const detectors = pgTable(
  "detectors",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: missionRef(),
    key: text("key").notNull(),
    position: integer("position").notNull(),
    minGHz: doublePrecision("min_ghz").notNull(),
    maxGHz: doublePrecision("max_ghz").notNull(),
    maxInputMW: doublePrecision("max_input_mw").notNull(),
    sampleRateGHz: doublePrecision("sample_rate_ghz"),
    ...detectorNoiseColumns(),
    version: version(),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [uniqueIndex("detectors_mission_key_uq").on(t.missionId, t.key)],
);

export const chains = pgTable(
  "chains",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: missionRef(),
    key: text("key").notNull(),
    position: integer("position").notNull(),
    laserId: uuid("laser_id")
      .notNull()
      .references(() => lasers.id, { onDelete: "restrict" }),
    resonatorId: uuid("resonator_id")
      .notNull()
      .references(() => resonators.id, { onDelete: "restrict" }),
    detectorId: uuid("detector_id")
      .notNull()
      .references(() => detectors.id, { onDelete: "restrict" }),
    mode: integer("mode").notNull(),
    sideband: text("sideband", { enum: ["upper", "lower"] }).notNull(),
    loOffsetGHz: doublePrecision("lo_offset_ghz").notNull(),
    rfInputMinGHz: doublePrecision("rf_input_min_ghz").notNull(),
    rfInputMaxGHz: doublePrecision("rf_input_max_ghz").notNull(),
    tapFraction: doublePrecision("tap_fraction").notNull(),
    pathLossDB: doublePrecision("path_loss_db").notNull(),
    carrierRejectionDB: doublePrecision("carrier_rejection_db").notNull().default(0),
    sharedIf: boolean("shared_if").notNull().default(false),
    /** Plan format 2: ± excursion of the resonator temperature while observing (K, 0..50). */
    temperatureExcursionK: doublePrecision("temperature_excursion_k").notNull().default(0),
    ...chainNoiseColumns(),
    version: version(),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [uniqueIndex("chains_mission_key_uq").on(t.missionId, t.key)],
);

export const channels = pgTable(
  "channels",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: missionRef(),
    key: text("key").notNull(),
    position: integer("position").notNull(),
    chainId: uuid("chain_id")
      .notNull()
      .references(() => chains.id, { onDelete: "restrict" }),
    name: text("name").notNull(),
    centerGHz: doublePrecision("center_ghz").notNull(),
    bandwidthMHz: doublePrecision("bandwidth_mhz").notNull(),
    dsbOffsetGHz: doublePrecision("dsb_offset_ghz"),
    integrationMs: doublePrecision("integration_ms").notNull(),
    antennaK: doublePrecision("antenna_k").notNull(),
    receiverK: doublePrecision("receiver_k").notNull(),
    gainStability: doublePrecision("gain_stability").notNull().default(0),
    requiredNedtK: doublePrecision("required_nedt_k"),
    /** Plan format 2: which IF band the channel's filter passes (the nominal slot, or the occupied band slot ± D). */
    ifFilter: text("if_filter", { enum: ["slot", "occupied"] })
      .notNull()
      .default("slot"),
    /** Plan format 2: allowed error of the effective centre frequency (MHz), or null for none. */
    centreToleranceMHz: doublePrecision("centre_tolerance_mhz"),
    ...channelNoiseColumns(),
    version: version(),
    createdAt: created(),
    updatedAt: updated(),
  },
  (t) => [uniqueIndex("channels_mission_key_uq").on(t.missionId, t.key), index("channels_chain_idx").on(t.chainId)],
);

/**
 * An immutable plan revision: the plan document as checked and the engine's
 * result document. `status` is driven by the review workflow
 * (draft / in-review / baselined / changes-requested).
 */
export const planRevisions = pgTable(
  "plan_revisions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: missionRef(),
    number: integer("number").notNull(),
    plan: jsonb("plan").notNull(),
    result: jsonb("result").notNull(),
    authorId: text("author_id").notNull(),
    authorName: text("author_name").notNull(),
    summary: text("summary").notNull(),
    status: text("status").notNull().default("draft"),
    errorCount: integer("error_count").notNull(),
    warningCount: integer("warning_count").notNull(),
    infoCount: integer("info_count").notNull(),
    createdAt: created(),
  },
  (t) => [uniqueIndex("plan_revisions_mission_number_uq").on(t.missionId, t.number)],
);

/** The findings of one revision, one row each, indexed for the findings filters. */
export const findings = pgTable(
  "findings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => planRevisions.id, { onDelete: "cascade" }),
    missionId: missionRef(),
    position: integer("position").notNull(),
    code: text("code").notNull(),
    severity: text("severity", { enum: ["error", "warning", "info"] }).notNull(),
    chainKey: text("chain_key").notNull(),
    channelKey: text("channel_key"),
    message: text("message").notNull(),
    data: jsonb("data")
      .notNull()
      .default(sql`'{}'::jsonb`),
  },
  (t) => [
    index("findings_revision_idx").on(t.revisionId, t.position),
    index("findings_revision_severity_idx").on(t.revisionId, t.severity),
    index("findings_revision_code_idx").on(t.revisionId, t.code),
    index("findings_revision_chain_idx").on(t.revisionId, t.chainKey),
    index("findings_revision_channel_idx").on(t.revisionId, t.channelKey),
  ],
);

/** An uploaded file, kept as sent (applied uploads). */
export const uploads = pgTable(
  "uploads",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: missionRef(),
    kind: text("kind", { enum: ["tuning-map", "channels", "detector-response"] }).notNull(),
    filename: text("filename").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    sha256: text("sha256").notNull(),
    content: bytea("content").notNull(),
    uploadedBy: text("uploaded_by").notNull(),
    uploadedAt: timestamp("uploaded_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("uploads_mission_idx").on(t.missionId)],
);

/** The audit trail: one row per mutation (who, what, which entity, revisions before/after). */
export const activity = pgTable(
  "activity",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    teamId: text("team_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    missionId: uuid("mission_id").references(() => missions.id, { onDelete: "set null" }),
    actorId: text("actor_id").notNull(),
    actorName: text("actor_name").notNull(),
    action: text("action").notNull(),
    entity: text("entity").notNull(),
    summary: text("summary").notNull(),
    revisionBefore: integer("revision_before"),
    revisionAfter: integer("revision_after"),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("activity_mission_at_idx").on(t.missionId, t.at), index("activity_team_at_idx").on(t.teamId, t.at)],
);

export type Mission = typeof missions.$inferSelect;
export type PlanSettingsRow = typeof planSettings.$inferSelect;
export type Laser = typeof lasers.$inferSelect;
export type Resonator = typeof resonators.$inferSelect;
export type Detector = typeof detectors.$inferSelect;
export type Chain = typeof chains.$inferSelect;
export type Channel = typeof channels.$inferSelect;
export type PlanRevision = typeof planRevisions.$inferSelect;
export type FindingRow = typeof findings.$inferSelect;
export type Upload = typeof uploads.$inferSelect;
export type ActivityRow = typeof activity.$inferSelect;
