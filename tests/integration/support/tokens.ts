/**
 * Helpers for the API-token tests: a client that sends only a bearer token
 * (no cookies), tokens made through the account route with a person's
 * session, and a checker that validates every answer against the served
 * OpenAPI description.
 */
import { Ajv2020 } from "ajv/dist/2020.js";
import addFormats from "ajv-formats";
import { TestClient, type FetchInit } from "../../setup/auth-helpers";
import { call } from "../../setup/workspace-helpers";

/** A caller with a bearer token and no cookies; every token it was given is remembered to search the logs for. */
export class TokenClient extends TestClient {
  static readonly made: string[] = [];
  constructor(
    readonly token: string,
    readonly address = "198.51.100.10",
  ) {
    super();
    TokenClient.made.push(token);
  }
  override async fetch(path: string, init: FetchInit = {}): Promise<Response> {
    const headers = new Headers(init.headers);
    headers.set("authorization", `Bearer ${this.token}`);
    if (!headers.has("x-forwarded-for")) headers.set("x-forwarded-for", this.address);
    this.cookies.clear();
    return super.fetch(path, { ...init, headers });
  }
}

export interface MadeToken {
  token: string;
  id: string;
  client: TokenClient;
}

/** Makes a token as `owner` (a signed-in person) through POST /api/account/tokens. */
export async function makeToken(
  owner: TestClient,
  body: { teamId: string; role: string; name?: string; requestsPerMinute?: number; expiresInDays?: number },
): Promise<MadeToken> {
  const r = await call(owner, "POST", "/api/account/tokens", {
    name: body.name ?? `test ${Math.random().toString(36).slice(2, 8)}`,
    teamId: body.teamId,
    role: body.role,
    ...(body.requestsPerMinute ? { requestsPerMinute: body.requestsPerMinute } : {}),
    ...(body.expiresInDays ? { expiresInDays: body.expiresInDays } : {}),
  });
  if (r.status !== 201) throw new Error(`token creation answered ${r.status}: ${r.text}`);
  return { token: r.body.token, id: r.body.summary.id, client: new TokenClient(r.body.token) };
}

type Doc = {
  paths: Record<
    string,
    Record<string, { responses: Record<string, { content?: Record<string, { schema: object }> }> }>
  >;
};

/**
 * Validates answers against the OpenAPI description served by the app
 * (JSON Schema 2020-12 through Ajv, formats through ajv-formats). Returns
 * the problems of one answer ([] when it matches).
 */
export class OpenApiChecker {
  private readonly ajv = new Ajv2020({ strict: false, allErrors: true });
  private readonly routes: { re: RegExp; template: string }[];
  checked = 0;
  constructor(private readonly doc: Doc) {
    addFormats.default(this.ajv);
    this.ajv.addSchema(doc as object, "openapi");
    this.routes = Object.keys(doc.paths).map((template) => ({
      template,
      re: new RegExp(`^/api/v1${template.replace(/\./g, "\\.").replace(/\{[^}]+\}/g, "[^/]+")}$`),
    }));
  }

  /** The problems of one answer: no such operation or status in the description, or a body that does not match. */
  problems(method: string, url: string, status: number, contentType: string | null, body: unknown): string[] {
    const path = new URL(url, "http://x").pathname;
    const route = this.routes.find((r) => r.re.test(path));
    if (!route) return [`${method} ${path}: no such path in the description`];
    const op = this.doc.paths[route.template]![method.toLowerCase()];
    if (!op) return [`${method} ${route.template}: no such operation`];
    const response = op.responses[String(status)];
    if (!response) return [`${method} ${route.template}: status ${status} is not described`];
    this.checked++;
    const type = (contentType ?? "").split(";")[0]!.trim();
    if (!response.content?.[type])
      return [`${method} ${route.template} ${status}: content type ${type} is not described`];
    if (type !== "application/json") return [];
    const seg = (s: string) => encodeURIComponent(s.replace(/~/g, "~0").replace(/\//g, "~1"));
    const pointer = `openapi#/paths/${seg(route.template)}/${method.toLowerCase()}/responses/${status}/content/${seg("application/json")}/schema`;
    const validate = this.ajv.getSchema(pointer);
    if (!validate) return [`no schema at ${pointer}`];
    if (validate(body)) return [];
    return (validate.errors ?? []).map(
      (e) => `${method} ${route.template} ${status}: ${e.instancePath || "(body)"} ${e.message}`,
    );
  }
}
