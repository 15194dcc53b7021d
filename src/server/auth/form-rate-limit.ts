import "server-only";
import { randomBytes } from "node:crypto";
import { sql } from "drizzle-orm";
import { db } from "@db/client";
import { serverEnv } from "@/server/env";

/**
 * Rate limit for the auth forms' server actions. better-auth limits requests
 * that reach its HTTP handler, but server actions call `auth.api` directly,
 * which skips that check; this applies the same kind of fixed-window limit,
 * in the same `rate_limit` table (so it holds across app processes), keyed by
 * client address and form. Off when HETEROLANE_AUTH_RATE_LIMIT=off.
 */
export const FORM_LIMITS = {
  "sign-in": { windowSec: 60, max: 10 },
  "sign-up": { windowSec: 60, max: 10 },
  "forgot-password": { windowSec: 60, max: 5 },
  "reset-password": { windowSec: 60, max: 10 },
  "resend-verification": { windowSec: 60, max: 5 },
} as const;
export type LimitedForm = keyof typeof FORM_LIMITS;

/** The client address as the app server sees it (first x-forwarded-for entry), or "unknown". */
export function clientAddress(h: Headers): string {
  const fwd = h.get("x-forwarded-for")?.split(",")[0]?.trim();
  return fwd || h.get("x-real-ip")?.trim() || "unknown";
}

/** Counts one attempt; returns the seconds to wait when over the limit, or 0 when allowed. */
export async function consumeFormAttempt(form: LimitedForm, h: Headers): Promise<number> {
  if (serverEnv().HETEROLANE_AUTH_RATE_LIMIT === "off") return 0;
  const { windowSec, max } = FORM_LIMITS[form];
  const now = Date.now();
  const windowMs = windowSec * 1000;
  const key = `form:${form}:${clientAddress(h)}`;
  const result = await db.execute<{ count: number; last_request: string }>(sql`
    insert into rate_limit (id, key, count, last_request)
    values (${randomBytes(12).toString("base64url")}, ${key}, 1, ${now})
    on conflict (key) do update set
      count = case when rate_limit.last_request < ${now - windowMs} then 1 else rate_limit.count + 1 end,
      last_request = case when rate_limit.last_request < ${now - windowMs} then ${now} else rate_limit.last_request end
    returning count, last_request`);
  const row = result.rows[0];
  if (!row || row.count <= max) return 0;
  return Math.max(1, Math.ceil((Number(row.last_request) + windowMs - now) / 1000));
}
