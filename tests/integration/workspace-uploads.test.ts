/**
 * CSV uploads over HTTP: tuning map → laser reach, channel list (preview,
 * per-row errors, apply only when valid, export → import round trip),
 * detector response → usable band; every bad file answers 400 naming row and
 * column (or 413 above the size limit) and nothing saved is lost.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeTestPool, makeTeamWithRoles, type TeamWithRoles } from "../setup/auth-helpers";
import { call, missionWithPlan, upload } from "../setup/workspace-helpers";
import { CHANNELS_CSV_HEADER, DETECTOR_CSV, TUNING_CSV } from "../setup/workspace-bodies";
import { validPlanInput } from "../fixtures/valid-plan";

let team: TeamWithRoles;
let missionId = "";
let laser: { id: string; version: number; reach: unknown };
let detector: { id: string; version: number; minGHz: number; maxGHz: number };
const M = () => `/api/v1/missions/${missionId}`;

async function revisionCount(): Promise<number> {
  return (await call(team.viewer, "GET", `${M()}/revisions`)).body.revisions.length;
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.engineer, validPlanInput());
  laser = (await call(team.viewer, "GET", `${M()}/lasers`)).body.lasers[0];
  detector = (await call(team.viewer, "GET", `${M()}/detectors`)).body.detectors[0];
}, 240_000);

afterAll(closeTestPool);

// The app under test may share a loaded machine: allow slow answers (each test makes many requests).
vi.setConfig({ testTimeout: 180_000 });

describe("bad files are refused with row and column, nothing saved is lost", () => {
  const tuning = () => `${M()}/uploads/tuning-map?laserId=${laser.id}&gapMHz=15&apply=1`;
  const cases: {
    name: string;
    content: string | Uint8Array;
    filename?: string;
    type?: string;
    expect: { path: string; message: RegExp };
  }[] = [
    {
      name: "a non-number",
      content: "offsetGHz\n150\n150.01\nabc\n",
      expect: { path: "row 4, column offsetGHz", message: /"abc" is not a number/ },
    },
    {
      name: "a missing column",
      content: "setpoint,offset\n1,150\n",
      expect: { path: "row 1, column offsetGHz", message: /missing column offsetGHz/ },
    },
    { name: "an empty file", content: "", expect: { path: "file", message: /empty/ } },
    { name: "a header without rows", content: "offsetGHz\n", expect: { path: "file", message: /no data rows/ } },
    { name: "a ragged row", content: "offsetGHz,sp\n150,1\n151\n", expect: { path: "row 3", message: /cells/ } },
    {
      name: "Latin-1 text (not UTF-8)",
      content: Uint8Array.from([...new TextEncoder().encode("offsetGHz,note\n150,"), 0xb5, 0x0a]),
      expect: { path: "file", message: /not UTF-8/ },
    },
    {
      name: "UTF-16 text",
      content: Uint8Array.from([0xff, 0xfe, ...[..."offsetGHz\n150\n"].flatMap((ch) => [ch.charCodeAt(0), 0])]),
      expect: { path: "file", message: /not UTF-8|NUL/ },
    },
    {
      name: "an image",
      content: Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
      filename: "plot.png",
      type: "image/png",
      expect: { path: "file", message: /must be a \.csv/ },
    },
  ];
  for (const c of cases) {
    it(`refuses ${c.name}`, async () => {
      const before = await revisionCount();
      const r = await upload(team.engineer, tuning(), c.content, c.filename, c.type);
      expect(r.status).toBe(400);
      expect(r.body.error.issues[0].path).toBe(c.expect.path);
      expect(r.body.error.issues[0].message).toMatch(c.expect.message);
      const now = (await call(team.viewer, "GET", `${M()}/lasers/${laser.id}`)).body;
      expect(now).toMatchObject({ reach: laser.reach, version: laser.version });
      expect(await revisionCount()).toBe(before);
    });
  }

  it("refuses a file above 5 MB with 413", async () => {
    const big = "offsetGHz\n" + "150.000000\n".repeat(Math.ceil((5 * 1024 * 1024) / 11) + 10);
    const r = await upload(team.engineer, tuning(), big);
    expect(r.status).toBe(413);
    expect(r.body.error.code).toBe("too-large");
    expect((await call(team.viewer, "GET", `${M()}/lasers/${laser.id}`)).body.version).toBe(laser.version);
  });

  it("refuses more than 100 000 rows, naming the first row over", async () => {
    const r = await upload(team.engineer, tuning(), "offsetGHz\n" + "1\n".repeat(100_001));
    expect(r.status).toBe(400);
    expect(r.body.error.issues[0]).toMatchObject({ row: 100_002, message: "the file has more than 100000 data rows" });
  });

  it("refuses a request that is not multipart, and bad query values", async () => {
    const notMultipart = await call(team.engineer, "POST", tuning(), { offsetGHz: [150] });
    expect(notMultipart.status).toBe(400);
    const badGap = await upload(team.engineer, `${M()}/uploads/tuning-map?laserId=${laser.id}&gapMHz=wide`, TUNING_CSV);
    expect(badGap.status).toBe(400);
    expect(badGap.body.error.issues[0].path).toBe("gapMHz");
    const noLaser = await upload(
      team.engineer,
      `${M()}/uploads/tuning-map?laserId=00000000-0000-4000-8000-000000000000&gapMHz=10`,
      TUNING_CSV,
    );
    expect(noLaser.status).toBe(404);
  });
});

describe("tuning map", () => {
  it("previews merged intervals without saving, then applies them to the laser as a new revision", async () => {
    const before = await revisionCount();
    const preview = await upload(
      team.engineer,
      `${M()}/uploads/tuning-map?laserId=${laser.id}&gapMHz=15`,
      TUNING_CSV + "6,\n",
    );
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({
      intervals: [
        { minGHz: 150, maxGHz: 150.02 },
        { minGHz: 170, maxGHz: 170.01 },
      ],
      points: 5,
      rejectedRows: [{ row: 7, message: "no measured offset" }],
    });
    expect(await revisionCount()).toBe(before);
    const applied = await upload(
      team.engineer,
      `${M()}/uploads/tuning-map?laserId=${laser.id}&gapMHz=15&apply=1`,
      TUNING_CSV,
    );
    expect(applied.status).toBe(200);
    expect(applied.body).toMatchObject({ id: laser.id, version: laser.version + 1, reach: preview.body.intervals });
    expect(applied.body.revision.number).toBe(before + 1);
    const plan = (await call(team.viewer, "GET", `${M()}/plan`)).body;
    expect(plan.lasers[0].reach).toEqual(preview.body.intervals);
    const act = (await call(team.viewer, "GET", `${M()}/activity`)).body.activity[0];
    expect(act).toMatchObject({ action: "upload", entity: `laser ${plan.lasers[0].id}`, revision: before + 1 });
    laser = applied.body;
  });
});

describe("detector response", () => {
  it("previews the usable band, then applies it", async () => {
    const preview = await upload(
      team.engineer,
      `${M()}/uploads/detector-response?detectorId=${detector.id}&dropDB=3`,
      DETECTOR_CSV,
    );
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ minGHz: 0.05, maxGHz: 6, peakDB: 0 });
    const applied = await upload(
      team.engineer,
      `${M()}/uploads/detector-response?detectorId=${detector.id}&dropDB=1.6&apply=1`,
      DETECTOR_CSV,
    );
    expect(applied.status).toBe(200);
    expect(applied.body).toMatchObject({ id: detector.id, minGHz: 1, maxGHz: 5, version: detector.version + 1 });
    const bad = await upload(
      team.engineer,
      `${M()}/uploads/detector-response?detectorId=${detector.id}&apply=1`,
      "frequencyGHz,responseDB\n1,0\n2,loud\n",
    );
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0]).toMatchObject({ path: "row 3, column responseDB", row: 3, column: "responseDB" });
    expect((await call(team.viewer, "GET", `${M()}/detectors/${detector.id}`)).body).toMatchObject({
      minGHz: 1,
      maxGHz: 5,
    });
  });
});

describe("channel list", () => {
  it("previews per-row errors, refuses to apply while any row is bad, and saves nothing", async () => {
    const before = (await call(team.viewer, "GET", `${M()}/channels`)).body.channels;
    const csv = `${CHANNELS_CSV_HEADER}\nn1,fine,A,183.2,10,,10,250,5000,0,\nn2,bad,Q,x,10,,10,250,5000,0,\n`;
    const preview = await upload(team.engineer, `${M()}/uploads/channels`, csv);
    expect(preview.status).toBe(200);
    expect(preview.body.valid).toBe(false);
    expect(preview.body.rows[0]).toMatchObject({ row: 2, errors: [], channel: { key: "n1", chain: "A" } });
    expect(preview.body.rows[1]).toEqual({
      row: 3,
      errors: [
        { column: "chain", message: 'no chain has the key "Q"' },
        { column: "centerGHz", message: '"x" is not a number' },
      ],
    });
    const apply = await upload(team.engineer, `${M()}/uploads/channels?apply=1`, csv);
    expect(apply.status).toBe(400);
    expect(apply.body.error.issues.map((i: { path: string }) => i.path)).toEqual([
      "row 3, column chain",
      "row 3, column centerGHz",
    ]);
    expect((await call(team.viewer, "GET", `${M()}/channels`)).body.channels).toEqual(before);
    const unknown = await upload(
      team.engineer,
      `${M()}/uploads/channels`,
      "key,name,chain,centerGHz,bandwidthMHz,integrationMs,antennaK,receiverK,colour\nk,n,A,1,1,1,1,1,red\n",
    );
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.issues[0].path).toBe("row 1, column colour");
  });

  it("round-trips the CSV export through the import exactly", async () => {
    const exported = await call(team.viewer, "GET", `${M()}/channels.csv`);
    expect(exported.status).toBe(200);
    expect(exported.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(exported.text.split("\r\n")[0]).toBe(CHANNELS_CSV_HEADER);
    const before = (await call(team.viewer, "GET", `${M()}/channels`)).body.channels;
    const strip = (chs: Record<string, unknown>[]) => chs.map(({ version: _v, updatedAt: _u, ...rest }) => rest);
    const r = await upload(team.engineer, `${M()}/uploads/channels?apply=1`, exported.text, "channels.csv");
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ valid: true, created: 0, updated: before.length });
    const after = (await call(team.viewer, "GET", `${M()}/channels`)).body.channels;
    expect(strip(after)).toEqual(strip(before));
    const again = await call(team.viewer, "GET", `${M()}/channels.csv`);
    expect(again.text).toBe(exported.text);
  });

  it("adds new channels by key and keeps the others", async () => {
    const before = (await call(team.viewer, "GET", `${M()}/channels`)).body.channels.length;
    const csv = `${CHANNELS_CSV_HEADER}\nnew1,"wing, far",A,183.5,20,,10,250,5000,0,30\n`;
    const r = await upload(team.engineer, `${M()}/uploads/channels?apply=1`, csv);
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ created: 1, updated: 0 });
    const after = (await call(team.viewer, "GET", `${M()}/channels`)).body.channels;
    expect(after.length).toBe(before + 1);
    expect(after[after.length - 1]).toMatchObject({
      key: "new1",
      name: "wing, far",
      requiredNedtK: 30,
      dsbOffsetGHz: null,
    });
  });
});
