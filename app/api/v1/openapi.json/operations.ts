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
import type { Method, Operation } from "@/server/api-docs/openapi";
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

/** The success answer: a status with the JSON schema of its body. */
const ok = (status: number, schema: z.ZodType): Operation["ok"] => ({ status, schema });

/** One row of the table under a tag: method, path, handler, summary, success answer and a body the handler reads itself. */
const tagged =
  (tag: string) =>
  (
    method: Method,
    path: string,
    handler: unknown,
    summary: string,
    success: Operation["ok"],
    body?: Operation["body"],
  ): Operation => ({
    path,
    method,
    handler,
    tag,
    summary,
    ok: success,
    ...(body ? { body } : {}),
  });

const row = {
  Missions: tagged("Missions"),
  Workspace: tagged("Workspace"),
  Plans: tagged("Plans"),
  Review: tagged("Review"),
  Uploads: tagged("Uploads"),
  Audit: tagged("Audit"),
};

const entityOperations = ENTITY_KINDS.flatMap((k): Operation[] => [
  row.Workspace(
    "get",
    `${M}/${k}`,
    collections[k].GET,
    `List the ${k}`,
    ok(200, z.object({ [k]: z.array(entitySchemas[k]) })),
  ),
  row.Workspace(
    "post",
    `${M}/${k}`,
    collections[k].POST,
    `Add a ${singular[k]} (stores a new revision)`,
    ok(201, entitySavedSchema(k)),
  ),
  row.Workspace("get", `${M}/${k}/{id}`, items[k].GET, `Read a ${singular[k]}`, ok(200, entitySchemas[k])),
  row.Workspace(
    "patch",
    `${M}/${k}/{id}`,
    items[k].PATCH,
    `Change a ${singular[k]} (any subset of fields plus the version last read)`,
    ok(200, entitySavedSchema(k)),
  ),
  row.Workspace(
    "delete",
    `${M}/${k}/{id}`,
    items[k].DELETE,
    `Remove a ${singular[k]} (?version= the version last read)`,
    ok(200, deletedSchema),
  ),
]);

const csv = { status: 200, contentType: "text/csv" };

export const OPERATIONS: Operation[] = [
  row.Missions("get", "/missions", missions.GET, "List the team's missions", ok(200, missionListSchema)),
  row.Missions("post", "/missions", missions.POST, "Create a mission", ok(201, missionSavedSchema)),
  row.Missions("get", M, mission.GET, "Read a mission", ok(200, missionSchema)),
  row.Missions("patch", M, mission.PATCH, "Change a mission's name or description", ok(200, missionSavedSchema)),
  row.Missions("delete", M, mission.DELETE, "Delete a mission and all its revisions", ok(200, deletedSchema)),
  row.Workspace("get", `${M}/settings`, settings.GET, "Read the check settings", ok(200, settingsSchema)),
  row.Workspace("put", `${M}/settings`, settings.PUT, "Replace the check settings", ok(200, settingsSavedSchema)),
  ...entityOperations,
  row.Workspace(
    "get",
    `${M}/lasers/{id}/schedule`,
    laserSchedule.GET,
    "Read a laser pair's observation schedule",
    ok(200, scheduleAnswerSchema),
  ),
  row.Workspace(
    "put",
    `${M}/lasers/{id}/schedule`,
    laserSchedule.PUT,
    "Replace (or remove) a laser pair's observation schedule as a new revision",
    ok(200, scheduleSavedSchema),
  ),
  row.Plans(
    "get",
    `${M}/plan`,
    plan.GET,
    "Export the current plan document (heterolane.plan)",
    ok(200, planDocumentSchema),
  ),
  row.Plans(
    "post",
    `${M}/plan`,
    plan.POST,
    "Import a plan document as a new revision (?baseRevision=N refuses a stale base with 409)",
    ok(201, planImportedSchema),
    {
      schema: planSchema,
      description: "A plan document; every problem is answered as 400 invalid-plan with its path.",
    },
  ),
  row.Plans(
    "get",
    `${M}/result`,
    result.GET,
    "The result document of the latest revision",
    ok(200, resultDocumentSchema),
  ),
  row.Plans("get", `${M}/revisions`, revisions.GET, "List the revisions, newest first", ok(200, revisionListSchema)),
  row.Plans(
    "get",
    `${M}/revisions/{number}`,
    revisionByNumber.GET,
    "One revision with its plan document and result",
    ok(200, revisionSchema),
  ),
  row.Plans(
    "get",
    `${M}/findings`,
    findings.GET,
    "Findings of the latest revision, filtered",
    ok(200, findingListSchema),
  ),
  row.Audit("get", `${M}/activity`, activity.GET, "The mission's activity log", ok(200, activityListSchema)),
  row.Workspace("get", `${M}/channels.csv`, channelsCsv.GET, "The channels as CSV", csv),
  row.Review("get", `${M}/compare`, compare.GET, "Compare two revisions", ok(200, compareSchema)),
  row.Review(
    "get",
    `${M}/review`,
    review.GET,
    "The review state, open errors and history",
    ok(200, reviewOverviewSchema),
  ),
  row.Review(
    "post",
    `${M}/review/submit`,
    submit.POST,
    "Submit the latest revision for review",
    ok(200, reviewTransitionSchema),
  ),
  row.Review(
    "post",
    `${M}/review/decide`,
    decide.POST,
    "Decide a review (baseline it, or return it for rework)",
    ok(200, reviewTransitionSchema),
  ),
  row.Review("get", `${M}/review/comments`, comments.GET, "List comments", ok(200, commentListSchema)),
  row.Review("post", `${M}/review/comments`, comments.POST, "Comment", ok(201, commentSchema)),
  row.Review("get", `${M}/review/waivers`, waivers.GET, "List waivers", ok(200, waiverListSchema)),
  row.Review(
    "post",
    `${M}/review/waivers`,
    waivers.POST,
    "Record a waiver of an open error finding",
    ok(201, waiverSchema),
  ),
  row.Review(
    "patch",
    `${M}/review/waivers/{waiverId}`,
    waiver.PATCH,
    "Change a waiver's reason",
    ok(200, waiverSchema),
  ),
  row.Review("delete", `${M}/review/waivers/{waiverId}`, waiver.DELETE, "Withdraw a waiver", ok(200, waiverSchema)),
  row.Uploads(
    "post",
    `${M}/uploads/tuning-map`,
    tuningUpload.POST,
    "Upload a laser tuning map (CSV)",
    ok(200, uploadAnswerSchema),
    { multipart: "CSV: setpointMA,offsetGHz" },
  ),
  row.Uploads(
    "post",
    `${M}/uploads/detector-response`,
    detectorUpload.POST,
    "Upload a detector response (CSV)",
    ok(200, uploadAnswerSchema),
    { multipart: "CSV: frequencyGHz,responseDB" },
  ),
  row.Uploads(
    "post",
    `${M}/uploads/channels`,
    channelsUpload.POST,
    "Upload channels (CSV)",
    ok(200, uploadAnswerSchema),
    { multipart: "CSV with the channel columns" },
  ),
  row.Plans("post", "/check", check.POST, "Check a plan document without storing it", ok(200, resultDocumentSchema), {
    schema: planSchema,
    description: "A plan document.",
  }),
  row.Audit("get", "/audit.csv", audit.GET, "The team's audit trail as CSV", csv),
];
