/**
 * The security headers of every answer (docs/decisions/023-hardening.md),
 * set by proxy.ts for pages (with a fresh CSP nonce per request) and by
 * next.config.mjs for everything else (API answers, static files).
 *
 * - Content-Security-Policy: scripts only from this origin and with the
 *   request's nonce ('strict-dynamic' lets Next's nonce-carrying loader
 *   fetch its chunks; no 'unsafe-inline' for scripts); styles from this
 *   origin plus inline style attributes ('unsafe-inline' for styles only:
 *   React renders `style` props as attributes, which a nonce cannot cover);
 *   `frame-ancestors 'none'` (no page can be framed: the team and mission
 *   pages hold remove and delete controls); `form-action 'self'`,
 *   `base-uri 'self'`, `object-src 'none'`.
 * - X-Frame-Options: DENY for browsers without frame-ancestors.
 * - Referrer-Policy: strict-origin-when-cross-origin.
 * - X-Content-Type-Options: nosniff.
 * - Strict-Transport-Security when the app is served over https.
 *
 * Free of `server-only` on purpose: proxy.ts imports it.
 */

/** The CSP of a page answered with `nonce`; `dev` adds what `next dev` needs ('unsafe-eval' for React's debugging). */
export function pageCsp(nonce: string, options: { dev?: boolean } = {}): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${options.dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    `connect-src 'self'${options.dev ? " ws: wss:" : ""}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** The CSP of answers that are not pages (JSON, CSV, files): nothing may run or frame them. */
export const NON_PAGE_CSP = "default-src 'none'; frame-ancestors 'none'";

/** HSTS: one year, subdomains included (RFC 6797 §6.1). Sent only over https (a browser ignores it over http anyway). */
export const HSTS = "max-age=31536000; includeSubDomains";

/** The headers every answer carries, whatever it is. */
export const COMMON_SECURITY_HEADERS: Readonly<Record<string, string>> = {
  "x-frame-options": "DENY",
  "referrer-policy": "strict-origin-when-cross-origin",
  "x-content-type-options": "nosniff",
};

/** True when the request reached the app over https (directly, or as a trusted proxy says in X-Forwarded-Proto). */
export function servedOverHttps(url: string, forwardedProto: string | null): boolean {
  if (forwardedProto) return forwardedProto.split(",")[0]!.trim().toLowerCase() === "https";
  return url.startsWith("https:");
}

/** A fresh nonce: 128 random bits, base64 (CSP Level 3 §2.3.1 asks for at least 128 bits). */
export function newNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}
