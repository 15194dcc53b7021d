/**
 * Hard ranges of the plan's numbers on the workspace's write paths (ADR 030):
 * a form value outside its range is a field error, an imported document
 * outside them is refused with named paths, and a revision stored before the
 * ranges existed still loads — it is refused, with the path, at its next save.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestPool, makeTeamWithRoles, testPool, type TeamWithRoles } from "../setup/auth-helpers";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

type Role = "owner" | "lead" | "engineer" | "viewer";
const EDITORS: Role[] = ["owner", "lead", "engineer"];
let team: TeamWithRoles;
beforeAll(async () => {
  team = await makeTeamWithRoles();
}, 120_000);
afterAll(closeTestPool);

const M = (id: string) => `/api/v1/missions/${id}`;

describe("hard ranges on save", () => {
  for (const role of EDITORS)
    it(`as ${role}: a laser pair edit with a carrier of 99 999 THz is a field error on carrierTHz; nothing is saved`, async () => {
      const id = await missionWithPlan(team.owner, validPlanInput());
      const laser = (await call(team.owner, "GET", `${M(id)}/lasers`)).body.lasers[0];
      const before = (await call(team.owner, "GET", `${M(id)}/revisions`)).body.revisions.length;
      const r = await call(team[role], "PATCH", `${M(id)}/lasers/${laser.id}`, {
        carrierTHz: 99_999,
        version: laser.version,
      });
      expect(r.status).toBe(400);
      expect(r.body.error.issues).toEqual([
        { path: "carrierTHz", message: expect.stringContaining("must be at most 400") },
      ]);
      expect((await call(team.owner, "GET", `${M(id)}/revisions`)).body.revisions.length).toBe(before);
    }, 60_000);

  it("as viewer: the same edit is 403 before any range is read", async () => {
    const id = await missionWithPlan(team.owner, validPlanInput());
    const laser = (await call(team.owner, "GET", `${M(id)}/lasers`)).body.lasers[0];
    const r = await call(team.viewer, "PATCH", `${M(id)}/lasers/${laser.id}`, {
      carrierTHz: 99_999,
      version: laser.version,
    });
    expect(r.status).toBe(403);
  }, 60_000);

  it("an imported plan document with the issue's absurd values is refused with every path", async () => {
    const id = await missionWithPlan(team.owner, undefined);
    const doc = validPlanInput() as unknown as {
      lasers: { carrierTHz: number; carrierPowerMW: number; driftMHz: number }[];
      resonators: { fsrGHz: number; loadedQ: number }[];
      channels: { receiverK: number }[];
    };
    doc.lasers[0]!.carrierTHz = 99_999;
    doc.lasers[0]!.carrierPowerMW = 1e6;
    doc.lasers[0]!.driftMHz = 1e12;
    doc.resonators[0]!.fsrGHz = 1e6;
    doc.resonators[0]!.loadedQ = 1e30;
    doc.channels[0]!.receiverK = 1e15;
    const r = await call(team.engineer, "POST", `${M(id)}/plan`, doc);
    expect(r.status).toBe(400);
    expect(r.body.error.issues.map((i: { path: string }) => i.path)).toEqual([
      "lasers[0].carrierTHz",
      "lasers[0].carrierPowerMW",
      "lasers[0].driftMHz",
      "resonators[0].fsrGHz",
      "resonators[0].loadedQ",
      "channels[0].receiverK",
    ]);
  }, 60_000);
});

describe("a revision stored before the ranges existed", () => {
  it("still loads (plan, result, mission page), and is refused with the path at its next save", async () => {
    const id = await missionWithPlan(team.owner, validPlanInput());
    // As if stored by an earlier version of the product, which had no ranges.
    await testPool().query(`update lasers set carrier_thz = 99999 where mission_id = $1`, [id]);
    const plan = await call(team.viewer, "GET", `${M(id)}/plan`);
    expect(plan.status).toBe(200);
    expect(plan.body.lasers.map((l: { carrierTHz: number }) => l.carrierTHz)).toContain(99_999);
    expect((await call(team.viewer, "GET", `${M(id)}/result`)).status).toBe(200);
    const page = await team.viewer.fetch(`/missions/${id}`, { headers: { accept: "text/html" } });
    expect(page.status).toBe(200);
    await page.text();
    const ch = (await call(team.owner, "GET", `${M(id)}/channels`)).body.channels[0];
    const r = await call(team.engineer, "PATCH", `${M(id)}/channels/${ch.id}`, {
      name: "renamed",
      version: ch.version,
    });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-plan");
    expect(r.body.error.issues.map((i: { path: string }) => i.path)).toContain("lasers[0].carrierTHz");
  }, 120_000);
});
