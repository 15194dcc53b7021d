import "server-only";
import type { z } from "zod";
import type { Permission } from "@/lib/permissions";
import { zodIssues, type Issue } from "@/schemas/issues";
import type { Actor } from "@/server/auth/actor";
import { requireRouteActor } from "@/server/auth/guard";
import { errorResponse, invalidInput, readJsonBody } from "./http";

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
  /** Schema of the JSON body, read (up to `bodyLimit` bytes, default 1 MB) and parsed before the handler runs. */
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
 * 1. loads the caller once (the session, or on /api/v1 an API token:
 *    `readRouteCaller`) and checks `access` — 401 signed out or with a bad
 *    token, 403 with no active team or a role that may not act — before any
 *    other work;
 * 2. parses the query and the JSON body with the spec's zod schemas and
 *    answers 400 `invalid-input` with every issue of both (413 for a body
 *    above its limit, 400 `invalid-json` for malformed JSON);
 * 3. runs the handler; anything it throws becomes its JSON answer
 *    (`HttpError` → its status and body, anything else a logged 500).
 */
export function guarded<K extends string = never, B extends Schema = undefined, Q extends Schema = undefined>(
  access: Access,
  spec: RouteSpec<K, B, Q>,
  handler: (ctx: RouteContext<K, B, Q>) => Promise<Response>,
) {
  const route = async (request: Request, args?: RouteArgs): Promise<Response> => {
    try {
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

async function routeParams<K extends string>(args: RouteArgs | undefined, names: readonly K[]) {
  const raw = (args?.params ? await args.params : {}) as Record<string, string | string[] | undefined>;
  const out = {} as Record<K, string>;
  for (const name of names) {
    const v = raw[name];
    out[name] = Array.isArray(v) ? v.join("/") : (v ?? "");
  }
  return out;
}

/** The query parameters of a request; empty ones (as HTML forms send them) are left out. */
export function queryOf(request: Request): Record<string, string> {
  return Object.fromEntries([...new URL(request.url).searchParams].filter(([, v]) => v !== ""));
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
    const r = spec.body.safeParse(await readJsonBody(request, spec.bodyLimit));
    if (r.success) body = r.data;
    else issues.push(...zodIssues(r.error));
  }
  if (issues.length) throw invalidInput(issues, `The ${spec.input ?? "request"} is not valid.`);
  return { body, query };
}
