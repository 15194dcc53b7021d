import "server-only";
import type { z } from "zod";
import type { Permission } from "@/lib/permissions";
import { paramTextSchema } from "@/schemas/fields";
import { zodIssues, type Issue } from "@/schemas/issues";
import type { Actor } from "@/server/auth/actor";
import { requireRouteActor } from "@/server/auth/guard";
import { trustedOrigins } from "@/server/env";
import { DEFAULT_BODY_LIMIT, readJsonBody } from "./body";
import { crossOrigin, errorResponse, HttpError, invalidInput } from "./http";
import { NOT_UTF8_HEADER, notUtf8Issues } from "./percent-encoding";
import { crossSiteReason, needsOriginCheck } from "./request-origin";

/** Any member of the active team, whatever their role. */
export const ANY_MEMBER = "any-member";

/** Who may call: a permission of the caller's role in their active team, or any member of it. */
export type Access = Permission | typeof ANY_MEMBER;

type Schema = z.ZodType | undefined;
/** What a schema parses to, or `Fallback` when there is none. */
type Parsed<S extends Schema, Fallback> = S extends z.ZodType ? z.output<S> : Fallback;

export interface RouteSpec<K extends string, B extends Schema, Q extends Schema> {
  /** Completes "Your role in this team does not allow you to …" in the 403 answer. */
  what: string;
  /** Names of the dynamic path segments (e.g. `["missionId", "id"]`), typed in the handler's `params`. */
  params?: readonly K[];
  /**
   * Schema of the JSON body, read (up to `bodyLimit` bytes, default 1 MB) and parsed before the handler runs.
   * Without one the handler reads the body itself, through `readJsonBody` or `readUploadedFile`
   * (the same streaming limit), after the guard's checks.
   */
  body?: B;
  bodyLimit?: number;
  /** Schema of the query parameters (an object of strings; an empty parameter counts as absent). */
  query?: Q;
  /** Names the input in the 400 message "The … is not valid." (default "request"). */
  input?: string;
}

export interface RouteContext<K extends string, B extends Schema, Q extends Schema> {
  request: Request;
  actor: Actor;
  params: Record<K, string>;
  /** The parsed body (undefined without a body schema: the handler reads the request itself). */
  body: Parsed<B, undefined>;
  /** The parsed query, or the raw parameters without a query schema. */
  query: Parsed<Q, Record<string, string>>;
}

/** What the OpenAPI description reads from a guarded handler: its access and spec (the same zod schemas it parses with). */
export interface RouteMeta {
  access: Access;
  spec: RouteSpec<string, Schema, Schema>;
}
const ROUTE_META = Symbol.for("heterolane.route-meta");

/** The access and spec of a handler made by `guarded`, or undefined for any other function. */
export function routeMeta(handler: unknown): RouteMeta | undefined {
  return (handler as { [ROUTE_META]?: RouteMeta } | null)?.[ROUTE_META];
}

/** The second argument Next passes to a route handler. */
export type RouteArgs = { params?: Promise<Record<string, string | string[]>> };

/**
 * The one route guard. Every handler under app/api (except better-auth's
 * catch-all and the health probe) is `guarded(access, spec, handler)`:
 *
 * 1. refuses a state-changing request another site may have forged — 403
 *    `cross-origin` (`checkOrigin`, request-origin.ts) — before reading
 *    anything else (a request authenticated by a bearer token alone is not
 *    checked: no page can forge it);
 * 2. loads the caller once (the session, or on /api/v1 an API token:
 *    `readRouteCaller`) and checks `access` — 401 signed out or with a bad
 *    token, 403 with no active team or a role that may not act — before any
 *    other work (so a signed-out caller's body is never read);
 * 3. checks the path parameters and parses the query and the JSON body with
 *    the spec's zod schemas and answers 400 `invalid-input` with every issue
 *    (415 for a body that is not JSON, 413 for a body above its limit —
 *    declared or streamed —, 400 `invalid-encoding` for text that is not
 *    UTF-8, 400 `invalid-json` for malformed JSON);
 * 4. runs the handler; anything it throws becomes its JSON answer
 *    (`HttpError` → its status and body, a database outage → 503 with
 *    Retry-After, anything else a logged 500).
 */
