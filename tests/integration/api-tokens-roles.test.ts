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
import { call, missionWithPlan, upload, type Reply } from "../setup/workspace-helpers";
import {
  CHANNELS_CSV_HEADER,
  chainBody,
  channelBody,
  DETECTOR_CSV,
  detectorBody,
  laserBody,
  resonatorBody,
  TUNING_CSV,
  uniqueKey,
} from "../setup/workspace-bodies";
import { validPlanInput } from "../fixtures/valid-plan";
import { makeToken, OpenApiChecker, TokenClient } from "./support/tokens";

type Role = "owner" | "lead" | "engineer" | "viewer";
const ROLES: Role[] = ["owner", "lead", "engineer", "viewer"];
const EDIT: Role[] = ["owner", "lead", "engineer"];
const DECIDE: Role[] = ["owner", "lead"];
const KINDS = ["lasers", "resonators", "detectors", "chains", "channels"] as const;
type Kind = (typeof KINDS)[number];

// The clean worked example (no error findings; invented demo data).
const cleanPlan = () =>
  JSON.parse(readFileSync(new URL("../fixtures/plans/ex1-single-channel.plan.json", import.meta.url), "utf8"));

let team: TeamWithRoles;
const tokens = {} as Record<Role, TokenClient>;
let outsider: TokenClient;
let checker: OpenApiChecker;
let missionId = "";
const ids: Record<string, string> = {};
const problems: string[] = [];
const M = () => `/api/v1/missions/${missionId}`;

async function fresh(kind: Kind): Promise<{ id: string; version: number }> {
  const o = team.owner;
  let body: unknown;
  if (kind === "lasers") body = laserBody();
  else if (kind === "resonators") body = resonatorBody();
  else if (kind === "detectors") body = detectorBody();
  else if (kind === "chains") {
    const laser = await call(o, "POST", `${M()}/lasers`, laserBody());
    body = chainBody({ laserId: laser.body.id, resonatorId: ids.resonators!, detectorId: ids.detectors! });
  } else body = channelBody(ids.chains!);
  const r = await call(o, "POST", `${M()}/${kind}`, body);
  if (r.status !== 201) throw new Error(`fresh ${kind}: ${r.status} ${r.text}`);
  return { id: r.body.id, version: r.body.version };
}

/** A mission of the plan with four open errors, and the id of one of them. */
async function missionWithError(): Promise<{ id: string; findingId: string }> {
  const id = await missionWithPlan(team.owner, validPlanInput());
  const ov = await call(team.owner, "GET", `/api/v1/missions/${id}/review`);
  return { id, findingId: ov.body.errors[0].id };
}

interface Req {
  method: string;
  path: string;
  json?: unknown;
  file?: string;
}
interface Case {
  name: string;
  allowed: Role[];
  ok: number;
  prepare: () => Promise<Req>;
  /** Mission-scoped: another team's token gets 404. */
  scoped?: boolean;
}

