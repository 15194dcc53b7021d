/**
 * Issue 17, points 6 and 7, and the plan import's version:
 * - channel CSV apply checks every limit before it takes the mission lock
 *   or writes anything (a test holds the lock itself: a refused file is
 *   answered while it is held, where the old path waited for it); a full
 *   256-channel apply is one statement (its lock time is measured by
 *   `npm run bench:apply`, not here); the preview of a 100 000-row file
 *   answers one page with the counts of the whole file;
 * - files as spreadsheets write them are read (BOM, CR LF, semicolons with
 *   decimal commas, headers with units), and a refused header names the
 *   delimiter and the header row;
 * - a plan import with `?baseRevision=` answers 409 when the plan moved on,
 *   and nothing is lost.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestPool, makeTeamWithRoles, testPool, type TeamWithRoles } from "../setup/auth-helpers";
import { call, missionWithPlan, upload } from "../setup/workspace-helpers";
import { CHANNELS_CSV_HEADER } from "../setup/workspace-bodies";
import { validPlanInput } from "../fixtures/valid-plan";

let t: TeamWithRoles;
let missionId = "";
const ids: Record<string, string> = {};
const M = (id = missionId) => `/api/v1/missions/${id}`;

beforeAll(async () => {
  t = await makeTeamWithRoles();
  missionId = await missionWithPlan(t.owner, validPlanInput());
  ids.laser = (await call(t.owner, "GET", `${M()}/lasers`)).body.lasers[0].id;
  ids.detector = (await call(t.owner, "GET", `${M()}/detectors`)).body.detectors[0].id;
}, 240_000);
afterAll(closeTestPool);

const channelRows = (n: number, prefix = "bulk") =>
  Array.from({ length: n }, (_, i) => `${prefix}${i},channel ${i},A,${(150 + i * 0.05).toFixed(2)},10,,10,250,5000,0,`);
const csvOf = (rows: string[]) => `${CHANNELS_CSV_HEADER}\n${rows.join("\n")}\n`;

async function counts(id = missionId) {
  const q = async (sql: string) => (await testPool().query(sql, [id])).rows[0].n as number;
  return {
    channels: await q(`select count(*)::int as n from channels where mission_id = $1`),
    revisions: await q(`select count(*)::int as n from plan_revisions where mission_id = $1`),
    uploads: await q(`select count(*)::int as n from uploads where mission_id = $1`),
  };
}

/** Runs `during` while this test holds the mission's row lock (as a concurrent edit would). */
async function withMissionLocked<T>(id: string, during: () => Promise<T>): Promise<T> {
  const client = await testPool().connect();
  try {
    await client.query("begin");
    await client.query("select id from missions where id = $1 for no key update", [id]);
    // A request that waits for the lock would wait for ever: give up after 20 s (the test fails) and release it.
    let timer: NodeJS.Timeout | undefined;
    const gaveUp = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error("the request waited for the mission lock")), 20_000);
    });
    try {
      return await Promise.race([during(), gaveUp]);
    } finally {
      clearTimeout(timer);
    }
  } finally {
    await client.query("rollback");
    client.release();
  }
}

