/**
 * Issue 17, point 5: ordinary bad input never gives a 500. A U+0000 (or
 * another control character) in any stored text, in a query or path value,
 * an integer of 2³¹ or more where an `integer` column holds it, and a body
 * that is not UTF-8 are each refused with 400 naming the field — and
 * nothing is stored.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  BASE_URL,
  closeTestPool,
  makeTeamWithRoles,
  TestClient,
  testPool,
  uniqueEmail,
  type TeamWithRoles,
} from "../setup/auth-helpers";
import { call, missionWithPlan, type Reply } from "../setup/workspace-helpers";
import { chainBody, channelBody, laserBody } from "../setup/workspace-bodies";
import { validPlanInput } from "../fixtures/valid-plan";

const NUL = "\u0000";
const BIG = 2 ** 31;
let t: TeamWithRoles;
let missionId = "";
const ids: Record<string, string> = {};
const M = () => `/api/v1/missions/${missionId}`;
const paths = (r: Reply) => ((r.body?.error?.issues ?? []) as { path: string }[]).map((i) => i.path);

beforeAll(async () => {
  t = await makeTeamWithRoles();
  missionId = await missionWithPlan(t.owner, validPlanInput());
  for (const k of ["lasers", "resonators", "detectors", "chains"])
    ids[k] = (await call(t.owner, "GET", `${M()}/${k}`)).body[k][0].id;
}, 240_000);
afterAll(closeTestPool);

async function revisions(): Promise<number> {
  const { rows } = await testPool().query(`select count(*)::int as n from plan_revisions where mission_id = $1`, [
    missionId,
  ]);
  return rows[0].n;
}

describe("control characters in stored text: 400 naming the field, nothing stored", () => {
  const plan = (edit: (p: ReturnType<typeof validPlanInput>) => void) => {
    const p = validPlanInput();
    edit(p);
    return p;
  };
  const CASES: {
    name: string;
    method: string;
    path: () => string;
    body: () => unknown;
    issue: string;
    code?: string;
  }[] = [
    {
      name: "mission name",
      method: "POST",
      path: () => "/api/v1/missions",
      body: () => ({ name: `a${NUL}b` }),
      issue: "name",
    },
    {
      name: "mission description",
      method: "POST",
      path: () => "/api/v1/missions",
      body: () => ({ name: "ok", description: `line one\nline ${NUL}two` }),
      issue: "description",
    },
    {
      name: "mission rename",
      method: "PATCH",
      path: () => M(),
      body: () => ({ name: `x${NUL}`, version: 1 }),
      issue: "name",
    },
    { name: "laser key", method: "POST", path: () => `${M()}/lasers`, body: () => laserBody(`L${NUL}`), issue: "key" },
    {
      name: "laser key with a tab (single-line text)",
      method: "POST",
      path: () => `${M()}/lasers`,
      body: () => laserBody("L\t1"),
      issue: "key",
    },
    {
      name: "channel name",
      method: "POST",
      path: () => `${M()}/channels`,
      body: () => ({ ...channelBody(ids.chains!), name: `wing${NUL}` }),
      issue: "name",
    },
    {
      name: "plan import: plan name",
      method: "POST",
      path: () => `${M()}/plan`,
      body: () => plan((p) => (p.name = `plan${NUL}`)),
      issue: "name",
      code: "invalid-plan",
    },
    {
      name: "plan import: channel name",
      method: "POST",
      path: () => `${M()}/plan`,
      body: () => plan((p) => (p.channels[0]!.name = `c${NUL}`)),
      issue: "channels[0].name",
      code: "invalid-plan",
    },
    {
      name: "plan import: an id",
      method: "POST",
      path: () => `${M()}/plan`,
      body: () =>
        plan((p) => {
          p.lasers[0]!.id = `LP${NUL}`;
          p.chains[0]!.laser = `LP${NUL}`;
        }),
      issue: "lasers[0].id",
      code: "invalid-plan",
    },
    {
      name: "comment body",
      method: "POST",
      path: () => `${M()}/review/comments`,
      body: () => ({ body: `hello${NUL}` }),
      issue: "body",
    },
    {
      name: "comment channel key",
      method: "POST",
      path: () => `${M()}/review/comments`,
      body: () => ({ body: "hello", channelKey: `wv${NUL}` }),
      issue: "channelKey",
    },
    {
      name: "waiver reason",
      method: "POST",
      path: () => `${M()}/review/waivers`,
      body: () => ({ findingId: "00000000-0000-4000-8000-000000000000", reason: `accepted${NUL}` }),
      issue: "reason",
    },
    {
      name: "review note (submit)",
      method: "POST",
      path: () => `${M()}/review/submit`,
      body: () => ({ note: `please${NUL}` }),
      issue: "note",
    },
    {
      name: "review note (decide)",
      method: "POST",
      path: () => `${M()}/review/decide`,
      body: () => ({ decision: "request-changes", note: `fix${NUL}` }),
      issue: "note",
    },
    {
      name: "team name (auth API)",
      method: "POST",
      path: () => "/api/auth/organization/create",
      body: () => ({ name: `team${NUL}`, slug: `t-${Date.now()}` }),
      issue: "name",
    },
    {
      name: "user name (auth API sign-up)",
      method: "POST",
      path: () => "/api/auth/sign-up/email",
      body: () => ({ name: `me${NUL}`, email: uniqueEmail("nul"), password: "correct-horse-battery-9" }),
      issue: "name",
    },
    {
      name: "user name (auth API update)",
      method: "POST",
      path: () => "/api/auth/update-user",
      body: () => ({ name: `me${NUL}` }),
      issue: "name",
    },
  ];
  it.each(CASES)("$name", async (c) => {
    const before = await revisions();
    const missionsBefore = (await call(t.owner, "GET", "/api/v1/missions")).body.missions.length;
    const r = await call(t.owner, c.method, c.path(), c.body());
    expect([r.status, r.body?.error?.code ?? r.body?.code]).toEqual([400, c.code ?? "invalid-input"]);
    expect(paths(r)).toContain(c.issue);
    expect(await revisions()).toBe(before);
    expect((await call(t.owner, "GET", "/api/v1/missions")).body.missions.length).toBe(missionsBefore);
  });

  it("an upload's file name with a control character", async () => {
    const boundary = "----heterolane-test";
    const body = Buffer.concat([
      Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="map\u0001.csv"\r\n`),
      Buffer.from("Content-Type: text/csv\r\n\r\nsetpointMA,offsetGHz\n1,150\n2,150.01\n\r\n"),
      Buffer.from(`--${boundary}--\r\n`),
    ]);
    const res = await t.owner.fetch(`${M()}/uploads/tuning-map?laserId=${ids.lasers}&gapMHz=15&apply=1`, {
      method: "POST",
      headers: { "content-type": `multipart/form-data; boundary=${boundary}` },
      body,
    });
    const reply = await res.json();
    expect(res.status).toBe(400);
    expect(reply.error.issues[0].path).toBe("file");
  });

  it("multi-line fields keep tabs and line breaks", async () => {
    const r = await call(t.owner, "POST", "/api/v1/missions", { name: "Tabs ok", description: "a\tb\r\nc\nd" });
    expect(r.status).toBe(201);
    expect((await call(t.owner, "GET", `/api/v1/missions/${r.body.id}`)).body.description).toBe("a\tb\r\nc\nd");
  });
});

describe("query and path values are validated like bodies", () => {
  it.each([
    ["findings ?chain=%00", () => `${M()}/findings?chain=%00`, "chain"],
    ["findings ?code=%01", () => `${M()}/findings?code=%01`, "code"],
    ["audit ?person=%00", () => "/api/v1/audit.csv?person=%00", "person"],
    ["audit ?action=%00", () => "/api/v1/audit.csv?action=x%00", "action"],
    ["comments ?channel=%00", () => `${M()}/review/comments?channel=%00`, "channel"],
  ])("%s: 400", async (_name, path, issue) => {
    const r = await call(t.owner, "GET", path());
    expect(r.status).toBe(400);
    expect(paths(r)).toEqual([issue]);
  });

  it.each([
    ["DELETE /api/team/invitations/%00", "DELETE", "/api/team/invitations/%00", "id"],
    ["PATCH /api/team/members/%00", "PATCH", "/api/team/members/%00", "memberId"],
    ["DELETE /api/team/members/%00", "DELETE", "/api/team/members/%00", "memberId"],
    ["GET /api/v1/missions/%00", "GET", "/api/v1/missions/%00", "missionId"],
  ])("%s: 400 naming the parameter", async (_name, method, path, issue) => {
    const r = await call(t.owner, method, path, method === "PATCH" ? { role: "viewer" } : undefined);
    expect(r.status).toBe(400);
    expect(paths(r)).toEqual([issue]);
  });

  it("the invitation page with a control character in its address: the plain 'does not exist' page", async () => {
    const res = await new TestClient().fetch("/invitations/%00");
    expect(res.status).toBe(200);
    expect(await res.text()).toContain("This invitation does not exist");
  });

  it("a percent-encoding that is not UTF-8 in the query: 400 invalid-encoding naming it", async () => {
    const r = await call(t.owner, "GET", `${M()}/findings?chain=%FF%FE`);
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-encoding");
    expect(paths(r)).toEqual(["chain"]);
  });

  it("… and in the path (Next alone answered a bare 500): 400 on a route, the plain page on a page", async () => {
    for (const [method, path] of [
      ["GET", "/api/v1/missions/%FF"],
      ["DELETE", "/api/team/members/%C3"],
      ["DELETE", "/api/team/invitations/%FF%FE"],
    ] as const) {
      const r = await call(t.owner, method, path);
      expect([path, r.status, r.body?.error?.code]).toEqual([path, 400, "invalid-encoding"]);
    }
    const page = await new TestClient().fetch("/invitations/%FF");
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("This invitation does not exist");
  });
});

describe("integers bounded to their column", () => {
  it.each([
    [
      "chain mode",
      () => `${M()}/chains`,
      () => ({
        ...chainBody({ laserId: ids.lasers!, resonatorId: ids.resonators!, detectorId: ids.detectors! }),
        mode: BIG,
      }),
      "mode",
    ],
    [
      "laser lock orders",
      () => `${M()}/lasers`,
      () => ({ ...laserBody(), lock: { modulationMHz: 60, modulationIndex: 0.5, orders: BIG } }),
      "lock.orders",
    ],
    ["comment revision", () => `${M()}/review/comments`, () => ({ body: "hi", revision: BIG }), "revision"],
    ["mission version", () => M(), () => ({ name: "x", version: BIG }), "version"],
  ])("%s of 2³¹: 400", async (_name, path, body, issue) => {
    const before = await revisions();
    const r = await call(t.owner, _name === "mission version" ? "PATCH" : "POST", path(), body());
    expect(r.status).toBe(400);
    expect(paths(r)).toContain(issue);
    expect(await revisions()).toBe(before);
  });

  it("a plan import whose mode or lock orders do not fit: 400 invalid-plan naming them (the check endpoint still judges it)", async () => {
    const p = validPlanInput();
    p.chains[0]!.mode = BIG;
    p.lasers[1]!.lock.orders = 1e12;
    const r = await call(t.owner, "POST", `${M()}/plan`, p);
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-plan");
    expect(paths(r).sort()).toEqual(["chains[0].mode", "lasers[1].lock.orders"]);
    expect((await call(t.owner, "POST", "/api/v1/check", p)).status).toBe(200);
  });
});

describe("bodies that are not UTF-8", () => {
  it("are refused with 400 invalid-encoding, never stored with U+FFFD in place", async () => {
    const before = (await call(t.owner, "GET", "/api/v1/missions")).body.missions.length;
    const body = Buffer.concat([Buffer.from('{"name":"caf'), Buffer.from([0xe9]), Buffer.from('"}')]); // Latin-1 é
    const res = await t.owner.fetch("/api/v1/missions", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body,
    });
    expect(res.status).toBe(400);
    expect((await res.json()).error.code).toBe("invalid-encoding");
    const auth = await fetch(`${BASE_URL}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: BASE_URL },
      body: Buffer.concat([Buffer.from('{"email":"a@b.c","password":"'), Buffer.from([0xff, 0xfe]), Buffer.from('"}')]),
    });
    expect(auth.status).toBe(400);
    expect((await call(t.owner, "GET", "/api/v1/missions")).body.missions.length).toBe(before);
  });

  it("a JSON escape of a lone surrogate is refused as text that is not Unicode", async () => {
    const res = await t.owner.fetch("/api/v1/missions", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: '{"name":"x\\ud800y"}',
    });
    expect(res.status).toBe(400);
    expect((await res.json()).error.issues[0]).toMatchObject({
      path: "name",
      message: expect.stringContaining("surrogate"),
    });
  });
});

describe("the forms refuse control characters beside the field", () => {
  it("sign-up name and team name", async () => {
    const page = async (path: string, c: TestClient, fields: Record<string, string>) => {
      const html = await (await c.fetch(path)).text();
      const form = new FormData();
      for (const m of html.matchAll(/<input type="hidden" name="(\$ACTION[^"]*)"(?: value="([^"]*)")?\/>/g))
        form.append(m[1]!, (m[2] ?? "").replace(/&quot;/g, '"').replace(/&amp;/g, "&"));
      for (const [k, v] of Object.entries(fields)) form.append(k, v);
      const res = await c.fetch(path, { method: "POST", body: form });
      return { status: res.status, html: await res.text() };
    };
    const signUp = await page("/sign-up", new TestClient(), {
      name: `Ada${NUL}`,
      email: uniqueEmail("f"),
      password: "correct-horse-battery-9",
    });
    expect(signUp.status).toBe(200);
    expect(signUp.html).toContain("must not contain control characters");
    const team = await page("/teams/new", t.viewer, { name: `Team${NUL}x` });
    expect(team.status).toBe(200);
    expect(team.html).toContain("must not contain control characters");
  });
});
