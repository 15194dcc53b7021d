import "server-only";

/**
 * The database being unreachable is an outage, not a bug: every route
 * answers 503 `unavailable` with `Retry-After` while it lasts (and the
 * transaction that was running rolled back, so nothing was half saved).
 */

/** Socket-level codes of node-postgres when the server cannot be reached or drops the connection. */
const NETWORK_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EPIPE",
  "ENOTFOUND",
  "EHOSTUNREACH",
  "EAI_AGAIN",
]);

/**
 * SQLSTATE classes and codes of an unavailable server (PostgreSQL manual,
 * Appendix A "PostgreSQL Error Codes"): class 08 connection exception,
 * 57P01 admin_shutdown, 57P02 crash_shutdown, 57P03 cannot_connect_now,
 * 53300 too_many_connections.
 */
const SQLSTATE_CODES = new Set(["57P01", "57P02", "57P03", "53300"]);

/** Messages node-postgres throws without a code when a connection ends or cannot be made in time. */
const MESSAGES = [
  /connection terminated/i,
  /timeout exceeded when trying to connect/i,
  /connection timeout/i,
  /Client has encountered a connection error/i,
  /Connection ended unexpectedly/i,
];

/** True when `err` (or any error it wraps, as drizzle does in `cause`) says the database cannot be reached. */
export function isDatabaseUnreachable(err: unknown): boolean {
  const seen = new Set<unknown>();
  let e: unknown = err;
  while (e && typeof e === "object" && !seen.has(e)) {
    seen.add(e);
    const { code, message, errors } = e as { code?: unknown; message?: unknown; errors?: unknown };
    if (typeof code === "string" && (NETWORK_CODES.has(code) || SQLSTATE_CODES.has(code) || code.startsWith("08")))
      return true;
    if (typeof message === "string" && MESSAGES.some((re) => re.test(message))) return true;
    // AggregateError (a refused connection on both ::1 and 127.0.0.1).
    if (Array.isArray(errors) && errors.some((x) => isDatabaseUnreachable(x))) return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}