describe("channel list apply", () => {
  it("20 000 rows: refused for the channel limit without waiting for the mission lock, nothing written", async () => {
    const before = await counts();
    const r = await withMissionLocked(missionId, () =>
      upload(t.engineer, `${M()}/uploads/channels?apply=1`, csvOf(channelRows(20_000))),
    );
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-file");
    expect(r.body.error.message).toMatch(/at most 256/);
    // The mission has 3 channels: the 254th new row is the 257th channel.
    expect(r.body.error.issues).toEqual([
      { path: "row 255", message: "the channel of this row is number 257: over the limit of 256" },
    ]);
    expect(await counts()).toEqual(before);
  });

  it("a file with row errors: refused without the lock as well", async () => {
    const before = await counts();
    const rows = channelRows(300);
    rows[150] = "bad,channel,Q,x,10,,10,250,5000,0,";
    const r = await withMissionLocked(missionId, () =>
      upload(t.engineer, `${M()}/uploads/channels?apply=1`, csvOf(rows)),
    );
    expect(r.status).toBe(400);
    expect(r.body.error.issues.map((i: { path: string }) => i.path)).toEqual([
      "row 152, column chain",
      "row 152, column centerGHz",
    ]);
    expect(await counts()).toEqual(before);
  });

  it("up to the limit: one apply creates and updates by key, one revision, one stored upload", async () => {
    const id = await missionWithPlan(t.owner, validPlanInput());
    const before = await counts(id);
    // Update the three existing channels and add 253 new ones: exactly 256.
    const updates = [
      "wv1,line centre renamed,A,183.31,10,,10,250,5000,0,20",
      "wv2,wing,A,183.31,500,7.5,10,250,5000,0,",
      "o2,oxygen,B,118.75,400,,10,250,5000,0,",
    ];
    const r = await upload(t.engineer, `${M(id)}/uploads/channels?apply=1`, csvOf([...updates, ...channelRows(253)]));
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ created: 253, updated: 3, total: 256 });
    const after = await counts(id);
    expect(after).toEqual({ channels: 256, revisions: before.revisions + 1, uploads: before.uploads + 1 });
    const list = (await call(t.viewer, "GET", `${M(id)}/channels`)).body.channels;
    expect(list[0]).toMatchObject({ key: "wv1", name: "line centre renamed", version: 2 });
    expect(list[255]).toMatchObject({ key: "bulk252", name: "channel 252" });
    // One more new key is over the limit; refused, nothing changes.
    const over = await upload(t.engineer, `${M(id)}/uploads/channels?apply=1`, csvOf(channelRows(1, "extra")));
    expect(over.status).toBe(400);
    expect(await counts(id)).toEqual(after);
  });
});

describe("channel list apply while the plan changes", () => {
  it("an edit that lands between the check before the lock and the lock: the revision is checked again and matches the draft", async () => {
    const id = await missionWithPlan(t.owner, validPlanInput());
    const client = await testPool().connect();
    let applied: Promise<Awaited<ReturnType<typeof upload>>> | undefined;
    try {
      await client.query("begin");
      await client.query("select id from missions where id = $1 for no key update", [id]);
      // The apply reads, checks and writes its revision before the lock, then waits for it …
      applied = upload(t.engineer, `${M(id)}/uploads/channels?apply=1`, csvOf(channelRows(5, "late")));
      const deadline = Date.now() + 20_000;
      for (;;) {
        const { rows } = await testPool().query(
          `select count(*)::int as n from pg_stat_activity where wait_event_type = 'Lock' and query ilike '%for no key update%'`,
        );
        if (rows[0].n > 0) break;
        if (Date.now() > deadline) throw new Error("the apply never waited for the mission lock");
        await new Promise((r) => setTimeout(r, 50));
      }
      // … while another change of the plan commits first (the guard band, not in the file).
      await client.query(`update plan_settings set guard_mhz = 77, version = version + 1 where mission_id = $1`, [id]);
      await client.query("commit");
    } finally {
      client.release();
    }
    const r = await applied!;
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ created: 5, updated: 0 });
    const latest = (
      await testPool().query(
        `select number, plan, error_count + warning_count + info_count as n,
                (select count(*)::int from findings f where f.revision_id = r.id) as finding_rows
           from plan_revisions r where mission_id = $1 order by number desc limit 1`,
        [id],
      )
    ).rows[0];
    expect(latest.plan.settings.guardMHz).toBe(77);
    expect(latest.plan.channels).toHaveLength(8);
    expect(latest.finding_rows).toBe(latest.n);
    expect(latest.plan).toEqual((await call(t.viewer, "GET", `${M(id)}/plan`)).body);
    const placeholders = await testPool().query(`select count(*)::int as n from plan_revisions where number <= 0`);
    expect(placeholders.rows[0].n).toBe(0);
  });
});

describe("channel list preview", () => {
  it("a 100 000-row file answers one page with the counts of the whole file, without the lock", async () => {
    const rows = channelRows(100_000, "p");
    rows[99_990] = "p99990,late error,Q,183,10,,10,250,5000,0,";
    const r = await withMissionLocked(missionId, () => upload(t.engineer, `${M()}/uploads/channels`, csvOf(rows)));
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ total: 100_000, offset: 0, limit: 200, valid: false, invalidRows: 1 });
    expect(r.body.firstInvalidRows).toEqual([99_992]);
    expect(r.body.rows).toHaveLength(200);
    expect(r.text.length).toBeLessThan(200_000);
    const page = await upload(t.engineer, `${M()}/uploads/channels?offset=99980&limit=20`, csvOf(rows));
    expect(page.body.rows.map((x: { row: number }) => x.row)).toEqual(Array.from({ length: 20 }, (_, i) => 99_982 + i));
    expect(page.body.rows[10].errors[0]).toEqual({ column: "chain", message: 'no chain has the key "Q"' });
    const bad = await upload(t.engineer, `${M()}/uploads/channels?limit=5000`, csvOf(rows.slice(0, 2)));
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe("limit");
  });
});

