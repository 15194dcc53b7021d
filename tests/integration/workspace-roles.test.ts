/**
 * Every workspace route × every role, table-driven: viewers read only;
 * engineers and leads edit; only owners delete missions; signed-out callers
 * get 401; a member of another team gets 404 for every mission route (the
 * mission's existence is never revealed).
 */
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import {
  closeTestPool,
  createTeam,
  makeTeamWithRoles,
  newVerifiedUser,
  TestClient,
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

type Role = "owner" | "lead" | "engineer" | "viewer";
const ROLES: Role[] = ["owner", "lead", "engineer", "viewer"];

let team: TeamWithRoles;
let outsider: TestClient;
const signedOut = new TestClient();
let missionId = "";
const ids: Record<string, string> = {};

const M = () => `/api/v1/missions/${missionId}`;

/** The owner makes a fresh, unreferenced row of a kind (so any role's delete or update can succeed). */
async function fresh(
  kind: "lasers" | "resonators" | "detectors" | "chains" | "channels",
): Promise<{ id: string; version: number }> {
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

interface Case {
  name: string;
  /** Roles that may act; the rest get 403. */
  allowed: Role[];
  ok: number;
  /** Builds the request (may create rows as the owner first). */
  prepare: () => Promise<{ method: string; path: string; json?: unknown; file?: string }>;
  /** Mission-scoped: another team's member gets 404. */
  scoped?: boolean;
}

const ALL: Role[] = ROLES;
const EDIT: Role[] = ["owner", "lead", "engineer"];
const get = (path: () => string) => async () => ({ method: "GET", path: path() });

const CASES: Case[] = [
  { name: "GET missions", allowed: ALL, ok: 200, prepare: get(() => "/api/v1/missions"), scoped: false },
  { name: "GET mission", allowed: ALL, ok: 200, prepare: get(() => M()) },
  ...(["lasers", "resonators", "detectors", "chains", "channels"] as const).flatMap<Case>((k) => [
    { name: `GET ${k}`, allowed: ALL, ok: 200, prepare: get(() => `${M()}/${k}`) },
    { name: `GET ${k}/{id}`, allowed: ALL, ok: 200, prepare: get(() => `${M()}/${k}/${ids[k]}`) },
  ]),
  { name: "GET settings", allowed: ALL, ok: 200, prepare: get(() => `${M()}/settings`) },
  { name: "GET plan", allowed: ALL, ok: 200, prepare: get(() => `${M()}/plan`) },
  { name: "GET result", allowed: ALL, ok: 200, prepare: get(() => `${M()}/result`) },
  { name: "GET revisions", allowed: ALL, ok: 200, prepare: get(() => `${M()}/revisions`) },
  { name: "GET revisions/1", allowed: ALL, ok: 200, prepare: get(() => `${M()}/revisions/1`) },
  { name: "GET findings", allowed: ALL, ok: 200, prepare: get(() => `${M()}/findings?severity=error`) },
  { name: "GET channels.csv", allowed: ALL, ok: 200, prepare: get(() => `${M()}/channels.csv`) },
  { name: "GET activity", allowed: ALL, ok: 200, prepare: get(() => `${M()}/activity`) },
  {
    name: "POST missions",
    allowed: EDIT,
    ok: 201,
    scoped: false,
    prepare: async () => ({ method: "POST", path: "/api/v1/missions", json: { name: `Roles ${uniqueKey("m")}` } }),
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
  ...(["lasers", "resonators", "detectors", "chains", "channels"] as const).flatMap<Case>((k) => [
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
        const change: Record<string, unknown> =
          k === "lasers"
            ? { driftMHz: 15 }
            : k === "resonators"
              ? { loadedQ: 2e7 }
              : k === "detectors"
                ? { maxGHz: 6.5 }
                : k === "chains"
                  ? { pathLossDB: 2 }
                  : { integrationMs: 20 };
        return { method: "PATCH", path: `${M()}/${k}/${row.id}`, json: { ...change, version: row.version } };
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
      ids.importTarget = other;
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
];

async function send(c: TestClient, req: Awaited<ReturnType<Case["prepare"]>>): Promise<Reply> {
  if (req.file !== undefined) return upload(c, req.path, req.file);
  return call(c, req.method, req.path, req.json);
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  outsider = await newVerifiedUser("outsider");
  await createTeam(outsider);
  missionId = await missionWithPlan(team.owner, validPlanInput());
  for (const k of ["lasers", "resonators", "detectors", "chains", "channels"]) {
    const r = await call(team.owner, "GET", `${M()}/${k}`);
    ids[k] = r.body[k][0].id;
  }
}, 240_000);

afterAll(closeTestPool);

// The app under test may share a loaded machine: allow slow answers (each test makes many requests).
vi.setConfig({ testTimeout: 180_000 });

describe("workspace routes × roles", () => {
  for (const c of CASES) {
    it(`${c.name}: ${c.allowed.join("/")} ${c.ok}, others 403, signed out 401${c.scoped === false ? "" : ", other team 404"}`, async () => {
      for (const role of ROLES) {
        const req = await c.prepare();
        const r = await send(team[role], req);
        const expected = c.allowed.includes(role) ? c.ok : 403;
        expect({ role, status: r.status, body: r.status === expected ? null : r.text }).toEqual({
          role,
          status: expected,
          body: null,
        });
        if (expected === 403) expect(r.body.error.code).toBe("forbidden");
      }
      const anon = await send(signedOut, await c.prepare());
      expect(anon.status).toBe(401);
      if (c.scoped !== false) {
        const req = await c.prepare();
        const r = await send(outsider, req);
        // the outsider is the owner of their own team: every permission, still 404
        expect({ status: r.status, code: r.body?.error?.code }).toEqual({ status: 404, code: "not-found" });
      }
    }, 120_000);
  }

  it("lists only the caller's team's missions", async () => {
    const mine = await call(team.viewer, "GET", "/api/v1/missions");
    expect(mine.body.missions.map((m: { id: string }) => m.id)).toContain(missionId);
    const theirs = await call(outsider, "GET", "/api/v1/missions");
    expect(theirs.status).toBe(200);
    expect(theirs.body.missions.map((m: { id: string }) => m.id)).not.toContain(missionId);
  });

  it("a 404 for another team looks exactly like a 404 for a mission that does not exist", async () => {
    const missing = await call(outsider, "GET", "/api/v1/missions/00000000-0000-4000-8000-000000000000");
    const foreign = await call(outsider, "GET", `/api/v1/missions/${missionId}`);
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual(missing.body);
    const notUuid = await call(outsider, "GET", "/api/v1/missions/not-a-uuid/lasers");
    expect(notUuid.status).toBe(404);
  });
});
