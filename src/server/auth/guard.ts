import "server-only";
import { headers as nextHeaders } from "next/headers";
import { auth, type Session } from "./auth";
import type { Actor } from "./actor";
import { memberRole } from "./queries";
import { isRoleName, roleCan, type Permission } from "@/lib/permissions";
import { forbidden, HttpError, noTeam, unauthorized } from "@/server/core/http";
import type { TokenInfo } from "@/server/api-tokens/verify";

export interface SessionAndActor {
  /** The better-auth session, or null when signed out (and always for a caller with an API token). */
  session: Session | null;
  /** The person acting in their active team, or null (signed out, or no active team they belong to). */
  actor: Actor | null;
  /** The API token a route caller presented (docs/decisions/024-api-tokens.md); never set for pages and server actions. */
  token?: TokenInfo;
}

/**
 * Reads who is calling, once: the better-auth session (one `getSession`,
 * from the database, never from process memory), then the role of the
 * session's active team from the member table (one query).
 */
export async function readActor(reqHeaders?: Headers): Promise<SessionAndActor> {
  const h = reqHeaders ?? (await nextHeaders());
  const session = await auth.api.getSession({ headers: h });
  if (!session) return { session: null, actor: null };
  const teamId = session.session.activeOrganizationId;
  if (!teamId) return { session, actor: null };
  const role = await memberRole(session.user.id, teamId);
  if (!role || !isRoleName(role)) return { session, actor: null };
  const actor: Actor = { userId: session.user.id, email: session.user.email, name: session.user.name, teamId, role };
  return { session, actor };
}

/** The signed-in person and their role in the active team, or null when signed out or with no active team. */
export async function getActor(reqHeaders?: Headers): Promise<Actor | null> {
  return (await readActor(reqHeaders)).actor;
}

/**
 * The actor, after checking a permission: 401 when signed out, 403
 * `no-team` with no active team, 403 `forbidden` when the role may not act
 * (`what` completes "Your role in this team does not allow you to …").
 * Route handlers and server actions reach it through the guards in
 * src/server/core.
 */
export async function requireActor(reqHeaders?: Headers, permission?: Permission, what?: string): Promise<Actor> {
  return assertActor(await readActor(reqHeaders), permission, what);
}

/**
 * Reads who calls a route handler, once (the route guard in src/server/core
 * uses it). A request with an `Authorization` header is answered for its
 * API token alone (cookies are ignored): on `/api/v1` routes only, with
 * exactly the permissions of the token's role in the token's team; a
 * missing, malformed, expired or revoked token is 401, an exhausted one 429.
 * Without the header it is the session, as for pages. A token in the query
 * string is refused whoever calls. Server actions and pages never accept
 * tokens: they read the session with `readActor`.
 */
export async function readRouteCaller(request: Request): Promise<SessionAndActor> {
  const url = new URL(request.url);
  if (tokenInQuery(url.searchParams))
    throw new HttpError(
      401,
      "token-in-url",
      "API tokens are refused in the URL: send them in the Authorization header (Bearer). Revoke a token that was put in a URL.",
    );
  const authorization = request.headers.get("authorization");
  if (authorization === null) return readActor(request.headers);
  if (!/^\/api\/v1(\/|$)/.test(url.pathname))
    throw new HttpError(
      401,
      "token-not-accepted",
      "API tokens are accepted by the /api/v1 routes only; sign in instead.",
    );
  // Loaded on first use, so that session-only callers never load the token code.
  const { readTokenCaller } = await import("@/server/api-tokens/verify");
  const { actor, token } = await readTokenCaller(request);
  return { session: null, actor, token };
}

/** `requireActor` for route handlers: the caller of `readRouteCaller`, after the same checks. */
export async function requireRouteActor(request: Request, permission?: Permission, what?: string): Promise<Actor> {
  return assertActor(await readRouteCaller(request), permission, what);
}

/** Query parameter names that carry credentials by convention. */
const CREDENTIAL_PARAMS = new Set(["access_token", "token", "api_key", "apikey", "api-key", "bearer", "authorization"]);

/** True when a query string carries an API token: a credential parameter, or any value shaped like a token. */
export function tokenInQuery(params: URLSearchParams): boolean {
  for (const [name, value] of params) {
    if (CREDENTIAL_PARAMS.has(name.toLowerCase())) return true;
    if (/\bhl_[A-Za-z]{32,}/.test(value)) return true;
  }
  return false;
}

/** The checks of `requireActor` on a caller already read. */
export function assertActor(read: SessionAndActor, permission?: Permission, what?: string): Actor {
  if (!read.session && !read.token) throw unauthorized();
  if (!read.actor) throw noTeam();
  if (permission && !roleCan(read.actor.role, permission)) throw forbidden(what);
  return read.actor;
}
