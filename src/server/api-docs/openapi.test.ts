import { readdirSync, readFileSync } from "node:fs";
import { join, relative } from "node:path";
import { describe, expect, it } from "vitest";

// The route modules read the server environment when they load; nothing here
// connects to anything, so placeholders do (a real value is kept).
const PLACEHOLDERS = {
  DATABASE_URL: "postgres://nobody@127.0.0.1:1/none",
  BETTER_AUTH_SECRET: "placeholder-secret-for-the-openapi-test-0123",
  BETTER_AUTH_URL: "http://localhost:1",
  SMTP_URL: "smtp://127.0.0.1:1",
  MAIL_FROM: "test <test@example.org>",
};
for (const [k, v] of Object.entries(PLACEHOLDERS)) process.env[k] ??= v;

const { openApiDocument } = await import("./openapi");
const { OPERATIONS } = await import("../../../app/api/v1/openapi.json/operations");
const { routeMeta } = await import("@/server/core/guard");
const workspace = await import("@/schemas/workspace");
const channelItem = await import("../../../app/api/v1/missions/[missionId]/channels/[id]/route");
const missions = await import("../../../app/api/v1/missions/route");
const { Validator } = await import("@seriousme/openapi-schema-validator");

const ROOT = join(__dirname, "../../..");
const V1 = join(ROOT, "app/api/v1");

/** Every route file under app/api/v1 with its exported HTTP methods, as OpenAPI path + method. */
function routeFiles(): string[] {
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.name === "route.ts") {
        const path = `/${relative(V1, dir)}`.replace(/\[([^\]]+)\]/g, "{$1}");
        if (path === "/openapi.json") continue; // the description itself
        for (const m of readFileSync(p, "utf8").matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\b/g))
          out.push(`${m[1]!.toLowerCase()} ${path}`);
      }
    }
  };
  walk(V1);
  return out.sort();
}

describe("OpenAPI description of /api/v1", () => {
  const doc = openApiDocument(OPERATIONS, "test") as {
    openapi: string;
    paths: Record<
      string,
      Record<
        string,
        {
          requestBody?: { content: Record<string, { schema: unknown }> };
          parameters: { name: string; in: string; required: boolean }[];
        }
      >
    >;
  };

  it("is a valid OpenAPI 3.1 document (@seriousme/openapi-schema-validator)", async () => {
    expect(doc.openapi).toBe("3.1.0");
    const r = await new Validator().validate(doc as never);
    expect(r).toEqual({ valid: true });
  });

  it("describes every route file and method under app/api/v1, and nothing else", () => {
    const described = Object.entries(doc.paths)
      .flatMap(([path, ops]) => Object.keys(ops).map((m) => `${m} ${path}`))
      .sort();
    expect(described).toEqual(routeFiles());
  });

  it("every operation's handler is the guarded route, and its schemas are the route's own zod objects", () => {
    for (const op of OPERATIONS) expect(routeMeta(op.handler), `${op.method} ${op.path}`).toBeDefined();
    expect(routeMeta(channelItem.PATCH)?.spec.body).toBe(workspace.entityUpdateSchemas.channels);
    expect(routeMeta(channelItem.DELETE)?.spec.query).toBe(workspace.deleteQuerySchema);
    expect(routeMeta(missions.POST)?.spec.body).toBe(workspace.missionCreateSchema);
  });

  it("turns the schemas into request bodies and parameters (known answers)", () => {
    const create = doc.paths["/missions"]!.post!.requestBody!.content["application/json"]!.schema;
    expect(create).toMatchObject({ type: "object", required: ["name"], additionalProperties: false });
    const del = doc.paths["/missions/{missionId}/channels/{id}"]!.delete!.parameters;
    expect(del.map((p) => [p.name, p.in, p.required])).toEqual([
      ["missionId", "path", true],
      ["id", "path", true],
      ["version", "query", true],
    ]);
    const push = doc.paths["/missions/{missionId}/plan"]!.post!.parameters;
    expect(push.find((p) => p.name === "baseRevision")).toMatchObject({ in: "query", required: false });
  });
});
