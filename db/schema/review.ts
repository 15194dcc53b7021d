import { boolean, index, integer, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { findings, missions, planRevisions } from "./workspace";

/**
 * The review workflow: one row per submission of a revision (its decision,
 * when made), waivers of open error findings, comments and per-person
 * notification preferences. The review state itself lives on
 * `plan_revisions.status`; these tables record who did what and why.
 */

/** A submission of a revision for review and its outcome. */
export const reviews = pgTable(
  "reviews",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: uuid("mission_id")
      .notNull()
      .references(() => missions.id, { onDelete: "cascade" }),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => planRevisions.id, { onDelete: "cascade" }),
    revisionNumber: integer("revision_number").notNull(),
    submittedBy: text("submitted_by").notNull(),
    submittedByName: text("submitted_by_name").notNull(),
    submittedAt: timestamp("submitted_at", { withTimezone: true }).notNull().defaultNow(),
    note: text("note").notNull().default(""),
    /** open | baselined | changes-requested | withdrawn (an edit during review) */
    outcome: text("outcome", { enum: ["open", "baselined", "changes-requested", "withdrawn"] })
      .notNull()
      .default("open"),
    decidedBy: text("decided_by"),
    decidedByName: text("decided_by_name"),
    decidedAt: timestamp("decided_at", { withTimezone: true }),
    decisionNote: text("decision_note"),
    /** The waivers in force when the revision was baselined (kept even if a waiver is later withdrawn). */
    waiversAtDecision: jsonb("waivers_at_decision").$type<WaiverSnapshot[]>(),
  },
  (t) => [index("reviews_mission_idx").on(t.missionId, t.submittedAt), index("reviews_revision_idx").on(t.revisionId)],
);

export interface WaiverSnapshot {
  findingKey: string;
  reason: string;
  waivedByName: string;
  waivedAt: string;
}

/**
 * A recorded acceptance of an error finding: who, why, when. It covers the
 * finding's rule on its chain and channel (`finding_key` = code|chain|channel)
 * in this and later revisions until withdrawn.
 */
export const waivers = pgTable(
  "waivers",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: uuid("mission_id")
      .notNull()
      .references(() => missions.id, { onDelete: "cascade" }),
    findingKey: text("finding_key").notNull(),
    code: text("code").notNull(),
    chainKey: text("chain_key").notNull(),
    channelKey: text("channel_key"),
    /** The revision the waiver was recorded against and the finding's message then. */
    revisionNumber: integer("revision_number").notNull(),
    findingMessage: text("finding_message").notNull(),
    reason: text("reason").notNull(),
    waivedBy: text("waived_by").notNull(),
    waivedByName: text("waived_by_name").notNull(),
    waivedAt: timestamp("waived_at", { withTimezone: true }).notNull().defaultNow(),
    withdrawnBy: text("withdrawn_by"),
    withdrawnByName: text("withdrawn_by_name"),
    withdrawnAt: timestamp("withdrawn_at", { withTimezone: true }),
    version: integer("version").notNull().default(1),
  },
  (t) => [index("waivers_mission_key_idx").on(t.missionId, t.findingKey)],
);

/** A comment on a revision, optionally on one of its channels or findings. */
export const reviewComments = pgTable(
  "review_comments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    missionId: uuid("mission_id")
      .notNull()
      .references(() => missions.id, { onDelete: "cascade" }),
    revisionNumber: integer("revision_number").notNull(),
    channelKey: text("channel_key"),
    findingId: uuid("finding_id").references(() => findings.id, { onDelete: "set null" }),
    authorId: text("author_id").notNull(),
    authorName: text("author_name").notNull(),
    body: text("body").notNull(),
    /** User ids of the team members mentioned with @. */
    mentions: text("mentions").array().notNull().default([]),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("review_comments_mission_idx").on(t.missionId, t.createdAt)],
);

/** Per person: which review e-mails they want (every kind on by default, when no row exists). */
export const notificationPreferences = pgTable("notification_preferences", {
  userId: text("user_id").primaryKey(),
  reviewRequested: boolean("review_requested").notNull().default(true),
  reviewDecided: boolean("review_decided").notNull().default(true),
  mentioned: boolean("mentioned").notNull().default(true),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export type Review = typeof reviews.$inferSelect;
export type Waiver = typeof waivers.$inferSelect;
export type ReviewComment = typeof reviewComments.$inferSelect;
export type NotificationPreferences = typeof notificationPreferences.$inferSelect;