export function guarded<K extends string = never, B extends Schema = undefined, Q extends Schema = undefined>(
  access: Access,
  spec: RouteSpec<K, B, Q>,
  handler: (ctx: RouteContext<K, B, Q>) => Promise<Response>,
) {
  const route = async (request: Request, args?: RouteArgs): Promise<Response> => {
    try {
      checkOrigin(request.method, request.headers);
      const actor = await requireRouteActor(request, access === ANY_MEMBER ? undefined : access, spec.what);
      const params = await routeParams<K>(args, spec.params ?? []);
      const { body, query } = await parseInput(request, spec);
      return await handler({
        request,
        actor,
        params,
        body: body as Parsed<B, undefined>,
        query: query as Parsed<Q, Record<string, string>>,
      });
    } catch (err) {
      return errorResponse(err);
    }
  };
  return Object.assign(route, { [ROUTE_META]: { access, spec } as RouteMeta });
}

/**
 * The cross-site check of every route (see request-origin.ts for the rule).
 * It is one condition, `needsOriginCheck`: a state-changing method that is
 * not authenticated by an `Authorization: Bearer` token alone.
 */
export function checkOrigin(method: string, headers: Headers): void {
  if (!needsOriginCheck(method, headers)) return;
  const reason = crossSiteReason(headers, trustedOrigins());
  if (reason) throw crossOrigin(reason);
}

const PARAM = paramTextSchema(200);

/** The path parameters, each checked with the text rule (400 naming the parameter: no NUL reaches a query). */
async function routeParams<K extends string>(args: RouteArgs | undefined, names: readonly K[]) {
  const raw = (args?.params ? await args.params : {}) as Record<string, string | string[] | undefined>;
  const out = {} as Record<K, string>;
  const issues: Issue[] = [];
  for (const name of names) {
    const v = raw[name];
    const value = Array.isArray(v) ? v.join("/") : (v ?? "");
    const r = PARAM.safeParse(value);
    if (!r.success) issues.push(...zodIssues(r.error).map((i) => ({ ...i, path: name })));
    out[name] = value;
  }
  if (issues.length) throw invalidInput(issues, "The address of this request is not valid.");
  return out;
}

/**
 * The query parameters of a request; empty ones (as HTML forms send them)
 * are left out. A percent-encoding that is not UTF-8 (`?chain=%FF`, or in
 * the path) is refused with 400 `invalid-encoding` naming the parameter:
 * the request hook marks it (percent-encoding.ts) before Next would
 * silently substitute U+FFFD; a request that reaches the guard unmarked is
 * checked here as well.
 */
export function queryOf(request: Request): Record<string, string> {
  const marked = notUtf8Issues(request.headers.get(NOT_UTF8_HEADER));
  if (marked.length)
    throw new HttpError(400, "invalid-encoding", "The address of this request is not valid UTF-8.", marked);
  const search = new URL(request.url).search.replace(/^\?/, "");
  const out: Record<string, string> = {};
  const issues: Issue[] = [];
  for (const pair of search.split("&")) {
    if (pair === "") continue;
    const eq = pair.indexOf("=");
    const rawKey = eq < 0 ? pair : pair.slice(0, eq);
    const rawValue = eq < 0 ? "" : pair.slice(eq + 1);
    const key = decodeComponent(rawKey);
    const value = decodeComponent(rawValue);
    if (key === null || value === null) {
      issues.push({ path: key ?? rawKey.slice(0, 40), message: "is not valid UTF-8 (percent-encoding)" });
      continue;
    }
    if (value !== "") out[key] = value;
  }
  if (issues.length)
    throw new HttpError(400, "invalid-encoding", "The query of this request is not valid UTF-8.", issues);
  return out;
}

function decodeComponent(s: string): string | null {
  try {
    return decodeURIComponent(s.replace(/\+/g, " "));
  } catch {
    return null;
  }
}

async function parseInput(
  request: Request,
  spec: { body?: Schema; bodyLimit?: number; query?: Schema; input?: string },
): Promise<{ body: unknown; query: unknown }> {
  const issues: Issue[] = [];
  let query: unknown = queryOf(request);
  if (spec.query) {
    const r = spec.query.safeParse(query);
    if (r.success) query = r.data;
    else issues.push(...zodIssues(r.error));
  }
  let body: unknown;
  if (spec.body) {
    const r = spec.body.safeParse(await readJsonBody(request, spec.bodyLimit ?? DEFAULT_BODY_LIMIT));
    if (r.success) body = r.data;
    else issues.push(...zodIssues(r.error));
  }
  if (issues.length) throw invalidInput(issues, `The ${spec.input ?? "request"} is not valid.`);
  return { body, query };
}
