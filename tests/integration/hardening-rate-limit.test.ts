/**
 * Issue 17, point 4: the sign-in limits cannot be bypassed by writing
 * another X-Forwarded-For, and one client cannot lock everyone out.
 *
 * Needs app processes with rate limiting on (the main test app runs with it
 * off), as src/ops/test-all.sh starts them:
 * - HETEROLANE_RATE_LIMIT_URLS: two processes behind one trusted proxy hop
 *   (HETEROLANE_TRUSTED_PROXY_HOPS=1, so X-Forwarded-For plays the proxy's
 *   entry), their BETTER_AUTH_URL in HETEROLANE_RATE_LIMIT_ORIGIN;
 * - HETEROLANE_RATE_LIMIT_DIRECT_URL: one process without a trusted proxy,
 *   where the client is the socket address.
 * Each test is a client of its own: a fresh loopback address (127.x.y.z all
 * reach this machine) and fresh account names.
 */
import { randomInt } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { closeTestPool, uniqueEmail } from "../setup/auth-helpers";
import { actionFields } from "../setup/page-forms";
import { requestFrom } from "../setup/raw-http";

const proxied = (process.env.HETEROLANE_RATE_LIMIT_URLS ?? "").split(",").filter(Boolean);
const direct = process.env.HETEROLANE_RATE_LIMIT_DIRECT_URL ?? "";
const proxiedOrigin = process.env.HETEROLANE_RATE_LIMIT_ORIGIN ?? proxied[0] ?? "";
const directOrigin = process.env.HETEROLANE_RATE_LIMIT_DIRECT_ORIGIN ?? direct;

afterAll(closeTestPool);

const loopback = () => `127.${randomInt(1, 255)}.${randomInt(1, 255)}.${randomInt(2, 255)}`;
/**
 * A fresh address in the IPv6 documentation prefix (RFC 3849), each in a /64 of its own (better-auth
 * counts IPv6 clients by /64), so that no two tests (nor auth-rate-limit.test.ts, which uses IPv4
 * documentation addresses) share a bucket.
 */
const forged = () => `2001:db8:${randomInt(0x10000).toString(16)}:${randomInt(0x10000).toString(16)}::1`;
const at127 = (url: string) => url.replace("//localhost", "//127.0.0.1");
/** The Host the app is addressed by (Next compares it with a server action's Origin). */
const hostOf = (url: string) => ({ host: new URL(url).host });

/** A wrong-password sign-in through the HTTP API from `from`, claiming `xff`. */
async function apiSignIn(base: string, origin: string, from: string, email: string, xff?: string) {
  const res = await requestFrom(from, `${at127(base)}/api/auth/sign-in/email`, {
    method: "POST",
    headers: {
      ...hostOf(base),
      "content-type": "application/json",
      origin,
      ...(xff ? { "x-forwarded-for": xff } : {}),
    },
    body: JSON.stringify({ email, password: "wrong-password-0123" }),
  });
  return res.status;
}

/** A wrong-password sign-in through the form (server action) from `from`, claiming `xff`; the page's HTML. */
async function formSignIn(base: string, origin: string, from: string, email: string, xff?: string) {
  const extra: Record<string, string> = { ...hostOf(base), ...(xff ? { "x-forwarded-for": xff } : {}) };
  const page = await requestFrom(from, `${at127(base)}/sign-in`, { headers: extra });
  const boundary = `----rl${randomInt(1e9)}`;
  const fields: [string, string][] = [
    ...actionFields(page.text),
    ["email", email],
    ["password", "wrong-password-0123"],
  ];
  const body = fields
    .map(([k, v]) => `--${boundary}\r\nContent-Disposition: form-data; name="${k}"\r\n\r\n${v}\r\n`)
    .join("")
    .concat(`--${boundary}--\r\n`);
  const res = await requestFrom(from, `${at127(base)}/sign-in`, {
    method: "POST",
    headers: { ...extra, ...(origin ? { origin } : {}), "content-type": `multipart/form-data; boundary=${boundary}` },
    body,
  });
  return res.text;
}

const TOO_MANY_ADDRESS = "Too many attempts from this address";
const TOO_MANY_ACCOUNT = "Too many sign-in attempts for this account";

