/**
 * The four fields of plan format 2 (docs/plan-format.md §12.1) over the
 * workspace API against the real database: stored by create and PATCH, read
 * back, written into the plan export and re-checked by the engine; bad
 * values answer 400 naming the field and change nothing; every role may
 * read them and only the editing roles write them; a version 2 plan goes
 * through import and export exactly, a version 1 plan is read with the
 * defaults and a version 1 plan carrying a version 2 field is refused at that
 * field; and the channel CSV carries `ifFilter` and `centreToleranceMHz`.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeTestPool, makeTeamWithRoles, type TeamWithRoles } from "../setup/auth-helpers";
import { call, missionWithPlan, upload } from "../setup/workspace-helpers";
import { CHANNELS_CSV_HEADER, resonatorBody } from "../setup/workspace-bodies";
import { validPlanInput } from "../fixtures/valid-plan";
import { parsePlan, type PlanInput } from "@/schemas/plan";
import { checkPlan } from "@/lib/plan";

let team: TeamWithRoles;
let missionId = "";
const M = (id = missionId) => `/api/v1/missions/${id}`;

/** The small valid plan as a version 2 document with every envelope field away from its default. */
function envelopePlan(): PlanInput {
  const p = validPlanInput();
  return {
    ...p,
    format: "heterolane.plan/2",
    name: "Demo data: envelope round trip",
    resonators: p.resonators.map((r, i) => ({ ...r, fsrShiftMHzPerK: i === 0 ? -6.2817 : 0.125 })),
    chains: p.chains.map((c, i) => ({ ...c, temperatureExcursionK: i === 0 ? 0.35 : 2 })),
    channels: p.channels.map((c, i) => ({
      ...c,
      ifFilter: i % 2 === 0 ? ("occupied" as const) : ("slot" as const),
      centreToleranceMHz: i === 0 ? 7.5 : null,
    })),
  } as PlanInput;
}

async function revisionCount(id = missionId): Promise<number> {
  return (await call(team.viewer, "GET", `${M(id)}/revisions`)).body.revisions.length;
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.engineer, validPlanInput());
}, 240_000);

afterAll(closeTestPool);

vi.setConfig({ testTimeout: 180_000 });

