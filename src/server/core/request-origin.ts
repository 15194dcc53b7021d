/**
 * Cross-site request forgery defence of every state-changing route and
 * server action: a request a page of another site could make the browser
 * send (with the person's session cookie) is refused with 403
 * `cross-origin` before anything else happens.
 *
 * The browser says where a request comes from: `Origin` on every
 * cross-origin request and on every same-origin one but GET/HEAD (Fetch
 * standard, "append a request `Origin` header"), and Fetch Metadata's
 * `Sec-Fetch-Site` (W3C Fetch Metadata Request Headers §2.1) on every
 * request of a current browser. The rule, in order:
 *
 * - an `Origin` must be one of the trusted origins (the public URL and
 *   HETEROLANE_TRUSTED_ORIGINS); `Origin: null` (sandboxed frames, some
 *   redirects) is refused;
 * - without `Origin`, `Sec-Fetch-Site` must be `same-origin` or `none` (the
 *   person typed the address or used a bookmark);
 * - with neither header the request did not come from a browser page
 *   (curl, the CLI, a server) and cannot carry a forged session, so it
 *   passes.
 *
 * Free of `server-only` on purpose: proxy.ts uses it for server actions.
 */

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * A request with no cookie but an `Authorization: Bearer` token cannot be
 * forged by another site: a browser attaches neither on its own.
 */
export function isBearerOnly(h: Headers): boolean {
  return !h.has("cookie") && /^bearer\s+\S/i.test(h.get("authorization") ?? "");
}

/** The one condition: a state-changing method, not authenticated by a bearer token alone. */
export function needsOriginCheck(method: string, h: Headers): boolean {
  return !SAFE_METHODS.has(method.toUpperCase()) && !isBearerOnly(h);
}

/** Why a request is cross-site, or null when it is not. */
export function crossSiteReason(h: Headers, trusted: readonly string[]): string | null {
  const origin = h.get("origin");
  if (origin !== null) {
    if (origin === "null") return "it names no origin (Origin: null)";
    return trusted.includes(origin) ? null : `it came from ${origin.slice(0, 200)}`;
  }
  const site = h.get("sec-fetch-site");
  if (site === null || site === "same-origin" || site === "none") return null;
  return `the browser marked it ${site.slice(0, 40)} (Sec-Fetch-Site)`;
}

/** The words of the 403 `cross-origin` answer. */
export function crossOriginMessage(reason: string): string {
  return `This request was refused because ${reason}, not from Heterolane's own pages; nothing was changed.`;
}

/** The trusted origins: the public URL's and those listed (comma-separated) in HETEROLANE_TRUSTED_ORIGINS. */
export function trustedOriginsFrom(publicUrl: string, extra: string | undefined): string[] {
  const listed = (extra ?? "")
    .split(",")
    .map((o) => o.trim())
    .filter(Boolean);
  return [...new Set([new URL(publicUrl).origin, ...listed])];
}
