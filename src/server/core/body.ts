import "server-only";
import { HttpError } from "./http";

/**
 * The one reader of request bodies. The limit is enforced twice: up front
 * from Content-Length (a declared body above it is refused without reading
 * a byte), and while streaming (a chunked or understated body is refused
 * as soon as the bytes read pass the limit; the rest is never buffered).
 * The route guard calls it only after the caller's access was checked, so a
 * signed-out request never has its body read at all. The unread remainder
 * is left to the HTTP server, which discards it after the answer.
 */

export const DEFAULT_BODY_LIMIT = 1_000_000;

export const tooLarge = (limitBytes: number, what = "body") =>
  new HttpError(413, "too-large", `The ${what} is larger than ${limitBytes} bytes; nothing was saved.`);

/** True when the request says it carries a body (a length above 0, or chunked transfer). */
export function hasBody(request: Request): boolean {
  const length = request.headers.get("content-length");
  if (length !== null) return Number(length) > 0;
  return request.headers.has("transfer-encoding");
}

/** The body's bytes, at most `limitBytes` of them; 413 `too-large` above. */
export async function readBodyBytes(request: Request, limitBytes: number, what = "body"): Promise<Uint8Array> {
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > limitBytes) throw tooLarge(limitBytes, what);
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limitBytes) throw tooLarge(limitBytes, what);
      chunks.push(value);
    }
  } finally {
    reader.releaseLock();
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/** Strict UTF-8 (a byte-order mark is dropped); 400 `invalid-encoding` for anything else, never a silent U+FFFD. */
export function decodeUtf8Strict(bytes: Uint8Array, path = ""): string {
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new HttpError(400, "invalid-encoding", "The body is not valid UTF-8 text; nothing was saved.", [
      { path, message: "not valid UTF-8" },
    ]);
  }
}

const JSON_TYPE = /^application\/([a-z0-9.+-]*\+)?json\s*(;|$)/i;

/**
 * 415 `unsupported-media-type` unless a request that carries a body says it
 * is JSON. (A page on another site can post text/plain or a form without
 * asking first; it cannot post application/json without the browser's
 * preflight, so this is the second line behind the origin check.)
 */
export function assertJsonContentType(request: Request): void {
  if (!hasBody(request)) return;
  const type = request.headers.get("content-type") ?? "";
  if (!JSON_TYPE.test(type))
    throw new HttpError(
      415,
      "unsupported-media-type",
      `Send the body as JSON with "Content-Type: application/json" (got ${type ? `"${type.slice(0, 80)}"` : "none"}).`,
      [{ path: "", message: "the content type must be application/json" }],
    );
}

/** The body as text: JSON content type, size limit, strict UTF-8. */
export async function readJsonText(request: Request, limitBytes = DEFAULT_BODY_LIMIT): Promise<string> {
  assertJsonContentType(request);
  return decodeUtf8Strict(await readBodyBytes(request, limitBytes));
}

/** Parses JSON text; 400 `invalid-json` when it is malformed. */
export function parseJsonText(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new HttpError(400, "invalid-json", `The body is not valid JSON: ${(e as Error).message}`, [
      { path: "", message: "not valid JSON" },
    ]);
  }
}

/** Reads a JSON body: 415 for another content type, 413 above the limit, 400 for invalid UTF-8 or malformed JSON. */
export async function readJsonBody(request: Request, limitBytes = DEFAULT_BODY_LIMIT): Promise<unknown> {
  return parseJsonText(await readJsonText(request, limitBytes));
}
