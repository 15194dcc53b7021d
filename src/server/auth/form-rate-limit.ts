import "server-only";
import { createHash } from "node:crypto";
import { sql } from "drizzle-orm";
import { db } from "@db/client";
import { clientAddress } from "@/server/core/client-address";
import { serverEnv } from "@/server/env";

/**
 * Heterolane's own rate limits, beside better-auth's (which count requests
 * to its HTTP handler per client address and path):
 *
 * - the auth forms' server actions, per client address and form (server
 *   actions call `auth.api` directly, which skips better-auth's check);
 * - sign-in per account, whichever way it comes (the form, or the HTTP API
 *   through app/api/auth/[...all]), so that guesses from many addresses
 *   against one account are limited too (OWASP Authentication Cheat Sheet,
 *   "Protect against automated attacks": limit per account as well as per
 *   source).
 *
 * The client address is the one the server core decided from the socket and
 * the trusted-proxy setting (src/server/core/client-address.ts), never a
 * header the client chose. Counters live in PostgreSQL (`attempt_limits`),
 * one fixed window per key, so the limits hold across app processes. Off
 * when HETEROLANE_AUTH_RATE_LIMIT=off (tests of other things).
 */
export const FORM_LIMITS = {
  "sign-in": { windowSec: 60, max: 10 },
  "sign-up": { windowSec: 60, max: 10 },
  "forgot-password": { windowSec: 60, max: 5 },
  "reset-password": { windowSec: 60, max: 10 },
  "resend-verification": { windowSec: 60, max: 5 },
} as const;
export type LimitedForm = keyof typeof FORM_LIMITS;

/** Sign-in attempts per account, from any address and any way: 10 per 15 minutes. */
export const ACCOUNT_SIGN_IN_LIMIT = { windowSec: 15 * 60, max: 10 } as const;

export { clientAddress };

/**
 * Counts one attempt under `key` in a fixed window; returns the seconds to
 * wait when over the limit, or 0 when allowed. One statement, so concurrent
 * attempts (from any process) are counted exactly.
 */
export async function consumeAttempt(key: string, limit: { windowSec: number; max: number }): Promise<number> {
  if (serverEnv().HETEROLANE_AUTH_RATE_LIMIT === "off") return 0;
  const now = Date.now();
  const windowMs = limit.windowSec * 1000;
  const result = await db.execute<{ count: number; window_start: string }>(sql`
    insert into attempt_limits (key, count, window_start)
    values (${key}, 1, ${now})
    on conflict (key) do update set
      count = case when attempt_limits.window_start <= ${now - windowMs} then 1 else attempt_limits.count + 1 end,
      window_start = case when attempt_limits.window_start <= ${now - windowMs} then ${now} else attempt_limits.window_start end
    returning count, window_start`);
  const row = result.rows[0];
  if (!row || row.count <= limit.max) return 0;
  return Math.max(1, Math.ceil((Number(row.window_start) + windowMs - now) / 1000));
}

/** Counts one attempt of an auth form from this client address. */
export async function consumeFormAttempt(form: LimitedForm, h: Headers): Promise<number> {
  return consumeAttempt(`form:${form}:${clientAddress(h)}`, FORM_LIMITS[form]);
}

/** Counts one sign-in attempt against an account (by its address, hashed: the table holds no e-mail addresses). */
export async function consumeAccountSignIn(email: string): Promise<number> {
  const id = createHash("sha256").update(email.trim().toLowerCase()).digest("hex").slice(0, 32);
  return consumeAttempt(`account:sign-in:${id}`, ACCOUNT_SIGN_IN_LIMIT);
}