describe("the envelope fields of the entities", () => {
  it("default on create, store on create and PATCH, and reach the plan and its check", async () => {
    const plain = await call(team.engineer, "POST", `${M()}/resonators`, resonatorBody());
    expect(plain.status).toBe(201);
    expect(plain.body.fsrShiftMHzPerK).toBe(0);
    const shifted = await call(team.engineer, "POST", `${M()}/resonators`, {
      ...resonatorBody(),
      fsrShiftMHzPerK: -6.28,
    });
    expect(shifted.status).toBe(201);
    expect((await call(team.viewer, "GET", `${M()}/resonators/${shifted.body.id}`)).body.fsrShiftMHzPerK).toBe(-6.28);

    const chains = (await call(team.viewer, "GET", `${M()}/chains`)).body.chains;
    expect(chains.map((c: { temperatureExcursionK: number }) => c.temperatureExcursionK)).toEqual([0, 0]);
    const a = chains[0];
    const patched = await call(team.lead, "PATCH", `${M()}/chains/${a.id}`, {
      temperatureExcursionK: 1.5,
      version: a.version,
    });
    expect(patched.status).toBe(200);
    expect(patched.body).toMatchObject({ temperatureExcursionK: 1.5, version: a.version + 1 });

    const ch = (await call(team.viewer, "GET", `${M()}/channels`)).body.channels[0];
    expect(ch).toMatchObject({ ifFilter: "slot", centreToleranceMHz: null });
    const chPatched = await call(team.engineer, "PATCH", `${M()}/channels/${ch.id}`, {
      ifFilter: "occupied",
      centreToleranceMHz: 0.001,
      version: ch.version,
    });
    expect(chPatched.status).toBe(200);
    expect(chPatched.body).toMatchObject({ ifFilter: "occupied", centreToleranceMHz: 0.001 });

    const plan = (await call(team.viewer, "GET", `${M()}/plan`)).body;
    expect(plan.format).toBe("heterolane.plan/2");
    expect(plan.chains[0].temperatureExcursionK).toBe(1.5);
    expect(plan.channels[0]).toMatchObject({ id: ch.key, ifFilter: "occupied", centreToleranceMHz: 0.001 });
    expect(plan.resonators.map((r: { fsrShiftMHzPerK: number }) => r.fsrShiftMHzPerK)).toEqual([0, 0, 0, -6.28]);

    // The stored result is the engine's for the stored plan, and a 1 kHz centre tolerance cannot hold over ±2 MHz of drift.
    const result = (await call(team.viewer, "GET", `${M()}/result`)).body;
    const parsed = parsePlan(plan);
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(result).toEqual(JSON.parse(JSON.stringify(checkPlan(parsed.plan))));
    expect(
      result.findings.some((f: { code: string; channel: string }) => f.code === "centre-drift" && f.channel === ch.key),
    ).toBe(true);
  });

  it("refuses bad values with a 400 naming the field and changes nothing", async () => {
    const chain = (await call(team.viewer, "GET", `${M()}/chains`)).body.chains[1];
    const channel = (await call(team.viewer, "GET", `${M()}/channels`)).body.channels[1];
    const resonator = (await call(team.viewer, "GET", `${M()}/resonators`)).body.resonators[0];
    const planBefore = (await call(team.viewer, "GET", `${M()}/plan`)).body;
    const before = await revisionCount();
    const cases: { path: string; json: Record<string, unknown>; issue: { path: string; message: string } }[] = [
      {
        path: `chains/${chain.id}`,
        json: { temperatureExcursionK: 51 },
        issue: { path: "temperatureExcursionK", message: "must be 50 or less" },
      },
      {
        path: `chains/${chain.id}`,
        json: { temperatureExcursionK: -0.1 },
        issue: { path: "temperatureExcursionK", message: "must be 0 or more" },
      },
      {
        path: `channels/${channel.id}`,
        json: { ifFilter: "wide" },
        issue: { path: "ifFilter", message: "must be slot or occupied" },
      },
      {
        path: `channels/${channel.id}`,
        json: { centreToleranceMHz: 0 },
        issue: { path: "centreToleranceMHz", message: "must be greater than 0" },
      },
      {
        path: `resonators/${resonator.id}`,
        json: { fsrShiftMHzPerK: "fast" },
        issue: { path: "fsrShiftMHzPerK", message: "must be a number" },
      },
    ];
    for (const c of cases) {
      const current = (await call(team.viewer, "GET", `${M()}/${c.path}`)).body;
      const r = await call(team.engineer, "PATCH", `${M()}/${c.path}`, { ...c.json, version: current.version });
      expect({ case: c.json, status: r.status }).toEqual({ case: c.json, status: 400 });
      expect(r.body.error.issues).toContainEqual(c.issue);
    }
    const created = await call(team.engineer, "POST", `${M()}/channels`, {
      key: "bad-filter",
      name: "bad filter",
      chainId: chain.id,
      centerGHz: 183.31,
      bandwidthMHz: 10,
      integrationMs: 10,
      antennaK: 250,
      receiverK: 5000,
      ifFilter: "OCCUPIED",
    });
    expect(created.status).toBe(400);
    expect(created.body.error.issues).toContainEqual({ path: "ifFilter", message: "must be slot or occupied" });
    expect(await revisionCount()).toBe(before);
    expect((await call(team.viewer, "GET", `${M()}/plan`)).body).toEqual(planBefore);
  });

  it("are read by every role and written only by the editing roles", async () => {
    const editors = ["owner", "lead", "engineer"] as const;
    for (const role of [...editors, "viewer"] as const) {
      const chain = (await call(team[role], "GET", `${M()}/chains`)).body.chains[1];
      expect({ role, has: typeof chain.temperatureExcursionK }).toEqual({ role, has: "number" });
      const r = await call(team[role], "PATCH", `${M()}/chains/${chain.id}`, {
        temperatureExcursionK: 0.25,
        version: chain.version,
      });
      expect({ role, status: r.status }).toEqual({
        role,
        status: (editors as readonly string[]).includes(role) ? 200 : 403,
      });
    }
  });
});

