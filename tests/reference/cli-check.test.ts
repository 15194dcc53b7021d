import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { checkPlan } from "@/lib/plan";
import { parsePlanText } from "@/schemas/plan";

// `heterolane check` spawned as a process: its stdout must be exactly the
// result document checkPlan gives for the same plan.
const ROOT = join(__dirname, "../..");
const TSX = join(ROOT, "node_modules/.bin/tsx");
function cli(args: string[], input?: string) {
  const r = spawnSync(TSX, ["src/cli/heterolane.ts", ...args], {
    cwd: ROOT,
    input,
    encoding: "utf8",
    timeout: 30_000,
    // Relative names are read from INIT_CWD when npm sets it; these are relative to the project.
    env: { ...process.env, INIT_CWD: ROOT },
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}
function expectedResult(file: string) {
  const r = parsePlanText(readFileSync(join(ROOT, file), "utf8"));
  if (!r.ok) throw new Error(`${file} must be valid`);
  return JSON.parse(JSON.stringify(checkPlan(r.plan)));
}

describe("heterolane check (valid documents)", { timeout: 60_000 }, () => {
  it("a clean plan from a file: exit 0, stdout is the result document", () => {
    const r = cli(["check", "docs/examples/clean.plan.json"]);
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.format).toBe("heterolane.result/2");
    expect(out).toEqual(expectedResult("docs/examples/clean.plan.json"));
  });
  it("a plan with error findings from stdin: still exit 0 (findings are not input errors)", () => {
    const file = "docs/examples/error-pd-overload.plan.json";
    const r = cli(["check", "-"], readFileSync(join(ROOT, file), "utf8"));
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toEqual(expectedResult(file));
    expect(out.findings.some((f: { code: string }) => f.code === "pd-overload")).toBe(true);
  });
  it("the worked examples: the same document as checkPlan", () => {
    for (const file of [
      "tests/fixtures/plans/ex1-single-channel.plan.json",
      "tests/fixtures/plans/ex2-lower-sideband-sampled.plan.json",
    ]) {
      const r = cli(["check", file]);
      expect(r.code).toBe(0);
      expect(JSON.parse(r.stdout)).toEqual(expectedResult(file));
    }
  });
  it("an invalid fixture: exit 2 and its expected issues as path: message lines", () => {
    const r = cli(["check", "tests/fixtures/invalid/references.plan.json"]);
    const expected = JSON.parse(readFileSync(join(ROOT, "tests/fixtures/invalid/references.issues.json"), "utf8")) as {
      path: string;
      message: string;
    }[];
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr).toBe(expected.map((i) => `${i.path}: ${i.message}\n`).join(""));
  });
  it("a version 2 document: the result carries the envelope, the same document as checkPlan", () => {
    const doc = JSON.parse(readFileSync(join(ROOT, "tests/fixtures/plans/ex1-single-channel.plan.json"), "utf8"));
    doc.format = "heterolane.plan/2";
    doc.resonators[0].fsrShiftMHzPerK = -6.28;
    doc.chains[0].temperatureExcursionK = 0.5;
    doc.channels[0].ifFilter = "occupied";
    doc.channels[0].centreToleranceMHz = 2;
    const r = cli(["check", "-"], JSON.stringify(doc));
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    const parsed = parsePlanText(JSON.stringify(doc));
    if (!parsed.ok) throw new Error("the edited example must be valid");
    expect(out).toEqual(JSON.parse(JSON.stringify(checkPlan(parsed.plan))));
    expect(out.channels[0].envelope.worstNedtK).toBeGreaterThan(out.channels[0].nedtK);
    expect(Array.isArray(out.chains[0].temperatureWindowK)).toBe(true);
  });
  it("a version 1 document with a version 2 field: exit 2, the field named and the format line to change", () => {
    const r = cli(["check", "tests/fixtures/invalid/version-2-fields-in-version-1.plan.json"]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(
      'channels[0].ifFilter: is a field of heterolane.plan/2: change "format" to "heterolane.plan/2" to use it\n',
    );
  });
});
