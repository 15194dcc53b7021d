import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { parsePlanText } from "./plan";

// tests/fixtures/invalid: documents with every expected issue written out
// by hand from docs/plan-format.md §2.
const DIR = join(__dirname, "../../tests/fixtures/invalid");
const names = readdirSync(DIR)
  .filter((f) => f.endsWith(".plan.json"))
  .map((f) => f.replace(/\.plan\.json$/, ""));

describe("invalid fixture documents", () => {
  it("there are fixtures, each with its expected issues", () => {
    expect(names.length).toBeGreaterThanOrEqual(8);
    for (const n of names) expect(readdirSync(DIR)).toContain(`${n}.issues.json`);
  });
  it.each(names)("%s", (name) => {
    const text = readFileSync(join(DIR, `${name}.plan.json`), "utf8");
    const expected = JSON.parse(readFileSync(join(DIR, `${name}.issues.json`), "utf8"));
    const r = parsePlanText(text);
    expect(r.ok).toBe(false);
    expect(r.ok ? [] : r.issues).toEqual(expected);
  });
});
