import { z } from "zod";
import { planDocumentSchema } from "./plan";
import { resultDocumentSchema } from "./result";

/**
 * The JSON Schemas of the plan and result documents (docs/plan-format.md
 * §12.9 "JSON Schema"), generated from the zod schemas by zod's own
 * `z.toJSONSchema` (JSON Schema draft 2020-12): the plan as written (either
 * version; defaults are annotations, the rules between fields of §2.8 are
 * not expressible and are left out), the result as the engine writes it.
 * Committed as `docs/schema/plan.schema.json` and `result.schema.json`
 * (a unit test fails when they are stale; `npm run schema` rewrites them),
 * and served at `GET /api/v1/schema/plan` and `/api/v1/schema/result`.
 */

export function planJsonSchema(): Record<string, unknown> {
  return z.toJSONSchema(planDocumentSchema, { io: "input" }) as Record<string, unknown>;
}

export function resultJsonSchema(): Record<string, unknown> {
  return z.toJSONSchema(resultDocumentSchema, { io: "output" }) as Record<string, unknown>;
}

/** The JSON Schemas by name, as served and committed. */
export const JSON_SCHEMAS = { plan: planJsonSchema, result: resultJsonSchema } as const;
export type JsonSchemaName = keyof typeof JSON_SCHEMAS;

/** The text of a committed JSON Schema file: two-space indented JSON and a final newline. */
export function jsonSchemaText(name: JsonSchemaName): string {
  return `${JSON.stringify(JSON_SCHEMAS[name](), null, 2)}\n`;
}
