import { getSessionCookie } from "better-auth/cookies";
import { NextResponse, type NextRequest } from "next/server";
import {
  crossOriginMessage,
  crossSiteReason,
  needsOriginCheck,
  trustedOriginsFrom,
} from "@/server/core/request-origin";
import { COMMON_SECURITY_HEADERS, HSTS, newNonce, pageCsp, servedOverHttps } from "@/server/core/security-headers";

/** Signed-in areas: without any session cookie they go to /sign-in straight away. */
const SIGNED_IN = /^\/(missions|team|teams|tools)(\/|$)/;

/**
 * Runs before every page request (not the API, not static files; see the
 * matcher):
 *
 * 1. a state-changing request (a server action post) from another site is
 *    answered 403 `cross-origin` here, before Next runs the action (Next's
 *    own check would answer 500);
 * 2. signed-in pages without any session cookie go to /sign-in,
 *    remembering where the person wanted to go (a cheap first filter:
 *    layouts, pages and actions check the session against the database);
 * 3. every page gets the security headers, with a Content-Security-Policy
 *    whose nonce Next puts on its own scripts (the nonce travels to the
 *    render in the request's CSP header; docs/decisions/023-hardening.md).
 */
export function proxy(request: NextRequest) {
  const https =
    servedOverHttps(request.url, request.headers.get("x-forwarded-proto")) ||
    (process.env.BETTER_AUTH_URL ?? "").startsWith("https:");
  const nonce = newNonce();
  const csp = pageCsp(nonce, { dev: process.env.NODE_ENV === "development" });
  const secure = (res: NextResponse) => {
    res.headers.set("content-security-policy", csp);
    for (const [k, v] of Object.entries(COMMON_SECURITY_HEADERS)) res.headers.set(k, v);
    if (https) res.headers.set("strict-transport-security", HSTS);
    return res;
  };

  if (needsOriginCheck(request.method, request.headers)) {
    const trusted = trustedOriginsFrom(
      process.env.BETTER_AUTH_URL ?? request.nextUrl.origin,
      process.env.HETEROLANE_TRUSTED_ORIGINS,
    );
    const reason = crossSiteReason(request.headers, trusted);
    if (reason)
      return secure(
        new NextResponse(JSON.stringify({ error: { code: "cross-origin", message: crossOriginMessage(reason) } }), {
          status: 403,
          headers: { "content-type": "application/json", "cache-control": "no-store" },
        }),
      );
  }

  if (SIGNED_IN.test(request.nextUrl.pathname) && !getSessionCookie(request)) {
    const url = request.nextUrl.clone();
    const next = request.nextUrl.pathname + request.nextUrl.search;
    url.pathname = "/sign-in";
    url.search = `?next=${encodeURIComponent(next)}`;
    return secure(NextResponse.redirect(url));
  }

  const headers = new Headers(request.headers);
  headers.set("x-nonce", nonce);
  headers.set("content-security-policy", csp);
  return secure(NextResponse.next({ request: { headers } }));
}

export const config = {
  matcher: [
    // Every path but the API (its answers get their headers from next.config.mjs, and its bodies are not
    // buffered for the proxy), Next's static files and files with an extension (public/, the icon).
    "/((?!api/|_next/static/|_next/image|.*\\.[A-Za-z0-9]+$).*)",
  ],
};
