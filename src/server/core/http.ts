import "server-only";
import type { Issue } from "@/schemas/issues";

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

/** Maps any thrown value to a JSON answer; unexpected errors become a logged 500. */
export function errorResponse(err: unknown): Response {
  if (err instanceof HttpError) return json(errorBody(err), err.status);
  console.error("[api] unexpected error:", err);
  return json({ error: { code: "internal", message: "Something went wrong on the server." } }, 500);
}

/** Reads a JSON body with a size limit; answers 413 above it and 400 `invalid-json` for malformed JSON. */
export async function readJsonBody(request: Request, limitBytes = 1_000_000): Promise<unknown> {
  const tooLarge = () => new HttpError(413, "too-large", `The body is larger than ${limitBytes} bytes.`);
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > limitBytes) throw tooLarge();
  const text = await request.text();
  if (Buffer.byteLength(text, "utf8") > limitBytes) throw tooLarge();
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new HttpError(400, "invalid-json", `The body is not valid JSON: ${(e as Error).message}`, [
      { path: "", message: "not valid JSON" },
    ]);
  }
}
