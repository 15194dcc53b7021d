/**
 * Workspace data rules over HTTP against the real database: optimistic
 * concurrency (409 with the current row, nothing overwritten), invalid input
 * and invalid assemblies rolled back, bad JSON, revisions with the engine's
 * result and findings, activity rows for every mutation, and the exact plan
 * export/import round trip (fixtures and a small fast-check property).
 */
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import fc from "fast-check";
import { closeTestPool, makeTeamWithRoles, testPool, type TeamWithRoles } from "../setup/auth-helpers";
import { call, callRaw, missionWithPlan } from "../setup/workspace-helpers";
import { chainBody, laserBody } from "../setup/workspace-bodies";
import { validPlanInput } from "../fixtures/valid-plan";
import { fixtureInput } from "../fixtures/plans/builders";
import { validPlanArb } from "../fixtures/plan-arbitrary";
import { parsePlan } from "@/schemas/plan";
import { checkPlan } from "@/lib/plan";

let team: TeamWithRoles;
let missionId = "";
const M = (id = missionId) => `/api/v1/missions/${id}`;

async function revisionCount(id = missionId): Promise<number> {
  const r = await call(team.viewer, "GET", `${M(id)}/revisions`);
  return r.body.revisions.length;
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.engineer, validPlanInput());
}, 240_000);

afterAll(closeTestPool);

// The app under test may share a loaded machine: allow slow answers (each test makes many requests).
vi.setConfig({ testTimeout: 180_000 });

