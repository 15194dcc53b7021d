import { beforeEach, describe, expect, it, vi } from "vitest";

// The route guard's caller reading, with its collaborators replaced: the
// session read (better-auth), the member query and the token check. What is
// tested is which path a request takes and what it is refused with; the real
// token check runs in tests/integration/api-tokens*.test.ts.
const api = vi.hoisted(() => ({ getSession: vi.fn() }));
const queries = vi.hoisted(() => ({ memberRole: vi.fn() }));
const tokens = vi.hoisted(() => ({ readTokenCaller: vi.fn() }));
vi.mock("./auth", () => ({ auth: { api } }));
vi.mock("./queries", () => queries);
vi.mock("next/headers", () => ({ headers: async () => new Headers() }));
vi.mock("@/server/api-tokens/verify", () => tokens);

const { readActor, readRouteCaller, requireRouteActor, tokenInQuery } = await import("./guard");

const TOKEN = `hl_${"a".repeat(64)}`;
const tokenActor = { userId: "u1", email: "e@example.org", name: "Erin", teamId: "t1", role: "viewer" as const };

beforeEach(() => {
  api.getSession.mockReset();
  queries.memberRole.mockReset();
  tokens.readTokenCaller.mockReset();
  tokens.readTokenCaller.mockResolvedValue({ actor: tokenActor, token: { id: "k1", name: "ci" } });
});

const req = (path: string, headers: Record<string, string> = {}) => new Request(`http://localhost${path}`, { headers });
const statusOf = (p: Promise<unknown>) =>
  p.then(
    () => 200,
    (e: { status: number; code: string; message: string }) => e,
  );

describe("readRouteCaller", () => {
  it("a bearer token on /api/v1 is read by the token check alone: no session read", async () => {
    const read = await readRouteCaller(req("/api/v1/missions", { authorization: `Bearer ${TOKEN}`, cookie: "x=1" }));
    expect(read).toEqual({ session: null, actor: tokenActor, token: { id: "k1", name: "ci" } });
    expect(api.getSession).not.toHaveBeenCalled();
  });

  it("the token's role decides: a viewer token may read but not edit", async () => {
    const h = { authorization: `Bearer ${TOKEN}` };
    await expect(requireRouteActor(req("/api/v1/missions", h), { mission: ["read"] })).resolves.toEqual(tokenActor);
    expect(await statusOf(requireRouteActor(req("/api/v1/missions", h), { plan: ["edit"] }, "edit"))).toMatchObject({
      status: 403,
      code: "forbidden",
    });
  });

  it("without an Authorization header it is the session, as before", async () => {
    api.getSession.mockResolvedValue(null);
    expect(await statusOf(requireRouteActor(req("/api/v1/missions")))).toMatchObject({ status: 401 });
    expect(api.getSession).toHaveBeenCalledTimes(1);
    expect(tokens.readTokenCaller).not.toHaveBeenCalled();
  });

  it("a token outside /api/v1 is refused with 401, before any check", async () => {
    for (const path of ["/api/team", "/api/account/tokens", "/api/v1x"]) {
      const e = await statusOf(readRouteCaller(req(path, { authorization: `Bearer ${TOKEN}` })));
      expect(e).toMatchObject({ status: 401, code: "token-not-accepted" });
    }
    expect(tokens.readTokenCaller).not.toHaveBeenCalled();
  });

  it("a token in the query string is refused with 401, with or without a session, and never echoed", async () => {
    api.getSession.mockResolvedValue({ user: { id: "u1" }, session: { activeOrganizationId: "t1" } });
    for (const q of [
      `?access_token=${TOKEN}`,
      `?token=x`,
      `?api_key=x`,
      `?severity=${TOKEN}`,
      `?a=1&Bearer=${TOKEN}`,
    ]) {
      const e = (await statusOf(readRouteCaller(req(`/api/v1/missions${q}`)))) as { status: number; message: string };
      expect(e).toMatchObject({ status: 401, code: "token-in-url" });
      expect(e.message).not.toContain(TOKEN);
    }
    expect(api.getSession).not.toHaveBeenCalled();
  });

  it("pages and server actions (readActor) never look at the Authorization header", async () => {
    api.getSession.mockResolvedValue(null);
    const read = await readActor(new Headers({ authorization: `Bearer ${TOKEN}` }));
    expect(read).toEqual({ session: null, actor: null });
    expect(tokens.readTokenCaller).not.toHaveBeenCalled();
  });
});

describe("tokenInQuery", () => {
  it("known answers", () => {
    expect(tokenInQuery(new URLSearchParams("severity=error&chain=A"))).toBe(false);
    expect(tokenInQuery(new URLSearchParams("version=3"))).toBe(false);
    expect(tokenInQuery(new URLSearchParams("ACCESS_TOKEN=1"))).toBe(true);
    expect(tokenInQuery(new URLSearchParams(`code=${TOKEN}`))).toBe(true);
  });
});