describe.skipIf(!direct)("without a trusted proxy the client is the socket address", () => {
  it("API: 40 wrong passwords, each claiming another X-Forwarded-For and account: 429 after 10", async () => {
    const from = loopback();
    const statuses: number[] = [];
    for (let i = 0; i < 40; i++)
      statuses.push(await apiSignIn(direct, directOrigin, from, uniqueEmail("rl-x"), forged()));
    expect(statuses.slice(0, 10)).toEqual(Array(10).fill(401));
    expect(statuses.slice(10).every((s) => s === 429)).toBe(true);
  });

  it("form: the same, refused after 10 attempts from the address", async () => {
    const from = loopback();
    const pages: string[] = [];
    for (let i = 0; i < 14; i++)
      pages.push(await formSignIn(direct, directOrigin, from, uniqueEmail("rl-f"), forged()));
    expect(pages.slice(0, 10).every((h) => h.includes("E-mail address or password is wrong."))).toBe(true);
    expect(pages.slice(10).every((h) => h.includes(TOO_MANY_ADDRESS))).toBe(true);
  });

  it("the captured-mail page: an X-Forwarded-For the client writes does not make it a client elsewhere, nor one here", async () => {
    const fromHere = await requestFrom("127.0.0.1", `${at127(direct)}/dev/mail`, {
      headers: { ...hostOf(direct), "x-forwarded-for": "203.0.113.50" },
    });
    expect(fromHere.status).toBe(200);
  });

  it("one client at its limit does not lock out another (each address has its own bucket)", async () => {
    const noisy = loopback();
    for (let i = 0; i < 11; i++) await apiSignIn(direct, directOrigin, noisy, uniqueEmail("rl-n"));
    expect(await apiSignIn(direct, directOrigin, noisy, uniqueEmail("rl-n"))).toBe(429);
    expect(await apiSignIn(direct, directOrigin, loopback(), uniqueEmail("rl-q"))).toBe(401);
    expect(await formSignIn(direct, directOrigin, loopback(), uniqueEmail("rl-q"))).toContain(
      "E-mail address or password is wrong.",
    );
  });
});

describe.skipIf(proxied.length < 2)(
  "behind a trusted proxy: per address from the proxy's entry, and per account",
  () => {
    it("API: 40 wrong passwords against one account, each from another address, across two processes: 429 after 10", async () => {
      const email = uniqueEmail("rl-acct");
      const statuses: number[] = [];
      for (let i = 0; i < 40; i++)
        statuses.push(await apiSignIn(proxied[i % 2]!, proxiedOrigin, loopback(), email, forged()));
      expect(statuses.slice(0, 10)).toEqual(Array(10).fill(401));
      expect(statuses.slice(10).every((s) => s === 429)).toBe(true);
    });

    it("form: the same account limit, shared with the API", async () => {
      const email = uniqueEmail("rl-acct-f");
      const first = await apiSignIn(proxied[0]!, proxiedOrigin, loopback(), email, forged());
      expect(first).toBe(401);
      const pages: string[] = [];
      for (let i = 0; i < 11; i++)
        // No Origin: Next compares a server action's Origin with the Host, and the two processes share one public URL.
        pages.push(await formSignIn(proxied[i % 2]!, "", loopback(), email, forged()));
      // One attempt through the API and nine through the form are the account's ten.
      expect(pages.slice(0, 9).every((h) => h.includes("E-mail address or password is wrong."))).toBe(true);
      expect(pages.slice(9).every((h) => h.includes(TOO_MANY_ACCOUNT))).toBe(true);
    });

    it("the captured-mail page: a client the proxy names from elsewhere gets 404, one on this machine the page", async () => {
      const outside = await requestFrom("127.0.0.1", `${at127(proxied[0]!)}/dev/mail`, {
        headers: { "x-forwarded-for": "203.0.113.80" },
      });
      expect(outside.status).toBe(404);
      const inside = await requestFrom("127.0.0.1", `${at127(proxied[0]!)}/dev/mail`, {
        headers: { "x-forwarded-for": "127.0.0.1" },
      });
      expect(inside.status).toBe(200);
    });
  },
);
