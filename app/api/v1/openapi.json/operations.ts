// Longer than 300 lines on purpose: one row per operation of /api/v1, all in one table.
import {
  activityListSchema,
  commentListSchema,
  commentSchema,
  compareSchema,
  deletedSchema,
  entitySavedSchema,
  entitySchemas,
  findingListSchema,
  missionListSchema,
  missionSavedSchema,
  missionSchema,
  planDocumentSchema,
  planImportedSchema,
  resultDocumentSchema,
  reviewOverviewSchema,
  reviewTransitionSchema,
  revisionListSchema,
  revisionSchema,
  scheduleAnswerSchema,
  scheduleSavedSchema,
  settingsSavedSchema,
  settingsSchema,
  uploadAnswerSchema,
  waiverListSchema,
  waiverSchema,
} from "@/schemas/api-responses";
import { planSchema } from "@/schemas/plan";
import { ENTITY_KINDS, type EntityKind } from "@/schemas/workspace";
import { z } from "zod";
import type { Operation } from "@/server/api-docs/openapi";
import * as audit from "../audit.csv/route";
import * as check from "../check/route";
import * as missions from "../missions/route";
import * as mission from "../missions/[missionId]/route";
import * as activity from "../missions/[missionId]/activity/route";
import * as chains from "../missions/[missionId]/chains/route";
import * as chain from "../missions/[missionId]/chains/[id]/route";
import * as channelsCsv from "../missions/[missionId]/channels.csv/route";
import * as channels from "../missions/[missionId]/channels/route";
import * as channel from "../missions/[missionId]/channels/[id]/route";
import * as compare from "../missions/[missionId]/compare/route";
import * as detectors from "../missions/[missionId]/detectors/route";
import * as detector from "../missions/[missionId]/detectors/[id]/route";
import * as findings from "../missions/[missionId]/findings/route";
import * as lasers from "../missions/[missionId]/lasers/route";
import * as laser from "../missions/[missionId]/lasers/[id]/route";
import * as laserSchedule from "../missions/[missionId]/lasers/[id]/schedule/route";
import * as plan from "../missions/[missionId]/plan/route";
import * as settings from "../missions/[missionId]/settings/route";
import * as resonators from "../missions/[missionId]/resonators/route";
import * as resonator from "../missions/[missionId]/resonators/[id]/route";
import * as result from "../missions/[missionId]/result/route";
import * as review from "../missions/[missionId]/review/route";
import * as comments from "../missions/[missionId]/review/comments/route";
import * as decide from "../missions/[missionId]/review/decide/route";
import * as submit from "../missions/[missionId]/review/submit/route";
import * as waivers from "../missions/[missionId]/review/waivers/route";
import * as waiver from "../missions/[missionId]/review/waivers/[waiverId]/route";
import * as revisions from "../missions/[missionId]/revisions/route";
import * as revisionByNumber from "../missions/[missionId]/revisions/[number]/route";
import * as channelsUpload from "../missions/[missionId]/uploads/channels/route";
import * as detectorUpload from "../missions/[missionId]/uploads/detector-response/route";
import * as tuningUpload from "../missions/[missionId]/uploads/tuning-map/route";

/**
 * Every operation of /api/v1 with the handler that serves it (whose guard
 * carries its access and input schemas) and the schema of its answer. A test
 * (src/server/api-docs/openapi.test.ts) checks that this table names every
 * route file and exported method under app/api/v1; tests/integration/openapi.test.ts
 * checks real answers against it.
 */

const M = "/missions/{missionId}";
const collections = { lasers, resonators, detectors, chains, channels } as const;
const items = { lasers: laser, resonators: resonator, detectors: detector, chains: chain, channels: channel } as const;
const singular: Record<EntityKind, string> = {
  lasers: "laser",
  resonators: "resonator",
  detectors: "detector",
  chains: "receiver chain",
  channels: "channel",
};

