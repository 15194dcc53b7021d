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

/** A same-site path to continue to after sign-in, or the fallback (no open redirects). */
export function safeNext(next: unknown, fallback = "/missions"): string {
  if (typeof next !== "string") return fallback;
  if (!next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  return next;
}
