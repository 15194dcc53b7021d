/**
 * Personal API tokens over HTTP against the running app and the real
 * PostgreSQL: making them (role no higher than the creator's), the refusals
 * (missing, malformed, expired, revoked → 401; a token in the URL; a token
 * outside /api/v1; server actions and pages stay session-only), the per-token
 * rate limit, the creator's current role as a cap, the audit rows (made, used
 * from a new address, revoked), and that no answer or log line holds a token.
 */
import { existsSync, readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeTestPool, makeTeamWithRoles, TestClient, testPool, type TeamWithRoles } from "../setup/auth-helpers";
import { call, missionWithPlan, type Reply } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";
import { makeToken, OpenApiChecker, TokenClient } from "./support/tokens";

let team: TeamWithRoles;
let missionId = "";
const answers: string[] = [];

/** Every answer body, kept to check that none holds a token. */
async function seen(r: Promise<Reply>) {
  const x = await r;
  answers.push(x.text);
  return x;
}

async function auditRows(action: string, entityLike: string) {
  const { rows } = await testPool().query<{ action: string; summary: string; actor_name: string }>(
    `select action, summary, actor_name from activity where team_id = $1 and action = $2 and entity like $3 order by at`,
    [team.teamId, action, entityLike],
  );
  return rows;
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.owner, validPlanInput());
}, 240_000);
afterAll(closeTestPool);
vi.setConfig({ testTimeout: 120_000 });