const CASES: Case[] = [
  {
    name: "POST missions",
    allowed: EDIT,
    ok: 201,
    scoped: false,
    prepare: async () => ({ method: "POST", path: "/api/v1/missions", json: { name: `Tokens ${uniqueKey("m")}` } }),
  },
  {
    name: "PATCH mission",
    allowed: EDIT,
    ok: 200,
    prepare: async () => {
      const m = await call(team.owner, "GET", M());
      return { method: "PATCH", path: M(), json: { description: uniqueKey("d"), version: m.body.version } };
    },
  },
  {
    name: "DELETE mission",
    allowed: ["owner"],
    ok: 200,
    prepare: async () => {
      const other = await call(team.owner, "POST", "/api/v1/missions", { name: `Doomed ${uniqueKey("m")}` });
      return { method: "DELETE", path: `/api/v1/missions/${other.body.id}?version=${other.body.version}` };
    },
  },
  ...KINDS.flatMap<Case>((k) => [
    {
      name: `POST ${k}`,
      allowed: EDIT,
      ok: 201,
      prepare: async () => {
        let json: unknown;
        if (k === "lasers") json = laserBody();
        else if (k === "resonators") json = resonatorBody();
        else if (k === "detectors") json = detectorBody();
        else if (k === "chains") {
          const laser = await fresh("lasers");
          json = chainBody({ laserId: laser.id, resonatorId: ids.resonators!, detectorId: ids.detectors! });
        } else json = channelBody(ids.chains!);
        return { method: "POST", path: `${M()}/${k}`, json };
      },
    },
    {
      name: `PATCH ${k}/{id}`,
      allowed: EDIT,
      ok: 200,
      prepare: async () => {
        const row = await fresh(k);
        const change: Record<Kind, Record<string, unknown>> = {
          lasers: { driftMHz: 15 },
          resonators: { loadedQ: 2e7 },
          detectors: { maxGHz: 6.5 },
          chains: { pathLossDB: 2 },
          channels: { integrationMs: 20 },
        };
        return { method: "PATCH", path: `${M()}/${k}/${row.id}`, json: { ...change[k], version: row.version } };
      },
    },
    {
      name: `DELETE ${k}/{id}`,
      allowed: EDIT,
      ok: 200,
      prepare: async () => {
        const row = await fresh(k);
        return { method: "DELETE", path: `${M()}/${k}/${row.id}?version=${row.version}` };
      },
    },
  ]),
  {
    name: "PUT settings",
    allowed: EDIT,
    ok: 200,
    prepare: async () => {
      const s = await call(team.owner, "GET", `${M()}/settings`);
      return {
        method: "PUT",
        path: `${M()}/settings`,
        json: { ...s.body, updatedAt: undefined, guardMHz: 40 + Math.random() },
      };
    },
  },
  {
    name: "POST plan (import)",
    allowed: EDIT,
    ok: 201,
    prepare: async () => {
      const other = await missionWithPlan(team.owner, undefined);
      return { method: "POST", path: `/api/v1/missions/${other}/plan`, json: validPlanInput() };
    },
  },
  {
    name: "POST uploads/tuning-map (preview)",
    allowed: EDIT,
    ok: 200,
    prepare: async () => ({
      method: "POST",
      path: `${M()}/uploads/tuning-map?laserId=${ids.lasers}&gapMHz=15`,
      file: TUNING_CSV,
    }),
  },
  {
    name: "POST uploads/detector-response (preview)",
    allowed: EDIT,
    ok: 200,
    prepare: async () => ({
      method: "POST",
      path: `${M()}/uploads/detector-response?detectorId=${ids.detectors}&dropDB=3`,
      file: DETECTOR_CSV,
    }),
  },
  {
    name: "POST uploads/channels (preview)",
    allowed: EDIT,
    ok: 200,
    prepare: async () => ({
      method: "POST",
      path: `${M()}/uploads/channels`,
      file: `${CHANNELS_CSV_HEADER}\nx1,extra,A,183.2,10,,10,250,5000,0,\n`,
    }),
  },
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
      const { id, findingId } = await missionWithError();
      const w = await call(team.owner, "POST", `/api/v1/missions/${id}/review/waivers`, {
        findingId,
        reason: "first reason",
      });
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
      const { id, findingId } = await missionWithError();
      const w = await call(team.owner, "POST", `/api/v1/missions/${id}/review/waivers`, {
        findingId,
        reason: "to withdraw",
      });
      return { method: "DELETE", path: `/api/v1/missions/${id}/review/waivers/${w.body.id}` };
    },
  },
];

async function send(c: TokenClient, req: Req): Promise<Reply> {
  const r =
    req.file !== undefined ? await upload(c, req.path, req.file) : await call(c, req.method, req.path, req.json);
  problems.push(...checker.problems(req.method, `${req.path}`, r.status, r.headers.get("content-type"), r.body));
  return r;
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  for (const role of ROLES) tokens[role] = (await makeToken(team[role], { teamId: team.teamId, role })).client;
  const stranger = await newVerifiedUser("stranger");
  const strangerTeam = await createTeam(stranger);
  outsider = (await makeToken(stranger, { teamId: strangerTeam, role: "owner" })).client;
  const doc = await call(tokens.viewer, "GET", "/api/v1/openapi.json");
  if (doc.status !== 200) throw new Error(`openapi.json answered ${doc.status}`);
  checker = new OpenApiChecker(doc.body);
  missionId = await missionWithPlan(team.owner, validPlanInput());
  for (const k of KINDS) {
    const r = await call(team.owner, "GET", `${M()}/${k}`);
    ids[k] = r.body[k][0].id;
  }
}, 240_000);

afterAll(closeTestPool);
vi.setConfig({ testTimeout: 180_000 });

describe("mutation routes × API token roles", () => {
  for (const c of CASES) {
    it(`${c.name}: ${c.allowed.join("/")} tokens ${c.ok}, other roles' tokens 403${c.scoped === false ? "" : ", another team's token 404"}`, async () => {
      for (const role of ROLES) {
        const r = await send(tokens[role], await c.prepare());
        const expected = c.allowed.includes(role) ? c.ok : 403;
        expect({ role, status: r.status, body: r.status === expected ? null : r.text }).toEqual({
          role,
          status: expected,
          body: null,
        });
        if (expected === 403) expect(r.body.error.code).toBe("forbidden");
      }
      if (c.scoped !== false) {
        const r = await send(outsider, await c.prepare());
        expect({ status: r.status, code: r.body?.error?.code }).toEqual({ status: 404, code: "not-found" });
      }
    });
  }

  it("every answer above matched the OpenAPI description", () => {
    expect(checker.checked).toBeGreaterThanOrEqual(CASES.length * 4);
    expect(problems).toEqual([]);
  });
});
