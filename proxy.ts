import { getSessionCookie } from "better-auth/cookies";
import { NextResponse, type NextRequest } from "next/server";

/**
 * A cheap first filter: signed-in pages without any session cookie go to
 * /sign-in straight away, remembering where the person wanted to go. It does
 * not check the session (layouts, pages and actions do, against the database).
 */
export function proxy(request: NextRequest) {
  if (getSessionCookie(request)) return NextResponse.next();
  const url = request.nextUrl.clone();
  const next = request.nextUrl.pathname + request.nextUrl.search;
  url.pathname = "/sign-in";
  url.search = `?next=${encodeURIComponent(next)}`;
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ["/missions/:path*", "/team/:path*", "/teams/:path*", "/tools/:path*"],
};
