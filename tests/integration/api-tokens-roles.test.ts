/**
 * Every mutation route of /api/v1 × every role's API token, table-driven,
 * against the running app and the real PostgreSQL: a token acts with exactly
 * its role's permissions (allowed roles succeed, the rest get 403), a token
 * of another team gets 404 for the mission's routes, and every answer matches
 * the served OpenAPI description.
 */
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import {
  closeTestPool,
  createTeam,
  makeTeamWithRoles,
  newVerifiedUser,
  type TeamWithRoles,
} from "../setup/auth-helpers";
import { call, missionWithPlan, type Reply } from "../setup/workspace-helpers";
import { uniqueKey } from "../setup/workspace-bodies";
import {
  DECIDE,
  EDIT,
  RoleMission,
  roleMatrix,
  ROLES,
  sendRequest,
  workspaceMutationCases,
  type Role,
  type RoleCase,
} from "../setup/role-matrix";
import { validPlanInput } from "../fixtures/valid-plan";
import { makeToken, OpenApiChecker, TokenClient } from "./support/tokens";

// The clean worked example (no error findings; invented demo data).
const cleanPlan = () =>
  JSON.parse(readFileSync(new URL("../fixtures/plans/ex1-single-channel.plan.json", import.meta.url), "utf8"));

let team: TeamWithRoles;
const tokens = {} as Record<Role, TokenClient>;
let outsider: TokenClient;
let checker: OpenApiChecker;
const mission = new RoleMission();
const M = mission.path;
const problems: string[] = [];

/** A mission of the plan with four open errors, and the id of one of them. */
async function missionWithError(): Promise<{ id: string; findingId: string }> {
  const id = await missionWithPlan(team.owner, validPlanInput());
  const ov = await call(team.owner, "GET", `/api/v1/missions/${id}/review`);
  return { id, findingId: ov.body.errors[0].id };
}

/** A mission of that plan with a waiver (of `reason`) on one of its errors. */
async function missionWithWaiver(reason: string): Promise<{ id: string; w: Reply }> {
  const { id, findingId } = await missionWithError();
  const w = await call(team.owner, "POST", `/api/v1/missions/${id}/review/waivers`, { findingId, reason });
  return { id, w };
}

const CASES: RoleCase[] = [
  ...workspaceMutationCases(mission, "Tokens"),
  {
    name: "POST review/submit",
    allowed: EDIT,
    ok: 200,
    prepare: async () => {
      const id = await missionWithPlan(team.owner, cleanPlan());
      return { method: "POST", path: `/api/v1/missions/${id}/review/submit`, json: { note: "by token" } };
    },
  },
  {
    name: "POST review/decide",
    allowed: DECIDE,
    ok: 200,
    prepare: async () => {
      const id = await missionWithPlan(team.owner, cleanPlan());
      const s = await call(team.owner, "POST", `/api/v1/missions/${id}/review/submit`, {});
      if (s.status !== 200) throw new Error(`submit: ${s.status} ${s.text}`);
      return {
        method: "POST",
        path: `/api/v1/missions/${id}/review/decide`,
        json: { decision: "request-changes", note: "by token" },
      };
    },
  },
  {
    name: "POST review/comments",
    allowed: EDIT,
    ok: 201,
    prepare: async () => ({
      method: "POST",
      path: `${M()}/review/comments`,
      json: { body: `a comment ${uniqueKey("c")}` },
    }),
  },
  {
    name: "POST review/waivers",
    allowed: DECIDE,
    ok: 201,
    prepare: async () => {
      const { id, findingId } = await missionWithError();
      return {
        method: "POST",
        path: `/api/v1/missions/${id}/review/waivers`,
        json: { findingId, reason: "accepted by token" },
      };
    },
  },
  {
    name: "PATCH review/waivers/{id}",
    allowed: DECIDE,
    ok: 200,
    prepare: async () => {
      const { id, w } = await missionWithWaiver("first reason");
      return {
        method: "PATCH",
        path: `/api/v1/missions/${id}/review/waivers/${w.body.id}`,
        json: { reason: "changed by token", version: w.body.version },
      };
    },
  },
  {
    name: "DELETE review/waivers/{id}",
    allowed: DECIDE,
    ok: 200,
    prepare: async () => {
      const { id, w } = await missionWithWaiver("to withdraw");
      return { method: "DELETE", path: `/api/v1/missions/${id}/review/waivers/${w.body.id}` };
    },
  },
];

beforeAll(async () => {
  team = await makeTeamWithRoles();
  for (const role of ROLES) tokens[role] = (await makeToken(team[role], { teamId: team.teamId, role })).client;
  const stranger = await newVerifiedUser("stranger");
  const strangerTeam = await createTeam(stranger);
  outsider = (await makeToken(stranger, { teamId: strangerTeam, role: "owner" })).client;
  const doc = await call(tokens.viewer, "GET", "/api/v1/openapi.json");
  if (doc.status !== 200) throw new Error(`openapi.json answered ${doc.status}`);
  checker = new OpenApiChecker(doc.body);
  await mission.setUp(team.owner);
}, 240_000);

afterAll(closeTestPool);
vi.setConfig({ testTimeout: 180_000 });

describe("mutation routes × API token roles", () => {
  roleMatrix(CASES, {
    as: (role) => tokens[role],
    outsider: () => outsider,
    send: async (c, req) => {
      const r = await sendRequest(c, req);
      problems.push(...checker.problems(req.method, `${req.path}`, r.status, r.headers.get("content-type"), r.body));
      return r;
    },
    title: (c) =>
      `${c.name}: ${c.allowed.join("/")} tokens ${c.ok}, other roles' tokens 403${c.scoped === false ? "" : ", another team's token 404"}`,
  });

  it("every answer above matched the OpenAPI description", () => {
    expect(checker.checked).toBeGreaterThanOrEqual(CASES.length * 4);
    expect(problems).toEqual([]);
  });
});