describe("files as spreadsheet programs write them", () => {
  it("a detector response with a BOM, CR LF, semicolons and decimal commas previews as the comma file does", async () => {
    const q = `${M()}/uploads/detector-response?detectorId=${ids.detector}&dropDB=3`;
    const comma = await upload(t.engineer, q, "frequencyGHz,responseDB\n0.05,-6\n0.1,-2.5\n1,0\n5,-1\n6,-2.9\n7,-8\n");
    const semicolon = await upload(
      t.engineer,
      q,
      "\uFEFFFrequency (GHz);Response (dB)\r\n0,05;-6\r\n0,1;-2,5\r\n1;0\r\n5;-1\r\n6;-2,9\r\n7;-8\r\n",
    );
    expect(comma.status).toBe(200);
    expect(semicolon.status).toBe(200);
    expect(semicolon.body).toEqual(comma.body);
  });

  it("a tuning map with `Offset (GHz)` and tabs", async () => {
    const r = await upload(
      t.engineer,
      `${M()}/uploads/tuning-map?laserId=${ids.laser}&gapMHz=15`,
      "Setpoint (mA)\tOffset (GHz)\r\n1\t150\r\n2\t150.01\r\n",
    );
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ intervals: [{ minGHz: 150, maxGHz: 150.01 }], points: 2 });
  });

  it("a header that matches nothing: the message names the delimiter and the header row found", async () => {
    const r = await upload(
      t.engineer,
      `${M()}/uploads/tuning-map?laserId=${ids.laser}&gapMHz=15`,
      "Strom;beat_GHz\r\n1;150,0\r\n",
    );
    expect(r.status).toBe(400);
    expect(r.body.error.issues[0]).toMatchObject({ path: "row 1, column offsetGHz" });
    expect(r.body.error.issues[0].message).toContain('semicolons (";", decimal commas)');
    expect(r.body.error.issues[0].message).toContain('"Strom", "beat_GHz"');
    expect(r.body.error.message).toContain("semicolons");
  });
});

describe("plan import with a version", () => {
  it("409 on a stale revision and nothing lost; accepted with the current one", async () => {
    const id = await missionWithPlan(t.owner, validPlanInput());
    const exported = await t.engineer.fetch(`${M(id)}/plan`);
    const base = Number(exported.headers.get("x-heterolane-revision"));
    const doc = await exported.json();
    expect(base).toBeGreaterThan(0);
    // Someone else edits meanwhile.
    const ch = (await call(t.lead, "GET", `${M(id)}/channels`)).body.channels[0];
    const edit = await call(t.lead, "PATCH", `${M(id)}/channels/${ch.id}`, {
      name: "edited meanwhile",
      version: ch.version,
    });
    expect(edit.status).toBe(200);
    const afterEdit = (await call(t.viewer, "GET", `${M(id)}/plan`)).body;

    doc.name = "My import";
    const stale = await call(t.engineer, "POST", `${M(id)}/plan?baseRevision=${base}`, doc);
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: "stale-version", current: { revision: base + 1 } });
    expect((await call(t.viewer, "GET", `${M(id)}/plan`)).body).toEqual(afterEdit);

    const fresh = await call(t.engineer, "POST", `${M(id)}/plan?baseRevision=${base + 1}`, doc);
    expect(fresh.status).toBe(201);
    expect(fresh.body.revision.number).toBe(base + 2);
    expect((await call(t.viewer, "GET", `${M(id)}/plan`)).body.name).toBe("My import");
    const badQuery = await call(t.engineer, "POST", `${M(id)}/plan?baseRevision=latest`, doc);
    expect([badQuery.status, badQuery.body.error.issues[0].path]).toEqual([400, "baseRevision"]);
  });
});
