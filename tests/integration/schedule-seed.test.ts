/**
 * The second demo mission (the invented shared-laser instrument): seeded
 * once, through saveAndCheck, as the plan as written (revision 2 after the
 * empty revision 1 of a new mission; the
 * 180 GHz channel short of its share) and with the best split applied
 * (revision 3, no error), submitted for review. Runs the seed module in-process against
 * DATABASE_URL, into a fresh team made over HTTP.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeTestPool, makeTeamWithRoles, type TeamWithRoles } from "../setup/auth-helpers";
import { call } from "../setup/workspace-helpers";
import { pool } from "@db/client";
import { seedSharedLaserMission } from "@/server/seed/demo-shared-laser-mission";
import { SHARED_LASER_MISSION_NAME, sharedLaserDemoPlan } from "@db/seed/shared-laser-demo-plan";
import { parsePlan } from "@/schemas/plan";
import { checkPlan } from "@/lib/plan";

let team: TeamWithRoles;

beforeAll(async () => {
  team = await makeTeamWithRoles();
}, 240_000);

afterAll(async () => {
  await closeTestPool();
  await pool.end();
});

vi.setConfig({ testTimeout: 180_000 });

describe("seedSharedLaserMission", () => {
  it("creates the shared-laser demo mission once: the plan as written, then its best split applied", async () => {
    const first = await seedSharedLaserMission(team.teamId, team.engineer.userId);
    expect(first).toMatchObject({ created: true, revision: 3 });
    const again = await seedSharedLaserMission(team.teamId, team.engineer.userId);
    expect(again).toEqual({ missionId: first.missionId, created: false });

    const list = (await call(team.viewer, "GET", "/api/v1/missions")).body.missions;
    const demo = list.filter((m: { name: string }) => m.name === SHARED_LASER_MISSION_NAME);
    expect(demo).toHaveLength(1);
    expect(demo[0]).toMatchObject({ chainCount: 3, channelCount: 3 });

    const M = `/api/v1/missions/${first.missionId}`;
    const parsed = parsePlan(sharedLaserDemoPlan());
    if (!parsed.ok) throw new Error("the shared-laser demo plan is not valid");
    const written = checkPlan(parsed.plan);
    const r2 = (await call(team.viewer, "GET", `${M}/revisions/2`)).body;
    expect(r2.result).toEqual(JSON.parse(JSON.stringify(written)));
    expect(
      r2.result.findings
        .filter((f: { severity: string }) => f.severity === "error")
        .map((f: { code: string }) => f.code),
    ).toEqual(["nedt-unmet"]);
    const plan = (await call(team.viewer, "GET", `${M}/plan`)).body;
    expect(plan.lasers[0].schedule.dwells.map((d: { dwellMs: number }) => d.dwellMs)).toEqual(
      written.schedules![0]!.bestSplit!.dwellsMs,
    );
    const res = (await call(team.viewer, "GET", `${M}/result`)).body;
    const doc = res.format ? res : res.result;
    expect(doc.findings.filter((f: { severity: string }) => f.severity === "error")).toEqual([]);
    expect(doc.schedules[0].laser).toBe("LP1");
    for (const c of doc.chains) expect(c.placeGHz).not.toBeNull();
    const review = (await call(team.viewer, "GET", `${M}/review`)).body;
    expect(review).toMatchObject({ state: "in-review" });
  });
});
