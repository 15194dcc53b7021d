import "server-only";

/** One issue of a rejected request: a JSON path (or form field) and a plain message. */
export interface Issue {
  path: string;
  message: string;
}

/**
 * An error that a route handler answers with a status and the JSON body
 * `{ error: { code, message, issues? } }` (docs/decisions, API errors).
 */
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
export const forbidden = (what = "do this") =>
  new HttpError(403, "forbidden", `Your role in this team does not allow you to ${what}.`);
export const notFound = (what = "resource") => new HttpError(404, "not-found", `No such ${what}.`);

/** Maps any thrown value to a JSON response; unexpected errors become a logged 500. */
export function errorResponse(err: unknown): Response {
  if (err instanceof HttpError) {
    return Response.json(
      {
        error: {
          code: err.code,
          message: err.message,
          ...(err.issues ? { issues: err.issues } : {}),
          ...(err.extra ?? {}),
        },
      },
      { status: err.status },
    );
  }
  console.error("[api] unexpected error:", err);
  return Response.json(
    { error: { code: "internal", message: "Something went wrong on the server." } },
    { status: 500 },
  );
}

/** Reads a JSON body with a size limit; answers 413 above it and 400 for malformed JSON. */
export async function readJsonBody(request: Request, limitBytes = 1_000_000): Promise<unknown> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > limitBytes) throw new HttpError(413, "too-large", `The body is larger than ${limitBytes} bytes.`);
  const text = await request.text();
  if (Buffer.byteLength(text, "utf8") > limitBytes)
    throw new HttpError(413, "too-large", `The body is larger than ${limitBytes} bytes.`);
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new HttpError(400, "invalid-json", `The body is not valid JSON: ${(e as Error).message}`, [
      { path: "", message: "not valid JSON" },
    ]);
  }
}
