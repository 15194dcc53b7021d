/**
 * The schedule editor's routes (docs/plan-format.md §13):
 * `GET`/`PUT /api/v1/missions/{id}/lasers/{laserId}/schedule` over every
 * role, the import/export round trip of a plan with a schedule, bad input
 * named at its field with nothing saved, and "apply best split" as a new
 * revision the server checks again.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import {
  closeTestPool,
  createTeam,
  makeTeamWithRoles,
  newVerifiedUser,
  TestClient,
  type TeamWithRoles,
} from "../setup/auth-helpers";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

type Role = "owner" | "lead" | "engineer" | "viewer";
const ROLES: Role[] = ["owner", "lead", "engineer", "viewer"];
const EDIT: Role[] = ["owner", "lead", "engineer"];

const SHARED = JSON.parse(readFileSync(join(__dirname, "../../docs/examples/shared-laser.plan.json"), "utf8"));

let team: TeamWithRoles;
let outsider: TestClient;
const signedOut = new TestClient();
let missionId = "";
let laserId = "";
let chainIds: string[] = [];

const M = () => `/api/v1/missions/${missionId}`;
const S = () => `${M()}/lasers/${laserId}/schedule`;

async function current() {
  const r = await call(team.owner, "GET", S());
  expect(r.status).toBe(200);
  return r.body;
}

/** A schedule body of the demo plan's chains with these dwells. */
function body(version: number, dwellsMs: number[], cycleMs = 200) {
  return {
    version,
    schedule: {
      cycleMs,
      retuneMs: 2,
      retuneMsPerGHz: 0.01,
      relockMs: 5,
      dwells: chainIds.map((chainId, j) => ({ chainId, dwellMs: dwellsMs[j] })),
    },
  };
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  outsider = await newVerifiedUser("outsider");
  await createTeam(outsider);
  missionId = await missionWithPlan(team.owner, SHARED);
  const lasers = await call(team.owner, "GET", `${M()}/lasers`);
  laserId = lasers.body.lasers[0].id;
  const chains = await call(team.owner, "GET", `${M()}/chains`);
  chainIds = chains.body.chains.map((c: { id: string }) => c.id);
}, 240_000);

afterAll(closeTestPool);
vi.setConfig({ testTimeout: 180_000 });

describe("schedule routes × roles", () => {
  it("GET: every role 200, signed out 401, other team 404", async () => {
    for (const role of ROLES)
      expect({ role, status: (await call(team[role], "GET", S())).status }).toEqual({ role, status: 200 });
    expect((await call(signedOut, "GET", S())).status).toBe(401);
    const r = await call(outsider, "GET", S());
    expect({ status: r.status, code: r.body?.error?.code }).toEqual({ status: 404, code: "not-found" });
  });
  it("PUT: owner/lead/engineer 200, viewer 403, signed out 401, other team 404", async () => {
    for (const role of ROLES) {
      const v = (await current()).version;
      const r = await call(team[role], "PUT", S(), body(v, [50, 60, 90]));
      const expected = EDIT.includes(role) ? 200 : 403;
      expect({ role, status: r.status, body: r.status === expected ? null : r.text }).toEqual({
        role,
        status: expected,
        body: null,
      });
      if (expected === 403) expect(r.body.error.code).toBe("forbidden");
    }
    const v = (await current()).version;
    expect((await call(signedOut, "PUT", S(), body(v, [50, 60, 90]))).status).toBe(401);
    const r = await call(outsider, "PUT", S(), body(v, [50, 60, 90]));
    expect({ status: r.status, code: r.body?.error?.code }).toEqual({ status: 404, code: "not-found" });
  });
});

