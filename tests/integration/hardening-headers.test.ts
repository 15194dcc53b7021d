/**
 * Issue 17, point 8: the security headers on every kind of answer — every
 * page of the app (read from the page files, so a new page is covered the
 * day it is added), the not-found page, redirects, API JSON and CSV
 * answers and errors: a Content-Security-Policy whose script nonce is the
 * one on the page's scripts (no 'unsafe-inline' for scripts),
 * frame-ancestors 'none' and X-Frame-Options, Referrer-Policy, nosniff;
 * HSTS only when served over https.
 */
import { readdirSync, statSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, closeTestPool, makeTeamWithRoles, type TeamWithRoles } from "../setup/auth-helpers";
import { missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

let t: TeamWithRoles;
let missionId = "";

beforeAll(async () => {
  t = await makeTeamWithRoles();
  missionId = await missionWithPlan(t.owner, validPlanInput());
}, 240_000);
afterAll(closeTestPool);

/** Every page of the app as a URL pattern: app/(group)/a/[b]/page.tsx → /a/[b]. */
function pagePatterns(): string[] {
  const root = join(__dirname, "../../app");
  const walk = (dir: string): string[] =>
    readdirSync(dir).flatMap((n) => {
      const p = join(dir, n);
      return statSync(p).isDirectory() ? walk(p) : n === "page.tsx" ? [p] : [];
    });
  return walk(root)
    .map(
      (f) =>
        "/" +
        relative(root, f)
          .split(sep)
          .slice(0, -1)
          .filter((s) => !/^\(.*\)$/.test(s))
          .join("/"),
    )
    .sort();
}

const pageUrl = (pattern: string) =>
  pattern.replace("[missionId]", missionId).replace("[id]", "no-such-invitation") +
  (pattern.endsWith("/compare") ? "?from=1&to=2" : "");

function expectCommon(h: Headers, what: string) {
  expect([what, h.get("x-frame-options")]).toEqual([what, "DENY"]);
  expect([what, h.get("referrer-policy")]).toEqual([what, "strict-origin-when-cross-origin"]);
  expect([what, h.get("x-content-type-options")]).toEqual([what, "nosniff"]);
  expect([what, h.get("strict-transport-security")]).toEqual([what, null]);
}

/** The page CSP's nonce; checks the policy's rules. */
function pageNonce(h: Headers, what: string): string {
  const csp = h.get("content-security-policy") ?? "";
  const script =
    csp
      .split(";")
      .map((d) => d.trim())
      .find((d) => d.startsWith("script-src")) ?? "";
  expect([what, script]).toEqual([
    what,
    expect.stringMatching(/^script-src 'self' 'nonce-[A-Za-z0-9+/=]{20,}' 'strict-dynamic'$/),
  ]);
  expect(script).not.toContain("unsafe-inline");
  expect(csp).toContain("frame-ancestors 'none'");
  expect(csp).toContain("object-src 'none'");
  return script.match(/'nonce-([^']+)'/)![1]!;
}

describe("every page", () => {
  it("the list of pages is read from the app (a sanity check)", () => {
    const pages = pagePatterns();
    expect(pages).toContain("/");
    expect(pages).toContain("/missions/[missionId]/lanes");
    expect(pages).toContain("/dev/mail");
    expect(pages.length).toBeGreaterThanOrEqual(20);
  });

  it("carries the headers, and every script on it carries the CSP's nonce", async () => {
    const seenNonces = new Set<string>();
    for (const pattern of pagePatterns()) {
      const res = await t.owner.fetch(pageUrl(pattern));
      const what = `${pattern} (${res.status})`;
      expect([what, res.status < 500]).toEqual([what, true]);
      expectCommon(res.headers, what);
      const nonce = pageNonce(res.headers, what);
      seenNonces.add(nonce);
      const html = await res.text();
      const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
      if (res.status === 200) expect([what, scripts.length > 0]).toEqual([what, true]);
      for (const s of scripts) expect([what, s]).toEqual([what, expect.stringContaining(`nonce="${nonce}"`)]);
    }
    // A fresh nonce per answer.
    expect(seenNonces.size).toBe(pagePatterns().length);
  }, 120_000);

  it("the not-found page, a signed-out redirect and a cross-site refusal carry them too", async () => {
    const missing = await t.owner.fetch("/no-such-page");
    expect(missing.status).toBe(404);
    expectCommon(missing.headers, "404");
    const nonce = pageNonce(missing.headers, "404");
    for (const s of (await missing.text()).match(/<script\b[^>]*>/g) ?? []) expect(s).toContain(`nonce="${nonce}"`);
    const redirect = await fetch(`${BASE_URL}/missions`, { redirect: "manual" });
    expect([302, 303, 307]).toContain(redirect.status);
    expectCommon(redirect.headers, "redirect");
    const refused = await fetch(`${BASE_URL}/team`, {
      method: "POST",
      headers: { origin: "http://evil.example" },
      body: "x",
    });
    expect(refused.status).toBe(403);
    expectCommon(refused.headers, "403");
  });
});

describe("API answers", () => {
  it.each([
    ["JSON", "/api/v1/missions", 200],
    ["CSV", () => `/api/v1/missions/${missionId}/channels.csv`, 200],
    ["an error", "/api/v1/missions/00000000-0000-4000-8000-000000000000", 404],
    ["the health probe", "/api/health", 200],
    ["the auth API", "/api/auth/get-session", 200],
  ] as const)("%s", async (what, path, status) => {
    const res = await t.owner.fetch(typeof path === "function" ? path() : path);
    expect(res.status).toBe(status);
    expectCommon(res.headers, what);
    expect(res.headers.get("content-security-policy")).toBe("default-src 'none'; frame-ancestors 'none'");
  });

  it("a signed-out API answer too", async () => {
    const res = await fetch(`${BASE_URL}/api/v1/missions`);
    expect(res.status).toBe(401);
    expectCommon(res.headers, "401");
  });
});

describe("HSTS over https", () => {
  it("is sent on pages and API answers when the proxy in front says the request came over https", async () => {
    for (const path of ["/sign-in", "/api/health", `/missions/${missionId}`]) {
      const res = await t.owner.fetch(path, { headers: { "x-forwarded-proto": "https" } });
      expect([path, res.headers.get("strict-transport-security")]).toEqual([
        path,
        "max-age=31536000; includeSubDomains",
      ]);
    }
  });
});