describe("optimistic concurrency", () => {
  it("answers 409 with the current row to a stale PATCH and keeps the other write", async () => {
    const list = await call(team.engineer, "GET", `${M()}/channels`);
    const ch = list.body.channels[0];
    const first = await call(team.lead, "PATCH", `${M()}/channels/${ch.id}`, {
      name: "renamed by the lead",
      version: ch.version,
    });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ name: "renamed by the lead", version: ch.version + 1 });
    expect(first.body.revision).toEqual({
      number: expect.any(Number),
      errorCount: expect.any(Number),
      warningCount: expect.any(Number),
      infoCount: expect.any(Number),
    });
    const before = await revisionCount();
    const stale = await call(team.engineer, "PATCH", `${M()}/channels/${ch.id}`, {
      bandwidthMHz: 12,
      version: ch.version,
    });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("stale-version");
    expect(stale.body.error.current).toMatchObject({
      id: ch.id,
      name: "renamed by the lead",
      version: ch.version + 1,
      bandwidthMHz: ch.bandwidthMHz,
    });
    const reread = await call(team.viewer, "GET", `${M()}/channels/${ch.id}`);
    expect(reread.body).toMatchObject({
      name: "renamed by the lead",
      bandwidthMHz: ch.bandwidthMHz,
      version: ch.version + 1,
    });
    expect(await revisionCount()).toBe(before);
  });

  it("answers 409 to a stale DELETE and the row stays", async () => {
    const list = await call(team.engineer, "GET", `${M()}/channels`);
    const ch = list.body.channels[1];
    const upd = await call(team.lead, "PATCH", `${M()}/channels/${ch.id}`, { integrationMs: 25, version: ch.version });
    expect(upd.status).toBe(200);
    const stale = await call(team.engineer, "DELETE", `${M()}/channels/${ch.id}?version=${ch.version}`);
    expect(stale.status).toBe(409);
    expect(stale.body.error.current).toMatchObject({ id: ch.id, integrationMs: 25 });
    expect((await call(team.viewer, "GET", `${M()}/channels/${ch.id}`)).status).toBe(200);
  });

  it("answers 409 to stale settings and mission changes", async () => {
    const s = await call(team.engineer, "GET", `${M()}/settings`);
    const { updatedAt: _u, ...settings } = s.body;
    expect((await call(team.lead, "PUT", `${M()}/settings`, { ...settings, guardMHz: 45 })).status).toBe(200);
    const stale = await call(team.engineer, "PUT", `${M()}/settings`, { ...settings, guardMHz: 60 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.current).toMatchObject({ guardMHz: 45, version: settings.version + 1 });
    const m = await call(team.engineer, "GET", M());
    expect((await call(team.lead, "PATCH", M(), { description: "lead's words", version: m.body.version })).status).toBe(
      200,
    );
    const staleM = await call(team.engineer, "PATCH", M(), {
      description: "engineer's words",
      version: m.body.version,
    });
    expect(staleM.status).toBe(409);
    expect((await call(team.viewer, "GET", M())).body.description).toBe("lead's words");
  });

  it("serialises concurrent updates of one row: exactly one of two racing PATCHes wins", async () => {
    const list = await call(team.engineer, "GET", `${M()}/resonators`);
    const r = list.body.resonators[0];
    const [a, b] = await Promise.all([
      call(team.engineer, "PATCH", `${M()}/resonators/${r.id}`, { loadedQ: 1.1e7, version: r.version }),
      call(team.lead, "PATCH", `${M()}/resonators/${r.id}`, { loadedQ: 1.2e7, version: r.version }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const winner = a.status === 200 ? 1.1e7 : 1.2e7;
    expect((await call(team.viewer, "GET", `${M()}/resonators/${r.id}`)).body.loadedQ).toBe(winner);
  });
});

describe("concurrent edits of different rows", () => {
  it("both succeed with consecutive revision numbers (the mission lock serialises them)", async () => {
    const before = (await call(team.viewer, "GET", `${M()}/revisions`)).body.revisions[0].number;
    const replies = await Promise.all(
      ["RX1", "RX2", "RX3"].map((key, i) =>
        call([team.engineer, team.lead, team.owner][i]!, "POST", `${M()}/resonators`, {
          key,
          fsrGHz: 100 + i,
          loadedQ: 1e6,
        }),
      ),
    );
    expect(replies.map((r) => r.status)).toEqual([201, 201, 201]);
    expect(replies.map((r) => r.body.revision.number).sort((a: number, b: number) => a - b)).toEqual([
      before + 1,
      before + 2,
      before + 3,
    ]);
    const plan = (await call(team.viewer, "GET", `${M()}/plan`)).body;
    expect(plan.resonators.map((r: { id: string }) => r.id)).toEqual(expect.arrayContaining(["RX1", "RX2", "RX3"]));
    const positions = (await call(team.viewer, "GET", `${M()}/resonators`)).body.resonators.map(
      (r: { key: string }) => r.key,
    );
    expect(new Set(positions).size).toBe(positions.length);
  });
});

describe("invalid input is refused and nothing is saved", () => {
  it("names every bad field of a create and of an update", async () => {
    const before = await revisionCount();
    const bad = await call(team.engineer, "POST", `${M()}/lasers`, {
      ...laserBody(),
      carrierTHz: -1,
      reach: [{ minGHz: 5, maxGHz: 1 }],
      colour: "red",
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe("invalid-input");
    const paths = bad.body.error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["carrierTHz", "reach[0].maxGHz", ""]));
    const d = (await call(team.engineer, "GET", `${M()}/detectors`)).body.detectors[0];
    const upd = await call(team.engineer, "PATCH", `${M()}/detectors/${d.id}`, { minGHz: 9, version: d.version });
    expect(upd.status).toBe(400);
    expect(upd.body.error.issues).toEqual([{ path: "maxGHz", message: "must be above minGHz" }]);
    expect((await call(team.viewer, "GET", `${M()}/detectors/${d.id}`)).body).toMatchObject({
      minGHz: d.minGHz,
      version: d.version,
    });
    expect(await revisionCount()).toBe(before);
  });

  it("rolls back a change that leaves the assembled plan invalid (one laser serving two chains)", async () => {
    const before = await revisionCount();
    const chains = (await call(team.engineer, "GET", `${M()}/chains`)).body.chains;
    const used = chains[0];
    const r = await call(
      team.engineer,
      "POST",
      `${M()}/chains`,
      chainBody({ laserId: used.laserId, resonatorId: used.resonatorId, detectorId: used.detectorId }, "Z9"),
    );
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-plan");
    // the issue about the new row is renamed to the form's field
    expect(r.body.error.issues).toEqual([
      { path: "laserId", message: expect.stringContaining("a laser serves one chain") },
    ]);
    const after = (await call(team.engineer, "GET", `${M()}/chains`)).body.chains;
    expect(after.map((c: { key: string }) => c.key)).not.toContain("Z9");
    expect(await revisionCount()).toBe(before);
  });

  it("refuses a duplicate key, references into nothing, and deleting hardware in use", async () => {
    const lasers = (await call(team.engineer, "GET", `${M()}/lasers`)).body.lasers;
    const dup = await call(team.engineer, "POST", `${M()}/lasers`, laserBody(lasers[0].key));
    expect(dup.status).toBe(400);
    expect(dup.body.error.issues).toEqual([
      { path: "key", message: "another laser of this mission already uses this key" },
    ]);
    const dangling = await call(
      team.engineer,
      "POST",
      `${M()}/chains`,
      chainBody({
        laserId: "00000000-0000-4000-8000-000000000001",
        resonatorId: "00000000-0000-4000-8000-000000000002",
        detectorId: "00000000-0000-4000-8000-000000000003",
      }),
    );
    expect(dangling.status).toBe(400);
    expect(dangling.body.error.issues.map((i: { path: string }) => i.path)).toEqual([
      "laserId",
      "resonatorId",
      "detectorId",
    ]);
    const inUse = await call(team.engineer, "DELETE", `${M()}/lasers/${lasers[0].id}?version=${lasers[0].version}`);
    expect(inUse.status).toBe(409);
    expect(inUse.body.error.code).toBe("in-use");
    expect((await call(team.viewer, "GET", `${M()}/lasers/${lasers[0].id}`)).status).toBe(200);
  });

  it("answers bad JSON, a missing version and an invalid plan document with 400 and changes nothing", async () => {
    const planBefore = (await call(team.viewer, "GET", `${M()}/plan`)).body;
    const before = await revisionCount();
    const badJson = await callRaw(team.engineer, "POST", `${M()}/plan`, '{"format": "heterolane.plan/1", ');
    expect(badJson.status).toBe(400);
    expect(badJson.body.error.code).toBe("invalid-json");
    const badJson2 = await callRaw(team.engineer, "POST", `${M()}/lasers`, "not json");
    expect(badJson2.status).toBe(400);
    const ch = (await call(team.engineer, "GET", `${M()}/channels`)).body.channels[0];
    const noVersion = await call(team.engineer, "PATCH", `${M()}/channels/${ch.id}`, { name: "x" });
    expect(noVersion.status).toBe(400);
    expect(noVersion.body.error.issues).toEqual([{ path: "version", message: "is required" }]);
    const badDelete = await call(team.engineer, "DELETE", `${M()}/channels/${ch.id}?version=abc`);
    expect(badDelete.status).toBe(400);
    const doc = validPlanInput() as any; // eslint-disable-line @typescript-eslint/no-explicit-any
    doc.channels[0].bandwidthMHz = -5;
    doc.chains[1].laser = "nope";
    const invalid = await call(team.engineer, "POST", `${M()}/plan`, doc);
    expect(invalid.status).toBe(400);
    expect(invalid.body.error.code).toBe("invalid-plan");
    const paths = invalid.body.error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["chains[1].laser", "channels[0].bandwidthMHz"]));
    expect((await call(team.viewer, "GET", `${M()}/plan`)).body).toEqual(planBefore);
    expect(await revisionCount()).toBe(before);
  });
});