const entityOperations = ENTITY_KINDS.flatMap((k): Operation[] => [
  {
    path: `${M}/${k}`,
    method: "get",
    handler: collections[k].GET,
    tag: "Workspace",
    summary: `List the ${k}`,
    ok: { status: 200, schema: z.object({ [k]: z.array(entitySchemas[k]) }) },
  },
  {
    path: `${M}/${k}`,
    method: "post",
    handler: collections[k].POST,
    tag: "Workspace",
    summary: `Add a ${singular[k]} (stores a new revision)`,
    ok: { status: 201, schema: entitySavedSchema(k) },
  },
  {
    path: `${M}/${k}/{id}`,
    method: "get",
    handler: items[k].GET,
    tag: "Workspace",
    summary: `Read a ${singular[k]}`,
    ok: { status: 200, schema: entitySchemas[k] },
  },
  {
    path: `${M}/${k}/{id}`,
    method: "patch",
    handler: items[k].PATCH,
    tag: "Workspace",
    summary: `Change a ${singular[k]} (any subset of fields plus the version last read)`,
    ok: { status: 200, schema: entitySavedSchema(k) },
  },
  {
    path: `${M}/${k}/{id}`,
    method: "delete",
    handler: items[k].DELETE,
    tag: "Workspace",
    summary: `Remove a ${singular[k]} (?version= the version last read)`,
    ok: { status: 200, schema: deletedSchema },
  },
]);

const csv = { status: 200, contentType: "text/csv" };