describe("plan import and export of format version 2", () => {
  it("gives back exactly the document of a version 2 plan, through a second import too", async () => {
    const doc = envelopePlan();
    const parsed = parsePlan(doc);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const id = await missionWithPlan(team.engineer, doc);
    const exported = (await call(team.viewer, "GET", `${M(id)}/plan`)).body;
    expect(exported).toEqual(parsed.plan);
    expect(JSON.stringify(exported)).toBe(JSON.stringify(parsed.plan));
    expect(exported.channels[0]).toMatchObject({ ifFilter: "occupied", centreToleranceMHz: 7.5 });
    expect(exported.resonators[0].fsrShiftMHzPerK).toBe(-6.2817);
    const again = await missionWithPlan(team.engineer, exported);
    expect(JSON.stringify((await call(team.viewer, "GET", `${M(again)}/plan`)).body)).toBe(JSON.stringify(exported));
    const result = (await call(team.viewer, "GET", `${M(id)}/result`)).body;
    expect(result).toEqual(JSON.parse(JSON.stringify(checkPlan(parsed.plan))));
    expect(result.chains[0].temperatureWindowK).toEqual(checkPlan(parsed.plan).chains[0]!.temperatureWindowK);
  });

  it("reads a version 1 plan with the defaults and exports it as version 2", async () => {
    const id = await missionWithPlan(team.engineer, validPlanInput());
    const exported = (await call(team.viewer, "GET", `${M(id)}/plan`)).body;
    expect(exported.format).toBe("heterolane.plan/2");
    expect(exported.resonators.map((r: { fsrShiftMHzPerK: number }) => r.fsrShiftMHzPerK)).toEqual([0, 0]);
    expect(exported.chains.map((c: { temperatureExcursionK: number }) => c.temperatureExcursionK)).toEqual([0, 0]);
    for (const c of exported.channels) expect(c).toMatchObject({ ifFilter: "slot", centreToleranceMHz: null });
  });

  it("refuses a version 1 plan carrying a version 2 field at that field, and imports nothing", async () => {
    const id = await missionWithPlan(team.engineer, validPlanInput());
    const before = (await call(team.viewer, "GET", `${M(id)}/plan`)).body;
    const count = await revisionCount(id);
    const doc = validPlanInput() as PlanInput & { channels: Record<string, unknown>[] };
    doc.channels[0]!.ifFilter = "occupied";
    const r = await call(team.engineer, "POST", `${M(id)}/plan`, doc);
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-plan");
    expect(r.body.error.issues).toContainEqual({
      path: "channels[0].ifFilter",
      message: 'is a field of heterolane.plan/2: change "format" to "heterolane.plan/2" to use it',
    });
    const bad = { ...envelopePlan(), chains: envelopePlan().chains.map((c) => ({ ...c, temperatureExcursionK: 60 })) };
    const r2 = await call(team.engineer, "POST", `${M(id)}/plan`, bad);
    expect(r2.status).toBe(400);
    expect(r2.body.error.issues.map((i: { path: string }) => i.path)).toContain("chains[0].temperatureExcursionK");
    expect((await call(team.viewer, "GET", `${M(id)}/plan`)).body).toEqual(before);
    expect(await revisionCount(id)).toBe(count);
  });
});