describe("revisions, findings and activity", () => {
  it("stores the engine's result for the draft, and the findings filters agree with it", async () => {
    const plan = (await call(team.viewer, "GET", `${M()}/plan`)).body;
    const stored = (await call(team.viewer, "GET", `${M()}/result`)).body;
    const parsed = parsePlan(plan);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(stored).toEqual(JSON.parse(JSON.stringify(checkPlan(parsed.plan))));
    const all = (await call(team.viewer, "GET", `${M()}/findings`)).body;
    expect(all.findings).toEqual(stored.findings);
    for (const severity of ["error", "warning", "info"]) {
      const f = (await call(team.viewer, "GET", `${M()}/findings?severity=${severity}`)).body;
      expect(f.findings).toEqual(stored.findings.filter((x: { severity: string }) => x.severity === severity));
    }
    const first = stored.findings[0];
    if (first) {
      const q = `chain=${encodeURIComponent(first.chain)}&code=${encodeURIComponent(first.code)}`;
      const f = (await call(team.viewer, "GET", `${M()}/findings?${q}`)).body;
      expect(f.findings).toEqual(
        stored.findings.filter(
          (x: { chain: string; code: string }) => x.chain === first.chain && x.code === first.code,
        ),
      );
    }
    const ch = stored.findings.find((x: { channel: string | null }) => x.channel !== null);
    if (ch) {
      const f = (await call(team.viewer, "GET", `${M()}/findings?channel=${encodeURIComponent(ch.channel)}`)).body;
      expect(f.findings).toEqual(stored.findings.filter((x: { channel: string | null }) => x.channel === ch.channel));
    }
    const bad = await call(team.viewer, "GET", `${M()}/findings?severity=fatal`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe("severity");
  });

  it("numbers revisions 1..n, keeps each immutable, and logs one activity row per revision", async () => {
    const revs = (await call(team.viewer, "GET", `${M()}/revisions`)).body.revisions;
    const numbers = revs.map((r: { number: number }) => r.number);
    expect(numbers).toEqual(Array.from({ length: numbers.length }, (_, i) => numbers.length - i));
    expect(revs[0]).toMatchObject({ status: "draft", authorName: expect.any(String), summary: expect.any(String) });
    const r1 = (await call(team.viewer, "GET", `${M()}/revisions/1`)).body;
    expect(r1.plan.channels).toEqual([]);
    expect(r1.result.format).toBe("heterolane.result/2");
    const latest = (await call(team.viewer, "GET", `${M()}/revisions/${numbers[0]}`)).body;
    expect(latest.plan).toEqual((await call(team.viewer, "GET", `${M()}/plan`)).body);
    expect((await call(team.viewer, "GET", `${M()}/revisions/999999`)).status).toBe(404);
    const act = (await call(team.viewer, "GET", `${M()}/activity`)).body.activity;
    expect(act.map((a: { revision: number }) => a.revision).sort((x: number, y: number) => y - x)).toEqual(numbers);
    expect(act[act.length - 1]).toMatchObject({ action: "create", revision: 1 });
    const { rows } = await testPool().query(
      "select count(*)::int as n from findings f join plan_revisions r on r.id = f.revision_id where r.mission_id = $1 and r.number = $2",
      [missionId, numbers[0]],
    );
    expect(rows[0].n).toBe(latest.result.findings.length);
  });

  it("lists the mission with its latest counts", async () => {
    const list = (await call(team.viewer, "GET", "/api/v1/missions")).body.missions;
    const m = list.find((x: { id: string }) => x.id === missionId);
    const result = (await call(team.viewer, "GET", `${M()}/result`)).body;
    expect(m).toMatchObject({
      chainCount: 2,
      openErrors: result.findings.filter((f: { severity: string }) => f.severity === "error").length,
      openWarnings: result.findings.filter((f: { severity: string }) => f.severity === "warning").length,
      status: "draft",
    });
  });
});

describe("plan export/import round trip", () => {
  it("gives back exactly the normalised document for the worked examples", async () => {
    for (const name of ["ex1-single-channel", "ex2-lower-sideband-sampled"]) {
      const doc = fixtureInput(name);
      const id = await missionWithPlan(team.engineer, doc);
      const exported = (await call(team.viewer, "GET", `${M(id)}/plan`)).body;
      const parsed = parsePlan(doc);
      expect(parsed.ok).toBe(true);
      if (parsed.ok) expect(exported).toEqual(parsed.plan);
      const again = await missionWithPlan(team.engineer, exported);
      expect((await call(team.viewer, "GET", `${M(again)}/plan`)).body).toEqual(exported);
      expect(JSON.stringify((await call(team.viewer, "GET", `${M(again)}/plan`)).body)).toBe(JSON.stringify(exported));
    }
  }, 120_000);

  it("round-trips generated plans exactly (property, few runs)", async () => {
    const id = await missionWithPlan(team.engineer, undefined);
    await fc.assert(
      fc.asyncProperty(validPlanArb, async (doc) => {
        const parsed = parsePlan(doc);
        if (!parsed.ok) return; // the generator's own contract; only valid documents are of interest here
        const imp = await call(team.engineer, "POST", `${M(id)}/plan`, doc);
        expect(imp.status).toBe(201);
        const exported = (await call(team.viewer, "GET", `${M(id)}/plan`)).body;
        expect(exported).toEqual(parsed.plan);
        const imp2 = await call(team.engineer, "POST", `${M(id)}/plan`, exported);
        expect(imp2.status).toBe(201);
        expect(JSON.stringify((await call(team.viewer, "GET", `${M(id)}/plan`)).body)).toBe(JSON.stringify(exported));
      }),
      { numRuns: 6 },
    );
  }, 240_000);
});

describe("missions", () => {
  it("refuses bad mission input, answers 413 to an oversized plan, and deletes a mission with everything in it", async () => {
    const empty = await call(team.engineer, "POST", "/api/v1/missions", { name: "  " });
    expect(empty.status).toBe(400);
    expect(empty.body.error.issues).toEqual([{ path: "name", message: "is required" }]);
    const extra = await call(team.engineer, "POST", "/api/v1/missions", { name: "ok", colour: "red" });
    expect(extra.status).toBe(400);
    const id = await missionWithPlan(team.engineer, validPlanInput());
    const huge = { ...validPlanInput(), name: "x".repeat(5_100_000) };
    const big = await call(team.engineer, "POST", `${M(id)}/plan`, huge);
    expect(big.status).toBe(413);
    const m = (await call(team.owner, "GET", M(id))).body;
    const stale = await call(team.owner, "DELETE", `${M(id)}?version=${m.version - 1}`);
    expect(stale.status).toBe(409);
    expect((await call(team.viewer, "GET", M(id))).status).toBe(200);
    const del = await call(team.owner, "DELETE", `${M(id)}?version=${m.version}`);
    expect(del.status).toBe(200);
    expect((await call(team.viewer, "GET", M(id))).status).toBe(404);
    const { rows } = await testPool().query(
      `select (select count(*) from lasers where mission_id = $1)::int as lasers,
              (select count(*) from channels where mission_id = $1)::int as channels,
              (select count(*) from plan_revisions where mission_id = $1)::int as revisions,
              (select count(*) from activity where team_id = $2 and action = 'delete' and summary like '%' || $1 || '%')::int as logged`,
      [id, team.teamId],
    );
    expect(rows[0]).toEqual({ lasers: 0, channels: 0, revisions: 0, logged: 1 });
  });
});
