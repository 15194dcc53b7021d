import { ANY_MEMBER, guarded, json } from "@/server/core";
import { openApiDocument } from "@/server/api-docs/openapi";
import { OPERATIONS } from "./operations";

export const dynamic = "force-dynamic";

let document: Record<string, unknown> | undefined;

/** The OpenAPI 3.1 description of /api/v1, generated from the routes' own zod schemas (built once per process). */
export const GET = guarded(ANY_MEMBER, { what: "read the API description" }, async () => {
  document ??= openApiDocument(OPERATIONS, process.env.npm_package_version ?? "0.1.0");
  return json(document, 200, { "cache-control": "no-store" });
});