describe("the schedule in the workspace", () => {
  it("an imported plan's schedule is stored, read back with chain ids and keys, and exported unchanged", async () => {
    const s = await current();
    expect(s.schedule.dwells.map((d: { chainKey: string }) => d.chainKey)).toEqual(["A180", "B240", "C320"]);
    expect(s.schedule.dwells.map((d: { chainId: string }) => d.chainId)).toEqual(chainIds);
    const exported = await call(team.owner, "GET", `${M()}/plan`);
    expect(exported.body.lasers[0].schedule).toEqual(SHARED.lasers[0].schedule);
    const result = await call(team.owner, "GET", `${M()}/result`);
    const doc = result.body.format ? result.body : result.body.result;
    expect(doc.schedules[0].laser).toBe("LP1");
  });
  it("bad input is named at its field (400) and nothing is saved", async () => {
    const before = await current();
    const revisions = (await call(team.owner, "GET", `${M()}/revisions`)).body;
    const bad = body(before.version, [50, 60, 90]);
    bad.schedule.dwells[1]!.dwellMs = 2; // shorter than the 2.6 ms retune into it
    const r = await call(team.engineer, "PUT", S(), bad);
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-plan");
    expect(r.body.error.issues.map((i: { path: string }) => i.path)).toEqual(["schedule.dwells[1].dwellMs"]);
    const neg = await call(team.engineer, "PUT", S(), {
      ...body(before.version, [50, 60, 90]),
      schedule: { ...body(before.version, [1]).schedule, cycleMs: -1 },
    });
    expect(neg.status).toBe(400);
    expect(neg.body.error.issues.map((i: { path: string }) => i.path)).toContain("schedule.cycleMs");
    const unknown = body(before.version, [50, 60, 90]);
    unknown.schedule.dwells[0]!.chainId = "00000000-0000-4000-8000-000000000000";
    const u = await call(team.engineer, "PUT", S(), unknown);
    expect(u.status).toBe(400);
    expect(u.body.error.issues).toEqual([
      { path: "schedule.dwells[0].chainId", message: "no chain with this id in the mission" },
    ]);
    expect(await current()).toEqual(before);
    expect((await call(team.owner, "GET", `${M()}/revisions`)).body).toEqual(revisions);
  });
  it("a stale version is refused with 409 and the current schedule", async () => {
    const before = await current();
    const r = await call(team.engineer, "PUT", S(), body(before.version - 1, [50, 60, 90]));
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe("stale-version");
  });
  it("apply best split: the result's split saved as a new revision, checked again, meets every requirement", async () => {
    const before = await current();
    const res = await call(team.owner, "GET", `${M()}/result`);
    const doc = res.body.format ? res.body : res.body.result;
    const best = doc.schedules[0].bestSplit;
    expect(doc.findings.some((f: { code: string }) => f.code === "nedt-unmet")).toBe(true);
    const r = await call(team.engineer, "PUT", S(), body(before.version, best.dwellsMs));
    expect(r.status).toBe(200);
    expect(r.body.revision.errorCount).toBe(0);
    expect(r.body.schedule.dwells.map((d: { dwellMs: number }) => d.dwellMs)).toEqual(best.dwellsMs);
    const after = await call(team.owner, "GET", `${M()}/result`);
    const doc2 = after.body.format ? after.body : after.body.result;
    expect(doc2.findings.filter((f: { code: string }) => f.code === "nedt-unmet")).toEqual([]);
  });
  it("putting another laser's chain in a schedule moves it to the shared laser pair; null removes a one-chain schedule", async () => {
    const m = await missionWithPlan(team.owner, validPlanInput());
    const lasers = (await call(team.owner, "GET", `/api/v1/missions/${m}/lasers`)).body.lasers;
    const chains = (await call(team.owner, "GET", `/api/v1/missions/${m}/chains`)).body.chains;
    const path = `/api/v1/missions/${m}/lasers/${lasers[0].id}/schedule`;
    // chain B (laser LP2, LO −121 GHz) joins LP1, whose reach is 150–200 GHz: the check refuses it at chains[1]
    const v = (await call(team.owner, "GET", path)).body.version;
    const r = await call(team.engineer, "PUT", path, {
      version: v,
      schedule: {
        cycleMs: 100,
        retuneMs: 0,
        retuneMsPerGHz: 0,
        relockMs: 0,
        dwells: [
          { chainId: chains[0].id, dwellMs: 50 },
          { chainId: chains[1].id, dwellMs: 50 },
        ],
      },
    });
    expect(r.status).toBe(200);
    const after = (await call(team.owner, "GET", `/api/v1/missions/${m}/chains`)).body.chains;
    expect(after[1].laserId).toBe(lasers[0].id);
    expect(r.body.revision.errorCount).toBeGreaterThan(0); // chain B's LO is outside LP1's reach: findings, not a refusal
    // one chain alone: a schedule, then none
    const m2 = await missionWithPlan(team.owner, validPlanInput());
    const l2 = (await call(team.owner, "GET", `/api/v1/missions/${m2}/lasers`)).body.lasers[0];
    const c2 = (await call(team.owner, "GET", `/api/v1/missions/${m2}/chains`)).body.chains[0];
    const p2 = `/api/v1/missions/${m2}/lasers/${l2.id}/schedule`;
    const one = await call(team.engineer, "PUT", p2, {
      version: l2.version,
      schedule: { cycleMs: 10, retuneMs: 1, retuneMsPerGHz: 0, relockMs: 0, dwells: [{ chainId: c2.id, dwellMs: 10 }] },
    });
    expect(one.status).toBe(200);
    const none = await call(team.engineer, "PUT", p2, { version: one.body.version, schedule: null });
    expect(none.status).toBe(200);
    expect(none.body.schedule).toBeNull();
    expect((await call(team.owner, "GET", `/api/v1/missions/${m2}/plan`)).body.lasers[0].schedule).toBeNull();
  });
});