describe("the channel CSV and the envelope columns", () => {
  const strip = (chs: Record<string, unknown>[]) => chs.map(({ version: _v, updatedAt: _u, ...rest }) => rest);

  it("exports ifFilter and centreToleranceMHz when a channel sets them and imports the export exactly", async () => {
    const id = await missionWithPlan(team.engineer, envelopePlan());
    const exported = await call(team.viewer, "GET", `${M(id)}/channels.csv`);
    expect(exported.status).toBe(200);
    expect(exported.text.split("\r\n")[0]).toBe(`${CHANNELS_CSV_HEADER},ifFilter,centreToleranceMHz`);
    expect(exported.text.split("\r\n")[1]).toMatch(/,occupied,7\.5$/);
    const before = (await call(team.viewer, "GET", `${M(id)}/channels`)).body.channels;
    const r = await upload(team.engineer, `${M(id)}/uploads/channels?apply=1`, exported.text, "channels.csv");
    expect(r.status).toBe(200);
    expect(strip((await call(team.viewer, "GET", `${M(id)}/channels`)).body.channels)).toEqual(strip(before));
    expect((await call(team.viewer, "GET", `${M(id)}/channels.csv`)).text).toBe(exported.text);
  });

  it("keeps the stored envelope fields of a channel a file without their columns updates", async () => {
    const id = await missionWithPlan(team.engineer, envelopePlan());
    const before = (await call(team.viewer, "GET", `${M(id)}/channels`)).body.channels[0];
    const csv = `${CHANNELS_CSV_HEADER}\n${before.key},renamed,A,${before.centerGHz},${before.bandwidthMHz},,10,250,5000,0,\nfresh1,new,A,183.2,10,,10,250,5000,0,\n`;
    const r = await upload(team.engineer, `${M(id)}/uploads/channels?apply=1`, csv);
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ created: 1, updated: 1 });
    const after = (await call(team.viewer, "GET", `${M(id)}/channels`)).body.channels;
    expect(after[0]).toMatchObject({ key: before.key, name: "renamed", ifFilter: "occupied", centreToleranceMHz: 7.5 });
    expect(after[after.length - 1]).toMatchObject({ key: "fresh1", ifFilter: "slot", centreToleranceMHz: null });
    // The stored revision is the check of the stored plan (the kept fields included).
    const plan = (await call(team.viewer, "GET", `${M(id)}/plan`)).body;
    const parsed = parsePlan(plan);
    expect(parsed.ok).toBe(true);
    if (parsed.ok)
      expect((await call(team.viewer, "GET", `${M(id)}/result`)).body).toEqual(
        JSON.parse(JSON.stringify(checkPlan(parsed.plan))),
      );
  });

  it("reads blank cells as the defaults and refuses bad ones by row and column", async () => {
    const id = await missionWithPlan(team.engineer, envelopePlan());
    const before = (await call(team.viewer, "GET", `${M(id)}/channels`)).body.channels;
    const head = `${CHANNELS_CSV_HEADER},ifFilter,centreToleranceMHz`;
    const blank = await upload(
      team.engineer,
      `${M(id)}/uploads/channels`,
      `${head}\nb1,blank,A,183.2,10,,10,250,5000,0,,,\n`,
    );
    expect(blank.status).toBe(200);
    expect(blank.body.rows[0]).toMatchObject({
      errors: [],
      channel: { key: "b1", ifFilter: "slot", centreToleranceMHz: null },
    });
    const bad = `${head}\nb1,ok,A,183.2,10,,10,250,5000,0,,occupied,2\nb2,bad,A,183.3,10,,10,250,5000,0,,wide,-1\nb3,bad,A,183.4,10,,10,250,5000,0,,slot,abc\n`;
    const r = await upload(team.engineer, `${M(id)}/uploads/channels?apply=1`, bad);
    expect(r.status).toBe(400);
    expect(r.body.error.issues).toEqual([
      { path: "row 3, column ifFilter", row: 3, column: "ifFilter", message: "must be slot or occupied" },
      {
        path: "row 3, column centreToleranceMHz",
        row: 3,
        column: "centreToleranceMHz",
        message: "must be greater than 0",
      },
      {
        path: "row 4, column centreToleranceMHz",
        row: 4,
        column: "centreToleranceMHz",
        message: '"abc" is not a number',
      },
    ]);
    expect((await call(team.viewer, "GET", `${M(id)}/channels`)).body.channels).toEqual(before);
  });
});
