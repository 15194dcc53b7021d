/**
 * The demo mission seed: idempotent, stored through the same saveAndCheck
 * path (its stored result is the engine's for the stored plan), and it
 * leaves the intended open findings. Runs the seed module in-process
 * against DATABASE_URL, into a fresh team made over HTTP.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeTestPool, makeTeamWithRoles, type TeamWithRoles } from "../setup/auth-helpers";
import { call } from "../setup/workspace-helpers";
import { pool } from "@db/client";
import { seedDemoMission } from "@/server/seed/demo-mission";
import { DEMO_MISSION_NAME, demoPlan } from "@db/seed/mission-demo-plan";
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

describe("seedDemoMission", () => {
  it("creates the demo mission once, checked by the engine, with the intended open findings", async () => {
    const first = await seedDemoMission(team.teamId, team.engineer.userId);
    expect(first.created).toBe(true);
    const again = await seedDemoMission(team.teamId, team.engineer.userId);
    expect(again).toEqual({ missionId: first.missionId, created: false });

    const list = (await call(team.viewer, "GET", "/api/v1/missions")).body.missions;
    const demo = list.filter((m: { name: string }) => m.name === DEMO_MISSION_NAME);
    expect(demo).toHaveLength(1);
    expect(demo[0]).toMatchObject({ chainCount: 4, channelCount: 12 });

    const M = `/api/v1/missions/${first.missionId}`;
    const plan = (await call(team.viewer, "GET", `${M}/plan`)).body;
    const parsed = parsePlan(demoPlan());
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(plan).toEqual(parsed.plan);
    const result = (await call(team.viewer, "GET", `${M}/result`)).body;
    expect(result).toEqual(JSON.parse(JSON.stringify(checkPlan(parsed.plan))));

    const open = result.findings
      .filter((f: { severity: string }) => f.severity !== "info")
      .map(
        (f: { severity: string; code: string; chain: string; channel: string | null }) =>
          `${f.severity} ${f.code} ${f.chain} ${f.channel}`,
      );
    // The demo's envelope story (db/seed/mission-demo-plan.ts): the 183 GHz chain passes with its
    // occupied-band IF filters; the 243 GHz chain's ±10 K control is wider than its temperature window.
    expect(open.sort()).toEqual(
      [
        "warning carrier-dominates-lo O2-118 null",
        "error nedt-unmet O2-118 o2-core",
        "error nedt-unmet WIN-243 win-1",
        "error nedt-unmet WIN-243 win-3",
        "error image-response H2O-325 h325-w2",
      ].sort(),
    );
    const chainOf = (id: string) => result.chains.find((c: { id: string }) => c.id === id);
    expect(chainOf("H2O-183").temperatureMarginK).toBeGreaterThan(0);
    expect(chainOf("WIN-243").temperatureMarginK).toBeLessThan(0);
    const revs = (await call(team.viewer, "GET", `${M}/revisions`)).body.revisions;
    expect(revs[0]).toMatchObject({ number: first.revision, errorCount: 4, warningCount: 1 });
  });
});
