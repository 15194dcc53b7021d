import "server-only";
import type { Issue } from "@/schemas/issues";
import { crossOriginMessage } from "./request-origin";
import { isDatabaseUnreachable } from "./unavailable";

export type { Issue };

/**
 * Response helpers of every route handler: JSON answers and the error body
 * `{ error: { code, message, issues? } }` (issues name each rejected field,
 * query parameter or file row).
 */

/** An error a route handler answers with its status and the JSON error body; `extra` adds fields beside code and message. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues?: Issue[],
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const unauthorized = () => new HttpError(401, "unauthorized", "Sign in to continue.");
export const noTeam = () => new HttpError(403, "no-team", "Choose or create a team first.");
export const forbidden = (what = "do this") =>
  new HttpError(403, "forbidden", `Your role in this team does not allow you to ${what}.`);
export const notFound = (what = "resource") => new HttpError(404, "not-found", `No such ${what}.`);

/** 403 `cross-origin`: a state-changing request another site may have forged (request-origin.ts). */
export const crossOrigin = (reason: string) => new HttpError(403, "cross-origin", crossOriginMessage(reason));

/** Seconds a client should wait before retrying during a database outage. */
export const RETRY_AFTER_SECONDS = 5;

/** 503 `unavailable`: the database cannot be reached (the running transaction rolled back). */
export const unavailable = () =>
  new HttpError(
    503,
    "unavailable",
    "The database cannot be reached right now; nothing was saved. Try again in a few seconds.",
  );

/** 400 `invalid-input` naming every rejected field. */
export function invalidInput(issues: Issue[], message = "Some fields are not valid."): HttpError {
  return new HttpError(400, "invalid-input", message, issues);
}

/** 409 `stale-version`: someone else saved first; the current state comes back in `current`. */
export function staleVersion(current: unknown, what: string): HttpError {
  return new HttpError(
    409,
    "stale-version",
    `Someone else changed this ${what} since you loaded it; nothing was saved. Reload and apply your change again.`,
    undefined,
    { current },
  );
}

/** A JSON answer. */
export const json = (body: unknown, status = 200, headers?: HeadersInit) => Response.json(body, { status, headers });

/** The answer of an HttpError; a 503 tells the client when to retry. */
export function httpErrorResponse(err: HttpError): Response {
  const headers: Record<string, string> = { "cache-control": "no-store" };
  if (err.status === 503) headers["retry-after"] = String(RETRY_AFTER_SECONDS);
  return json(errorBody(err), err.status, headers);
}

/** The JSON error body of an HttpError. */
export function errorBody(err: HttpError) {
  return {
    error: {
      code: err.code,
      message: err.message,
      ...(err.issues ? { issues: err.issues } : {}),
      ...(err.extra ?? {}),
    },
  };
}

/**
 * Maps any thrown value to a JSON answer: an HttpError to its status and
 * body, a database outage to 503 with Retry-After (unavailable.ts),
 * anything else to a logged 500.
 */
export function errorResponse(err: unknown): Response {
  if (err instanceof HttpError) return httpErrorResponse(err);
  if (isDatabaseUnreachable(err)) {
    console.error("[api] database unreachable:", (err as Error)?.message ?? err);
    return httpErrorResponse(unavailable());
  }
  console.error("[api] unexpected error:", err);
  return json({ error: { code: "internal", message: "Something went wrong on the server." } }, 500);
}