describe("making tokens", () => {
  it("answers the secret once (hl_ and 64 letters); the list shows only its first characters", async () => {
    const r = await call(team.engineer, "POST", "/api/account/tokens", {
      name: "ci pull",
      teamId: team.teamId,
      role: "viewer",
    });
    expect(r.status).toBe(201);
    expect(r.body.token).toMatch(/^hl_[A-Za-z]{64}$/);
    expect(r.body.summary).toMatchObject({
      name: "ci pull",
      role: "viewer",
      teamId: team.teamId,
      requestsPerMinute: 120,
    });
    const list = await call(team.engineer, "GET", "/api/account/tokens");
    const mine = list.body.tokens.find((t: { id: string }) => t.id === r.body.summary.id);
    expect(mine.start).toBe(r.body.token.slice(0, 8));
    expect(list.text).not.toContain(r.body.token);
    // stored hashed: the table holds neither the token nor its random part
    const { rows } = await testPool().query<{ key: string }>("select key from apikey where id = $1", [mine.id]);
    expect(rows[0]!.key).not.toContain(r.body.token.slice(3));
    expect(rows[0]!.key).toMatch(/^[A-Za-z0-9_-]{43}$/); // SHA-256, base64url without padding
  });

  it("a role above the creator's own is 403; a team the creator is not in is 400 naming teamId; bad fields are 400 naming each", async () => {
    const high = await call(team.engineer, "POST", "/api/account/tokens", {
      name: "x",
      teamId: team.teamId,
      role: "lead",
    });
    expect({ status: high.status, code: high.body.error.code }).toEqual({ status: 403, code: "forbidden" });
    const other = await call(team.engineer, "POST", "/api/account/tokens", {
      name: "x",
      teamId: "no-such-team",
      role: "viewer",
    });
    expect(other.status).toBe(400);
    expect(other.body.error.issues).toEqual([{ path: "teamId", message: "You are not a member of this team." }]);
    const bad = await call(team.owner, "POST", "/api/account/tokens", {
      name: "",
      teamId: team.teamId,
      role: "admin",
      expiresInDays: 400,
      requestsPerMinute: 0,
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(
      ["expiresInDays", "name", "requestsPerMinute", "role"].sort(),
    );
  });

  it("tokens cannot make, list or revoke tokens (the account routes are session-only)", async () => {
    const { client } = await makeToken(team.owner, { teamId: team.teamId, role: "owner" });
    for (const [method, path] of [
      ["GET", "/api/account/tokens"],
      ["POST", "/api/account/tokens"],
      ["DELETE", "/api/account/tokens/x"],
      ["GET", "/api/team"],
    ] as const) {
      const r = await seen(
        call(client, method, path, method === "POST" ? { name: "x", teamId: team.teamId, role: "viewer" } : undefined),
      );
      expect({ path, status: r.status, code: r.body.error.code }).toEqual({
        path,
        status: 401,
        code: "token-not-accepted",
      });
    }
  });
});

describe("refusals", () => {
  it("missing, malformed, unknown → 401 on /api/v1; the answer never repeats what was sent", async () => {
    const anon = new TestClient();
    expect((await call(anon, "GET", "/api/v1/missions")).status).toBe(401);
    const forged = `hl_${"Q".repeat(64)}`;
    for (const header of ["Bearer", "Basic dXNlcjpwYXNz", `Bearer ${forged}x`, `Bearer ${forged}`, "Bearer hl_short"]) {
      const r = await seen(call(anon, "GET", "/api/v1/missions", undefined, { authorization: header }));
      expect({ header, status: r.status, code: r.body.error.code }).toEqual({
        header,
        status: 401,
        code: "invalid-token",
      });
      expect(r.text).not.toContain("QQQQQQQQ");
    }
  });

  it("a token with a session cookie still acts as the token (the cookie is ignored)", async () => {
    const { token } = await makeToken(team.owner, { teamId: team.teamId, role: "viewer" });
    const r = await call(
      team.owner,
      "POST",
      "/api/v1/missions",
      { name: "cookie and token" },
      { authorization: `Bearer ${token}` },
    );
    expect(r.status).toBe(403);
  });

  it("a token in the query string is refused, even a valid one, even with a session", async () => {
    const { token, client } = await makeToken(team.owner, { teamId: team.teamId, role: "viewer" });
    for (const q of [`access_token=${token}`, `token=${token}`, `severity=${token}`]) {
      const r = await seen(call(team.owner, "GET", `/api/v1/missions/${missionId}/findings?${q}`));
      expect({ q, status: r.status, code: r.body.error.code }).toEqual({ q, status: 401, code: "token-in-url" });
      expect(r.text).not.toContain(token);
    }
    expect((await call(client, "GET", `/api/v1/missions/${missionId}/findings?severity=error`)).status).toBe(200);
  });

  it("revoked → 401, at once; revoking someone else's token is 404", async () => {
    const { id, client } = await makeToken(team.lead, { teamId: team.teamId, role: "lead" });
    expect((await call(client, "GET", "/api/v1/missions")).status).toBe(200);
    expect((await call(team.engineer, "DELETE", `/api/account/tokens/${id}`)).status).toBe(404);
    const revoked = await call(team.lead, "DELETE", `/api/account/tokens/${id}`);
    expect(revoked).toMatchObject({ status: 200, body: { revoked: id } });
    const r = await seen(call(client, "GET", "/api/v1/missions"));
    expect({ status: r.status, code: r.body.error.code }).toEqual({ status: 401, code: "invalid-token" });
    expect((await call(team.lead, "DELETE", `/api/account/tokens/${id}`)).status).toBe(404);
  });

  it("expired → 401 token-expired (the expiry is moved into the past in the database)", async () => {
    const { id, client } = await makeToken(team.engineer, { teamId: team.teamId, role: "engineer", expiresInDays: 1 });
    expect((await call(client, "GET", "/api/v1/missions")).status).toBe(200);
    await testPool().query("update apikey set expires_at = $1 where id = $2", [new Date(Date.now() - 60_000), id]);
    const r = await seen(call(client, "GET", "/api/v1/missions"));
    expect({ status: r.status, code: r.body.error.code }).toEqual({ status: 401, code: "token-expired" });
    const again = await call(client, "GET", "/api/v1/missions");
    expect(again.status).toBe(401);
  });

  it("the creator's current role caps the token: a demoted creator's token loses the higher permissions; one who left, all", async () => {
    const { teamId, owner, lead } = team;
    const { client } = await makeToken(lead, { teamId, role: "lead" });
    const leadMember = (await call(owner, "GET", "/api/team")).body.members.find(
      (m: { email: string }) => m.email === lead.email,
    );
    const create = () => call(client, "POST", "/api/v1/missions", { name: `capped ${Math.random()}` });
    expect((await create()).status).toBe(201);
    expect((await call(owner, "PATCH", `/api/team/members/${leadMember.id}`, { role: "viewer" })).status).toBe(200);
    expect((await create()).status).toBe(403);
    expect((await call(client, "GET", "/api/v1/missions")).status).toBe(200);
    expect((await call(owner, "PATCH", `/api/team/members/${leadMember.id}`, { role: "lead" })).status).toBe(200);
    expect((await create()).status).toBe(201);
    // the lead leaves the team (the last test to need them): the token is dead
    expect((await call(lead, "POST", "/api/team/leave")).status).toBe(200);
    const gone = await seen(call(client, "GET", "/api/v1/missions"));
    expect({ status: gone.status, code: gone.body.error.code }).toEqual({ status: 401, code: "invalid-token" });
  });
});

describe("rate limit per token", () => {
  it("a token of 3 requests a minute answers 429 rate-limited on the 4th, with retryAfterSeconds; another token is unaffected", async () => {
    const slow = await makeToken(team.viewer, { teamId: team.teamId, role: "viewer", requestsPerMinute: 3 });
    const other = await makeToken(team.viewer, { teamId: team.teamId, role: "viewer" });
    const statuses: number[] = [];
    let last: Reply | undefined;
    for (let i = 0; i < 4; i++) {
      last = await seen(call(slow.client, "GET", "/api/v1/missions"));
      statuses.push(last.status);
    }
    expect(statuses).toEqual([200, 200, 200, 429]);
    expect(last!.body.error.code).toBe("rate-limited");
    expect(last!.body.error.retryAfterSeconds).toBeGreaterThanOrEqual(1);
    expect(last!.body.error.retryAfterSeconds).toBeLessThanOrEqual(60);
    expect((await call(other.client, "GET", "/api/v1/missions")).status).toBe(200);
  });
});

describe("audit rows and last use", () => {
  it("made, first use, use from a new address (once per address), revoked — in the token's team", async () => {
    const name = `audited ${Math.random().toString(36).slice(2, 8)}`;
    const { id, token } = await makeToken(team.engineer, { teamId: team.teamId, role: "engineer", name });
    const from = (address: string) => new TokenClient(token, address);
    expect((await call(from("203.0.113.1"), "GET", "/api/v1/missions")).status).toBe(200);
    expect((await call(from("203.0.113.1"), "GET", "/api/v1/missions")).status).toBe(200);
    expect((await call(from("203.0.113.2"), "GET", "/api/v1/missions")).status).toBe(200);
    const list = await call(team.engineer, "GET", "/api/account/tokens");
    expect(list.body.tokens.find((t: { id: string }) => t.id === id).lastUsedAt).not.toBeNull();
    expect((await call(team.engineer, "DELETE", `/api/account/tokens/${id}`)).status).toBe(200);

    const made = await auditRows("token-create", `token ${name}`);
    expect(made).toHaveLength(1);
    expect(made[0]!.summary).toMatch(
      new RegExp(
        `^Made API token "${name}" \\(hl_.{5}…\\) with the role engineer, 120 requests a minute, expiring \\d{4}-\\d\\d-\\d\\d\\.$`,
      ),
    );
    expect(made[0]!.actor_name).toBe(team.engineer.name);
    const used = await auditRows("token-use", `token ${name}`);
    expect(used.map((u) => u.summary)).toEqual([
      `API token "${name}" used for the first time, from 203.0.113.1.`,
      `API token "${name}" used from a new address, 203.0.113.2.`,
    ]);
    const revoked = await auditRows("token-revoke", `token ${name}`);
    expect(revoked).toHaveLength(1);
    // the rows show in the team's audit CSV too
    const csv = await call(team.engineer, "GET", "/api/v1/audit.csv?action=token-use");
    expect(csv.text).toContain(`used from a new address, 203.0.113.2`);
  });
});

describe("tokens never leak", () => {
  it("no answer of these tests, and no line of the app's log, holds a token", async () => {
    expect(TokenClient.made.length).toBeGreaterThan(5);
    expect(answers.length).toBeGreaterThan(10);
    for (const t of TokenClient.made) for (const a of answers) expect(a.includes(t)).toBe(false);
    // The app's log: test-output/app.log under `npm test`, or HETEROLANE_TEST_APP_LOG.
    const log = process.env.HETEROLANE_TEST_APP_LOG ?? "test-output/app.log";
    if (existsSync(log)) {
      const text = readFileSync(log, "utf8");
      for (const t of TokenClient.made) expect(text.includes(t.slice(3))).toBe(false);
    }
  });
});

describe("OpenAPI checker", () => {
  it("refuses an answer that does not match (so the route tests' checks can fail)", async () => {
    const { client } = await makeToken(team.viewer, { teamId: team.teamId, role: "viewer" });
    const checker = new OpenApiChecker((await call(client, "GET", "/api/v1/openapi.json")).body);
    expect(checker.problems("GET", "/api/v1/missions", 200, "application/json", { missions: [{ id: 1 }] })).not.toEqual(
      [],
    );
    expect(checker.problems("GET", "/api/v1/missions", 418, "application/json", {})).toEqual([
      "GET /missions: status 418 is not described",
    ]);
    const real = await call(client, "GET", "/api/v1/missions");
    expect(
      checker.problems("GET", "/api/v1/missions", real.status, real.headers.get("content-type"), real.body),
    ).toEqual([]);
  });
});
