/**
 * The route guard's input parsing over HTTP: query parameters and JSON
 * bodies are parsed with zod before the handler runs, and a 400 names every
 * rejected parameter or field; the caller's access is checked first (401 /
 * 403 before any 400). Also: the development routes are served in this
 * (test) build, which sets the switch.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestPool, makeTeamWithRoles, TestClient, type TeamWithRoles } from "../setup/auth-helpers";
import { call, callRaw, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

let t: TeamWithRoles;
let missionId = "";
const signedOut = new TestClient();

beforeAll(async () => {
  t = await makeTeamWithRoles();
  missionId = await missionWithPlan(t.owner, validPlanInput());
}, 240_000);
afterAll(closeTestPool);

const M = () => `/api/v1/missions/${missionId}`;
const paths = (body: { error: { issues?: { path: string }[] } }) => (body.error.issues ?? []).map((i) => i.path);

describe("query parameters are parsed with zod; a 400 names every bad parameter", () => {
  const CASES: { name: string; path: () => string; method?: string; issues: string[]; message?: RegExp }[] = [
    {
      name: "comment filter",
      path: () => `${M()}/review/comments?revision=zero&finding=not-an-id`,
      issues: ["revision", "finding"],
      message: /comment filter is not valid/,
    },
    {
      name: "findings filter (an empty parameter counts as absent)",
      path: () => `${M()}/findings?severity=fatal&chain=`,
      issues: ["severity"],
    },
    { name: "revision comparison", path: () => `${M()}/compare?from=first`, issues: ["from", "to"] },
    { name: "audit filter", path: () => "/api/v1/audit.csv?from=2026-13-45&mission=nope", issues: ["mission", "from"] },
    { name: "mission delete version", method: "DELETE", path: () => `${M()}?version=abc`, issues: ["version"] },
    {
      name: "entity delete version",
      method: "DELETE",
      path: () => `${M()}/lasers/00000000-0000-4000-8000-000000000000`,
      issues: ["version"],
    },
    {
      name: "tuning-map upload",
      method: "POST",
      path: () => `${M()}/uploads/tuning-map?gapMHz=wide`,
      issues: ["laserId", "gapMHz"],
    },
  ];
  it.each(CASES)("$name", async (c) => {
    const r = await call(t.owner, c.method ?? "GET", c.path());
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe("invalid-input");
    expect(paths(r.body).sort()).toEqual([...c.issues].sort());
    if (c.message) expect(r.body.error.message).toMatch(c.message);
  });

  it("checks access before parsing: signed out 401, a role that may not act 403", async () => {
    expect((await call(signedOut, "GET", `${M()}/findings?severity=fatal`)).status).toBe(401);
    expect((await call(t.viewer, "DELETE", `${M()}?version=abc`)).status).toBe(403);
    expect((await call(t.viewer, "POST", `${M()}/uploads/tuning-map?gapMHz=wide`)).status).toBe(403);
  });
});

describe("JSON bodies are parsed with zod before the handler runs", () => {
  it("names every bad field, answers malformed JSON with invalid-json, and checks access first", async () => {
    const bad = await call(t.owner, "POST", "/api/v1/missions", { name: "", extra: 1 });
    expect(bad.status).toBe(400);
    expect(paths(bad.body).sort()).toEqual(["", "name"]);
    const malformed = await callRaw(t.owner, "POST", "/api/v1/missions", '{"name": ');
    expect([malformed.status, malformed.body.error.code]).toEqual([400, "invalid-json"]);
    expect((await call(t.viewer, "POST", "/api/v1/missions", { name: "" })).status).toBe(403);
  });

  it("the team routes parse their bodies through the guard as well", async () => {
    const team = (await call(t.owner, "GET", "/api/team")).body;
    const viewer = team.members.find((m: { email: string }) => m.email === t.viewer.email);
    const role = await call(t.owner, "PATCH", `/api/team/members/${viewer.id}`, { role: "admiral" });
    expect([role.status, paths(role.body)]).toEqual([400, ["role"]]);
    const invite = await call(t.lead, "POST", "/api/team/invitations", { role: "viewer" });
    expect([invite.status, paths(invite.body)]).toEqual([400, ["email"]]);
    expect((await call(t.engineer, "PATCH", `/api/team/members/${viewer.id}`, { role: "admiral" })).status).toBe(403);
  });
});

describe("development routes", () => {
  it("are served in this build (the switch is on in tests), at their usual URLs", async () => {
    const mail = await signedOut.fetch("/dev/mail");
    expect(mail.status).toBe(200);
    expect(await mail.text()).toContain("Captured e-mail");
    const lab = await signedOut.fetch("/lab/lane-view?plan=demo8");
    expect(lab.status).toBe(200);
    expect(await lab.text()).toContain("Lane view lab");
  });
});
