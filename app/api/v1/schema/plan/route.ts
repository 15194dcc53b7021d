import { JSON_SCHEMAS } from "@/schemas/json-schema";

// Documentation, not team data: the same for everyone, so it is built once and may be cached.
export const dynamic = "force-static";

/**
 * GET /api/v1/schema/plan: the JSON Schema of the plan document
 * (docs/plan-format.md §12.9; the committed copy is docs/schema/plan.schema.json),
 * generated from the zod schemas. Public (no sign-in): it documents the
 * format, it holds no team's data (ADR 022). Cacheable for an hour.
 */
export function GET(): Response {
  return new Response(JSON.stringify(JSON_SCHEMAS.plan(), null, 2), {
    status: 200,
    headers: {
      "content-type": "application/schema+json; charset=utf-8",
      "cache-control": "public, max-age=3600",
    },
  });
}
