import "server-only";
import { z } from "zod";
import { ROLE_NAMES, roleCan, type Permission } from "@/lib/permissions";
import { errorSchema } from "@/schemas/api-responses";
import { ANY_MEMBER, routeMeta, type RouteMeta } from "@/server/core/guard";

/**
 * The OpenAPI 3.1 description of `/api/v1` (docs/decisions/024-api-tokens.md),
 * generated from the route handlers themselves: each operation names its
 * guarded handler, whose access and zod schemas (path parameters, query,
 * JSON body) the guard exposes (`routeMeta`); the answer schemas come from
 * src/schemas/api-responses.ts. zod 4's `z.toJSONSchema` turns schemas into
 * JSON Schema 2020-12, the dialect of OpenAPI 3.1: inputs as the client may
 * write them, answers as the server writes them.
 */

export type Method = "get" | "post" | "put" | "patch" | "delete";

export interface Operation {
  /** The OpenAPI path below /api/v1, e.g. "/missions/{missionId}/plan". */
  path: string;
  method: Method;
  /** The exported route handler (made by `guarded`). */
  handler: unknown;
  summary: string;
  tag: string;
  /** The success answer: status and JSON schema, or another content type. */
  ok: { status: number; schema?: z.ZodType; contentType?: string; description?: string };
  /** A body the handler reads itself (not through the guard's body schema). */
  body?: { schema: z.ZodType; description?: string } | { multipart: string };
}

type Json = Record<string, unknown>;

function jsonSchema(schema: z.ZodType, io: "input" | "output"): Json {
  const { $schema: _dialect, ...rest } = z.toJSONSchema(schema, {
    target: "draft-2020-12",
    io,
    unrepresentable: "any",
  }) as Json;
  return rest;
}

function describeAccess(access: RouteMeta["access"]): string {
  if (access === ANY_MEMBER) return "Any member of the team (every role).";
  const p = access as Permission;
  const names = Object.entries(p)
    .map(([resource, actions]) => `${resource}: ${(actions as string[]).join(", ")}`)
    .join("; ");
  const who = ROLE_NAMES.filter((r) => roleCan(r, p));
  return `Needs ${names} — roles ${who.join(", ")}. A token acts with exactly its role's permissions.`;
}

const errorResponse = (description: string) => ({
  description,
  content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } },
});

function operationObject(op: Operation): Json {
  const meta = routeMeta(op.handler);
  if (!meta) throw new Error(`${op.method.toUpperCase()} ${op.path}: the handler is not made by guarded()`);
  const pathNames = [...op.path.matchAll(/\{([^}]+)\}/g)].map((m) => m[1]!);
  const parameters: Json[] = pathNames.map((name) => ({
    name,
    in: "path",
    required: true,
    schema: { type: "string" },
  }));
  if (meta.spec.query) {
    const q = jsonSchema(meta.spec.query, "input") as { properties?: Record<string, Json>; required?: string[] };
    for (const [name, schema] of Object.entries(q.properties ?? {}))
      parameters.push({ name, in: "query", required: q.required?.includes(name) ?? false, schema });
  }
  const o: Json = {
    operationId: `${op.method}${op.path.replace(/\{([^}]+)\}/g, "By-$1").replace(/[^A-Za-z0-9]+(.)/g, (_, c: string) => c.toUpperCase())}`,
    summary: op.summary,
    description: describeAccess(meta.access),
    tags: [op.tag],
    parameters,
  };
  if (meta.spec.body)
    o.requestBody = {
      required: true,
      content: { "application/json": { schema: jsonSchema(meta.spec.body, "input") } },
    };
  else if (op.body && "schema" in op.body)
    o.requestBody = {
      required: true,
      description: op.body.description,
      content: { "application/json": { schema: jsonSchema(op.body.schema, "input") } },
    };
  else if (op.body)
    o.requestBody = {
      required: true,
      content: {
        "multipart/form-data": {
          schema: {
            type: "object",
            required: ["file"],
            properties: {
              file: { type: "string", contentMediaType: "application/octet-stream", description: op.body.multipart },
            },
          },
        },
      },
    };
  const ok = op.ok.schema
    ? {
        description: op.ok.description ?? "Success.",
        content: { "application/json": { schema: jsonSchema(op.ok.schema, "output") } },
      }
    : {
        description: op.ok.description ?? "Success.",
        content: { [op.ok.contentType ?? "text/plain"]: { schema: { type: "string" } } },
      };
  const responses: Json = { [String(op.ok.status)]: ok };
  const writes = op.method !== "get";
  if (writes || meta.spec.query || op.body)
    responses["400"] = errorResponse("Invalid input: every rejected field is named in `issues`.");
  responses["401"] = errorResponse(
    "Signed out, or a missing, malformed, expired or revoked token, or a token in the URL.",
  );
  responses["403"] = errorResponse("The role (of the token) may not do this, or no active team.");
  if (pathNames.length) responses["404"] = errorResponse("No such mission or row in the caller's team.");
  if (writes)
    responses["409"] = errorResponse("Stale `version` (or `baseRevision`): someone saved first; nothing was changed.");
  if (writes) responses["413"] = errorResponse("The body is too large.");
  // Every write re-checks the plan (and POST /check checks one) on the engine pool (ADR 028).
  if (writes)
    responses["422"] = errorResponse("`check-failed`: the engine could not check the plan; nothing was saved.");
  if (writes)
    responses["503"] = errorResponse(
      "`unavailable` or `engine-unavailable`: the database or the checking engine cannot be reached; nothing was saved. Retry after `Retry-After` seconds.",
    );
  responses["429"] = errorResponse("The token's rate limit is reached; `retryAfterSeconds` says when to try again.");
  o.responses = responses;
  o.security = [{ bearerToken: [] }, { sessionCookie: [] }];
  return o;
}

/** The whole document. Throws when an operation's handler is not guarded (a test catches that). */
export function openApiDocument(operations: readonly Operation[], version: string): Json {
  const paths: Record<string, Json> = {};
  for (const op of operations) (paths[op.path] ??= {})[op.method] = operationObject(op);
  return {
    openapi: "3.1.0",
    info: {
      title: "Heterolane API",
      version,
      description:
        "Missions, plans, revisions, results and reviews of a Heterolane team. Authenticate with a personal API token " +
        "(`Authorization: Bearer hl_…`, made on the account page): it acts in one team with one role. Tokens are refused " +
        "in the URL. Errors are `{ error: { code, message, issues? } }`. See docs/automation.md.",
    },
    servers: [{ url: "/api/v1" }],
    tags: [...new Set(operations.map((o) => o.tag))].map((name) => ({ name })),
    paths,
    components: {
      schemas: { Error: jsonSchema(errorSchema, "output") },
      securitySchemes: {
        bearerToken: { type: "http", scheme: "bearer", description: "A personal API token (hl_ and 64 letters)." },
        sessionCookie: {
          type: "apiKey",
          in: "cookie",
          name: "better-auth.session_token",
          description: "The browser session.",
        },
      },
    },
  };
}
