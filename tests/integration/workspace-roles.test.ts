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
import { call } from "../setup/workspace-helpers";
import { KINDS, RoleMission, roleMatrix, ROLES, workspaceMutationCases, type RoleCase } from "../setup/role-matrix";

let team: TeamWithRoles;
let outsider: TestClient;
const signedOut = new TestClient();
const mission = new RoleMission();
const M = mission.path;

const get = (path: () => string) => async () => ({ method: "GET", path: path() });

const CASES: RoleCase[] = [
  { name: "GET missions", allowed: ROLES, ok: 200, prepare: get(() => "/api/v1/missions"), scoped: false },
  { name: "GET mission", allowed: ROLES, ok: 200, prepare: get(() => M()) },
  ...KINDS.flatMap<RoleCase>((k) => [
    { name: `GET ${k}`, allowed: ROLES, ok: 200, prepare: get(() => `${M()}/${k}`) },
    { name: `GET ${k}/{id}`, allowed: ROLES, ok: 200, prepare: get(() => `${M()}/${k}/${mission.ids[k]}`) },
  ]),
  { name: "GET settings", allowed: ROLES, ok: 200, prepare: get(() => `${M()}/settings`) },
  { name: "GET plan", allowed: ROLES, ok: 200, prepare: get(() => `${M()}/plan`) },
  { name: "GET result", allowed: ROLES, ok: 200, prepare: get(() => `${M()}/result`) },
  { name: "GET revisions", allowed: ROLES, ok: 200, prepare: get(() => `${M()}/revisions`) },
  { name: "GET revisions/1", allowed: ROLES, ok: 200, prepare: get(() => `${M()}/revisions/1`) },
  { name: "GET findings", allowed: ROLES, ok: 200, prepare: get(() => `${M()}/findings?severity=error`) },
  { name: "GET channels.csv", allowed: ROLES, ok: 200, prepare: get(() => `${M()}/channels.csv`) },
  { name: "GET activity", allowed: ROLES, ok: 200, prepare: get(() => `${M()}/activity`) },
  ...workspaceMutationCases(mission, "Roles"),
];

beforeAll(async () => {
  team = await makeTeamWithRoles();
  outsider = await newVerifiedUser("outsider");
  await createTeam(outsider);
  await mission.setUp(team.owner);
}, 240_000);

afterAll(closeTestPool);

// The app under test may share a loaded machine: allow slow answers (each test makes many requests).
vi.setConfig({ testTimeout: 180_000 });

describe("workspace routes × roles", () => {
  roleMatrix(CASES, {
    as: (role) => team[role],
    outsider: () => outsider,
    signedOut,
    title: (c) =>
      `${c.name}: ${c.allowed.join("/")} ${c.ok}, others 403, signed out 401${c.scoped === false ? "" : ", other team 404"}`,
    timeout: 120_000,
  });

  it("lists only the caller's team's missions", async () => {
    const mine = await call(team.viewer, "GET", "/api/v1/missions");
    expect(mine.body.missions.map((m: { id: string }) => m.id)).toContain(mission.missionId);
    const theirs = await call(outsider, "GET", "/api/v1/missions");
    expect(theirs.status).toBe(200);
    expect(theirs.body.missions.map((m: { id: string }) => m.id)).not.toContain(mission.missionId);
  });

  it("a 404 for another team looks exactly like a 404 for a mission that does not exist", async () => {
    const missing = await call(outsider, "GET", "/api/v1/missions/00000000-0000-4000-8000-000000000000");
    const foreign = await call(outsider, "GET", `/api/v1/missions/${mission.missionId}`);
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual(missing.body);
    const notUuid = await call(outsider, "GET", "/api/v1/missions/not-a-uuid/lasers");
    expect(notUuid.status).toBe(404);
  });
});
