/**
 * Rate limits held in PostgreSQL, shared by several app processes. Needs app
 * processes started with HETEROLANE_AUTH_RATE_LIMIT=on (the normal test stack
 * runs with it off), given as HETEROLANE_RATE_LIMIT_URLS=http://a,http://b;
 * skipped otherwise. Each run uses its own client address (x-forwarded-for)
 * so runs do not share a bucket; HETEROLANE_RATE_LIMIT_ORIGIN is their
 * BETTER_AUTH_URL when it differs from the first address.
 */
import { randomInt } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { closeTestPool, testPool, uniqueEmail } from "../setup/auth-helpers";

const urls = (process.env.HETEROLANE_RATE_LIMIT_URLS ?? "").split(",").filter(Boolean);
// The processes' BETTER_AUTH_URL (better-auth accepts requests from that origin only).
const origin = process.env.HETEROLANE_RATE_LIMIT_ORIGIN ?? urls[0] ?? "";
const ip = `198.51.100.${randomInt(1, 255)}`; // documentation range (RFC 5737)

afterAll(async () => {
  await closeTestPool();
});

async function formPost(base: string, path: string, fields: Record<string, string>, addr: string) {
  const page = await fetch(`${base}${path}`, { headers: { "x-forwarded-for": addr } });
  const html = await page.text();
  const form = new FormData();
  for (const m of html.matchAll(/<input type="hidden" name="(\$ACTION[^"]*)"(?: value="([^"]*)")?\/>/g))
    form.append(m[1]!, (m[2] ?? "").replace(/&quot;/g, '"').replace(/&amp;/g, "&"));
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  const res = await fetch(`${base}${path}`, {
    method: "POST",
    body: form,
    redirect: "manual",
    headers: { "x-forwarded-for": addr },
  });
  return res.text();
}

describe.skipIf(urls.length < 2)("rate limits shared across app processes", () => {
  it("better-auth's sign-in endpoint: 10 per minute per address, counted across processes", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 12; i++) {
      const res = await fetch(`${urls[i % urls.length]}/api/auth/sign-in/email`, {
        method: "POST",
        headers: { "content-type": "application/json", origin, "x-forwarded-for": ip },
        body: JSON.stringify({ email: uniqueEmail("rl"), password: "0123456789abc" }),
      });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(10)).toEqual([429, 429]);
    const { rows } = await testPool().query(`select count from rate_limit where key like $1`, [`${ip}%sign-in%`]);
    expect(rows[0]?.count).toBeGreaterThanOrEqual(10);
  });

  it("the sign-in form's server action: refused after 10 attempts from one address, across processes", async () => {
    const addr = `203.0.113.${randomInt(1, 255)}`; // documentation range (RFC 5737)
    const pages: string[] = [];
    for (let i = 0; i < 11; i++)
      pages.push(
        await formPost(
          urls[i % urls.length]!,
          "/sign-in",
          { email: uniqueEmail("rlf"), password: "0123456789abc" },
          addr,
        ),
      );
    expect(pages.slice(0, 10).every((h) => h.includes("E-mail address or password is wrong."))).toBe(true);
    expect(pages[10]).toContain("Too many attempts from this address");
  });
});
