/**
 * `npm run schema`: writes the JSON Schemas of the plan and result
 * documents, generated from the zod schemas (`src/schemas/json-schema.ts`),
 * to `docs/schema/plan.schema.json` and `docs/schema/result.schema.json`.
 * `src/schemas/json-schema.test.ts` fails when the committed files differ
 * from what this writes.
 */
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { JSON_SCHEMAS, jsonSchemaText } from "@/schemas/json-schema";

for (const name of Object.keys(JSON_SCHEMAS) as (keyof typeof JSON_SCHEMAS)[]) {
  const path = fileURLToPath(new URL(`../../docs/schema/${name}.schema.json`, import.meta.url));
  writeFileSync(path, jsonSchemaText(name));
  console.log(`wrote ${path}`);
}
