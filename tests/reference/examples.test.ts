import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { checkPlan, RULE_ORDER } from "@/lib/plan";
import { parsePlanText } from "@/schemas/plan";

// docs/examples: the clean plan has no error finding, and each
// error-<code>.plan.json makes an error finding with that code.
const DIR = join(__dirname, "../../docs/examples");
const files = readdirSync(DIR).filter((f) => f.endsWith(".plan.json"));

// The codes whose severity is "error" in the rules table of docs/plan-format.md §4.1
// (slot-overlap is an error unless the chain has sharedIf; spur-in-slot is
// an error for the carrier-beat, lock-lo and lock-self families).
const ERROR_CODES = [
  "lo-uncovered",
  "lo-in-band",
  "band-outside-rf-input",
  "mode-detuned",
  "if-outside-detector",
  "slot-overlap",
  "image-response",
  "spur-in-slot",
  "nyquist-straddle",
  "alias-overlap",
  "pd-overload",
  "nedt-unmet",
] as const;

function load(file: string) {
  const r = parsePlanText(readFileSync(join(DIR, file), "utf8"));
  if (!r.ok) throw new Error(`${file} is not a valid plan: ${JSON.stringify(r.issues)}`);
  return r.plan;
}

describe("docs/examples", () => {
  it("has the clean plan and one plan per error code, all listed in the README, all marked as demo data", () => {
    const readme = readFileSync(join(DIR, "README.md"), "utf8");
    expect(files).toContain("clean.plan.json");
    for (const code of ERROR_CODES) expect(files).toContain(`error-${code}.plan.json`);
    for (const f of files) {
      expect(readme).toContain(`\`${f}\``);
      expect(load(f).name).toMatch(/^Demo data/);
      const code = f.match(/^error-(.+)\.plan\.json$/)?.[1];
      if (code) expect(RULE_ORDER as readonly string[]).toContain(code);
    }
  });

  it("clean.plan.json: no error finding, every chain placed", () => {
    const plan = load("clean.plan.json");
    const result = checkPlan(plan);
    expect(result.findings.filter((f) => f.severity === "error")).toEqual([]);
    expect(result.chains).toHaveLength(2);
    for (const chain of result.chains) {
      expect(chain.placeGHz).not.toBeNull();
      // The LO set in the plan is itself inside a feasible interval.
      const lo = plan.chains.find((c) => c.id === chain.id)!.loOffsetGHz;
      expect(chain.feasibleGHz.some(([a, b]) => a <= lo && lo <= b)).toBe(true);
    }
  });

  it.each(files.filter((f) => f.startsWith("error-")))("%s has that error", (file) => {
    const code = file.replace(/^error-/, "").replace(/\.plan\.json$/, "");
    const result = checkPlan(load(file));
    const errors = result.findings.filter((f) => f.severity === "error").map((f) => f.code);
    expect(errors).toContain(code);
    // One rule at a time: the example makes no other kind of error.
    expect([...new Set(errors)]).toEqual([code]);
  });
});