export const OPERATIONS: Operation[] = [
  {
    path: "/missions",
    method: "get",
    handler: missions.GET,
    tag: "Missions",
    summary: "List the team's missions",
    ok: { status: 200, schema: missionListSchema },
  },
  {
    path: "/missions",
    method: "post",
    handler: missions.POST,
    tag: "Missions",
    summary: "Create a mission",
    ok: { status: 201, schema: missionSavedSchema },
  },
  {
    path: M,
    method: "get",
    handler: mission.GET,
    tag: "Missions",
    summary: "Read a mission",
    ok: { status: 200, schema: missionSchema },
  },
  {
    path: M,
    method: "patch",
    handler: mission.PATCH,
    tag: "Missions",
    summary: "Change a mission's name or description",
    ok: { status: 200, schema: missionSavedSchema },
  },
  {
    path: M,
    method: "delete",
    handler: mission.DELETE,
    tag: "Missions",
    summary: "Delete a mission and all its revisions",
    ok: { status: 200, schema: deletedSchema },
  },
  {
    path: `${M}/settings`,
    method: "get",
    handler: settings.GET,
    tag: "Workspace",
    summary: "Read the check settings",
    ok: { status: 200, schema: settingsSchema },
  },
  {
    path: `${M}/settings`,
    method: "put",
    handler: settings.PUT,
    tag: "Workspace",
    summary: "Replace the check settings",
    ok: { status: 200, schema: settingsSavedSchema },
  },
  ...entityOperations,
  {
    path: `${M}/lasers/{id}/schedule`,
    method: "get",
    handler: laserSchedule.GET,
    tag: "Workspace",
    summary: "Read a laser pair's observation schedule",
    ok: { status: 200, schema: scheduleAnswerSchema },
  },
  {
    path: `${M}/lasers/{id}/schedule`,
    method: "put",
    handler: laserSchedule.PUT,
    tag: "Workspace",
    summary: "Replace (or remove) a laser pair's observation schedule as a new revision",
    ok: { status: 200, schema: scheduleSavedSchema },
  },
  {
    path: `${M}/plan`,
    method: "get",
    handler: plan.GET,
    tag: "Plans",
    summary: "Export the current plan document (heterolane.plan)",
    ok: { status: 200, schema: planDocumentSchema },
  },
  {
    path: `${M}/plan`,
    method: "post",
    handler: plan.POST,
    tag: "Plans",
    summary: "Import a plan document as a new revision (?baseRevision=N refuses a stale base with 409)",
    body: {
      schema: planSchema,
      description: "A plan document; every problem is answered as 400 invalid-plan with its path.",
    },
    ok: { status: 201, schema: planImportedSchema },
  },
  {
    path: `${M}/result`,
    method: "get",
    handler: result.GET,
    tag: "Plans",
    summary: "The result document of the latest revision",
    ok: { status: 200, schema: resultDocumentSchema },
  },
  {
    path: `${M}/revisions`,
    method: "get",
    handler: revisions.GET,
    tag: "Plans",
    summary: "List the revisions, newest first",
    ok: { status: 200, schema: revisionListSchema },
  },
  {
    path: `${M}/revisions/{number}`,
    method: "get",
    handler: revisionByNumber.GET,
    tag: "Plans",
    summary: "One revision with its plan document and result",
    ok: { status: 200, schema: revisionSchema },
  },
  {
    path: `${M}/findings`,
    method: "get",
    handler: findings.GET,
    tag: "Plans",
    summary: "Findings of the latest revision, filtered",
    ok: { status: 200, schema: findingListSchema },
  },
  {
    path: `${M}/activity`,
    method: "get",
    handler: activity.GET,
    tag: "Audit",
    summary: "The mission's activity log",
    ok: { status: 200, schema: activityListSchema },
  },
  {
    path: `${M}/channels.csv`,
    method: "get",
    handler: channelsCsv.GET,
    tag: "Workspace",
    summary: "The channels as CSV",
    ok: csv,
  },
  {
    path: `${M}/compare`,
    method: "get",
    handler: compare.GET,
    tag: "Review",
    summary: "Compare two revisions",
    ok: { status: 200, schema: compareSchema },
  },
  {
    path: `${M}/review`,
    method: "get",
    handler: review.GET,
    tag: "Review",
    summary: "The review state, open errors and history",
    ok: { status: 200, schema: reviewOverviewSchema },
  },
  {
    path: `${M}/review/submit`,
    method: "post",
    handler: submit.POST,
    tag: "Review",
    summary: "Submit the latest revision for review",
    ok: { status: 200, schema: reviewTransitionSchema },
  },
  {
    path: `${M}/review/decide`,
    method: "post",
    handler: decide.POST,
    tag: "Review",
    summary: "Decide a review (baseline it, or return it for rework)",
    ok: { status: 200, schema: reviewTransitionSchema },
  },
  {
    path: `${M}/review/comments`,
    method: "get",
    handler: comments.GET,
    tag: "Review",
    summary: "List comments",
    ok: { status: 200, schema: commentListSchema },
  },
  {
    path: `${M}/review/comments`,
    method: "post",
    handler: comments.POST,
    tag: "Review",
    summary: "Comment",
    ok: { status: 201, schema: commentSchema },
  },
  {
    path: `${M}/review/waivers`,
    method: "get",
    handler: waivers.GET,
    tag: "Review",
    summary: "List waivers",
    ok: { status: 200, schema: waiverListSchema },
  },
  {
    path: `${M}/review/waivers`,
    method: "post",
    handler: waivers.POST,
    tag: "Review",
    summary: "Record a waiver of an open error finding",
    ok: { status: 201, schema: waiverSchema },
  },
  {
    path: `${M}/review/waivers/{waiverId}`,
    method: "patch",
    handler: waiver.PATCH,
    tag: "Review",
    summary: "Change a waiver's reason",
    ok: { status: 200, schema: waiverSchema },
  },
  {
    path: `${M}/review/waivers/{waiverId}`,
    method: "delete",
    handler: waiver.DELETE,
    tag: "Review",
    summary: "Withdraw a waiver",
    ok: { status: 200, schema: waiverSchema },
  },
  {
    path: `${M}/uploads/tuning-map`,
    method: "post",
    handler: tuningUpload.POST,
    tag: "Uploads",
    summary: "Upload a laser tuning map (CSV)",
    body: { multipart: "CSV: setpointMA,offsetGHz" },
    ok: { status: 200, schema: uploadAnswerSchema },
  },
  {
    path: `${M}/uploads/detector-response`,
    method: "post",
    handler: detectorUpload.POST,
    tag: "Uploads",
    summary: "Upload a detector response (CSV)",
    body: { multipart: "CSV: frequencyGHz,responseDB" },
    ok: { status: 200, schema: uploadAnswerSchema },
  },
  {
    path: `${M}/uploads/channels`,
    method: "post",
    handler: channelsUpload.POST,
    tag: "Uploads",
    summary: "Upload channels (CSV)",
    body: { multipart: "CSV with the channel columns" },
    ok: { status: 200, schema: uploadAnswerSchema },
  },
  {
    path: "/check",
    method: "post",
    handler: check.POST,
    tag: "Plans",
    summary: "Check a plan document without storing it",
    body: { schema: planSchema, description: "A plan document." },
    ok: { status: 200, schema: resultDocumentSchema },
  },
  {
    path: "/audit.csv",
    method: "get",
    handler: audit.GET,
    tag: "Audit",
    summary: "The team's audit trail as CSV",
    ok: csv,
  },
];
