import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import { parsePlan } from "@/schemas/plan";
import {
  closeTestPool,
  makeTeamWithRoles,
  newVerifiedUser,
  TestClient,
  type TeamWithRoles,
} from "../setup/auth-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

// POST /api/v1/check against the running app (HETEROLANE_TEST_URL) with real
// sign-up, e-mail verification (captured_mail) and sessions.
const PATH = "/api/v1/check";

type Doc = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

async function postRaw(c: TestClient, body: string) {
  const res = await c.fetch(PATH, { method: "POST", body, headers: { "content-type": "application/json" } });
  const text = await res.text();
  return { status: res.status, body: JSON.parse(text) as Doc };
}

describe("POST /api/v1/check", () => {
  let team: TeamWithRoles;

  beforeAll(async () => {
    team = await makeTeamWithRoles();
  });
  afterAll(async () => {
    await closeTestPool();
  });

  it("401 when signed out, and the plan is not looked at", async () => {
    const anonymous = new TestClient();
    const r = await anonymous.postJson(PATH, validPlanInput());
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe("unauthorized");
    const bad = await anonymous.postJson(PATH, { nonsense: true });
    expect(bad.status).toBe(401);
  });

  it("403 for a signed-in person who has no team yet (the actor guard needs an active team)", async () => {
    const loner = await newVerifiedUser("loner");
    const r = await loner.postJson(PATH, validPlanInput());
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe("no-team");
  });

  it("200 with the result document, equal to checkPlan of the same plan, for every role", async () => {
    const doc = validPlanInput();
    const parsed = parsePlan(doc);
    if (!parsed.ok) throw new Error("the fixture plan must be valid");
    const expected = JSON.parse(JSON.stringify(checkPlan(parsed.plan)));
    for (const person of [team.owner, team.lead, team.engineer, team.viewer]) {
      const r = await person.postJson(PATH, doc);
      expect(r.status).toBe(200);
      expect(r.body).toEqual(expected);
    }
    expect(expected.format).toBe("heterolane.result/2");
  });

  it("200 also for a valid plan full of error findings (findings are not input errors)", async () => {
    const doc = validPlanInput() as Doc;
    doc.chains[0].loOffsetGHz = 183.31; // the LO inside the wanted band
    doc.detectors[0].maxInputMW = 0.01; // photodiode overload
    const r = await team.engineer.postJson(PATH, doc);
    expect(r.status).toBe(200);
    const codes = (r.body.findings as { code: string; severity: string }[])
      .filter((f) => f.severity === "error")
      .map((f) => f.code);
    expect(codes).toContain("pd-overload");
    expect(codes).toContain("lo-in-band");
  });

  it("400 invalid-plan with every issue and its path", async () => {
    const doc = validPlanInput() as Doc;
    doc.channels[2].bandwidthMHz = 0;
    doc.lasers[0].reach[0] = { minGHz: 200, maxGHz: 150 };
    doc.chains[0].laser = "LP9";
    doc.surprise = 1;
    const r = await team.viewer.postJson(PATH, doc);
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-plan");
    expect(r.body.error.message).toMatch(/not valid: 4 problems/);
    expect(r.body.error.issues).toEqual([
      { path: "lasers[0].reach[0].minGHz", message: "must be below maxGHz (150)" },
      { path: "chains[0].laser", message: 'refers to laser "LP9", which does not exist' },
      { path: "channels[2].bandwidthMHz", message: "must be greater than 0" },
      { path: "surprise", message: "unknown key" },
    ]);
    const direct = parsePlan(doc);
    expect(direct.ok ? [] : direct.issues).toEqual(r.body.error.issues);
  });

  it("400 invalid-plan for malformed JSON, with the position", async () => {
    const r = await postRaw(team.owner, '{"format": "heterolane.plan/1", "name": }');
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-plan");
    expect(r.body.error.issues).toEqual([{ path: "", message: 'not valid JSON: unexpected "}" at line 1, column 41' }]);
  });

  it("400 for an overflowing number literal (1e999 is not a finite number)", async () => {
    const text = JSON.stringify(validPlanInput()).replace('"loadedQ":10000000', '"loadedQ":1e999');
    expect(text).toContain("1e999");
    const r = await postRaw(team.owner, text);
    expect(r.status).toBe(400);
    expect(r.body.error.issues).toEqual([{ path: "resonators[0].loadedQ", message: "must be a finite number" }]);
  });

  it("413 above 1 MB", async () => {
    const doc = validPlanInput() as Doc;
    doc.name = `Demo data ${"x".repeat(1_000_001)}`;
    const r = await postRaw(team.owner, JSON.stringify(doc));
    expect(r.status).toBe(413);
    expect(r.body.error.code).toBe("too-large");
  });

  it("a body just under 1 MB is read and judged", async () => {
    const doc = validPlanInput() as Doc;
    doc.name = `Demo data ${"x".repeat(990_000)}`;
    const r = await postRaw(team.owner, JSON.stringify(doc));
    expect(r.status).toBe(200);
    expect(r.body.format).toBe("heterolane.result/2");
  });
});
