import "server-only";
import { isAPIError } from "better-auth/api";

/** The better-auth error code (e.g. "INVALID_EMAIL_OR_PASSWORD") and HTTP status of a thrown value, or null when it is not an auth error. */
export function authError(err: unknown): { code: string; status: number; message: string } | null {
  if (!isAPIError(err)) return null;
  const body = (err.body ?? {}) as { code?: string; message?: string };
  return { code: body.code ?? String(err.status), status: err.statusCode, message: body.message ?? err.message };
}

/** Next's redirect()/notFound() throw special errors that must pass through catch blocks. */
export function isNextControlFlow(err: unknown): boolean {
  const digest = (err as { digest?: unknown } | null)?.digest;
  return (
    typeof digest === "string" && (digest.startsWith("NEXT_REDIRECT") || digest.startsWith("NEXT_HTTP_ERROR_FALLBACK"))
  );
}

const BASE = "http://heterolane.invalid";
/** C0 controls (tab, CR, LF included), DEL, C1 controls, and backslashes (browsers read "\\" as "/"). */
const UNSAFE = /[\u0000-\u001f\u007f-\u009f\\]/;

/**
 * A same-origin path to continue to after sign-in, or the fallback (no open
 * redirects). Accepted: a relative path that starts with one "/" and, read
 * with the URL API against a placeholder origin, stays on that origin.
 * Refused: anything else, "//host" (scheme-relative), control characters
 * anywhere (browsers drop tabs and newlines from URLs, so "/\t/evil.example"
 * would become "//evil.example", and a newline breaks the Location header)
 * and backslashes. The path comes back as the URL API serialises it
 * (percent-encoded), so the Location header is plain ASCII.
 */
export function safeNext(next: unknown, fallback = "/missions"): string {
  if (typeof next !== "string" || next.length === 0 || next.length > 2000) return fallback;
  if (UNSAFE.test(next) || !next.startsWith("/") || next.startsWith("//")) return fallback;
  let url: URL;
  try {
    url = new URL(next, BASE);
  } catch {
    return fallback;
  }
  if (url.origin !== BASE || url.pathname.startsWith("//")) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
