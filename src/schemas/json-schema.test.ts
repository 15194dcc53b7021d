import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { JSON_SCHEMAS, jsonSchemaText, planJsonSchema, resultJsonSchema } from "./json-schema";

// The committed JSON Schemas (docs/schema/) are exactly what the zod schemas generate: the format's
// document and its schema cannot drift apart. Regenerate with `npm run schema`.
const DIR = join(__dirname, "../../docs/schema");

type Node = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

describe("JSON Schemas of the plan and result documents", () => {
  it.each(Object.keys(JSON_SCHEMAS) as (keyof typeof JSON_SCHEMAS)[])(
    "docs/schema/%s.schema.json is up to date (run `npm run schema` after changing a schema)",
    (name) => {
      expect(readFileSync(join(DIR, `${name}.schema.json`), "utf8")).toBe(jsonSchemaText(name));
    },
  );

  it("the plan schema accepts either version; version 1 has none of the version 2 fields", () => {
    const s = planJsonSchema() as Node;
    expect(s.$schema).toBe("https://json-schema.org/draft/2020-12/schema");
    const [v2, v1] = s.anyOf as Node[];
    expect(v2!.properties.format.const).toBe("heterolane.plan/2");
    expect(v1!.properties.format.const).toBe("heterolane.plan/1");
    const ch2 = v2!.properties.channels.items;
    const ch1 = v1!.properties.channels.items;
    expect(ch2.properties.ifFilter).toMatchObject({ enum: ["slot", "occupied"], default: "slot" });
    expect(ch2.properties.centreToleranceMHz.default).toBeNull();
    expect(ch2.required).not.toContain("ifFilter");
    expect(ch1.properties.ifFilter).toBeUndefined();
    expect(ch1.additionalProperties).toBe(false);
    expect(v2!.properties.chains.items.properties.temperatureExcursionK).toMatchObject({
      minimum: 0,
      maximum: 50,
      default: 0,
    });
    expect(v1!.properties.chains.items.properties.temperatureExcursionK).toBeUndefined();
    expect(v2!.properties.resonators.items.properties.fsrShiftMHzPerK).toMatchObject({ type: "number", default: 0 });
    expect(v2!.properties.channels.maxItems).toBe(256);
  });

  it("the result schema is strict and has the version 2 fields", () => {
    const s = resultJsonSchema() as Node;
    expect(s.properties.format.const).toBe("heterolane.result/2");
    expect(s.additionalProperties).toBe(false);
    const env = s.$defs.ChannelEnvelope;
    expect(env.required).toEqual(expect.arrayContaining(["worstNedtK", "worstModeResponse", "centreErrorAt"]));
    expect(env.additionalProperties).toBe(false);
    expect(s.$defs.ChainResult.required).toEqual(expect.arrayContaining(["temperatureWindowK", "temperatureMarginK"]));
  });
});
