import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync, mkdirSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { validPlanInput } from "../../tests/fixtures/valid-plan";

// Spawns the real command line (the way `npm run heterolane` runs it). These
// cases never reach the engine; tests/reference/cli-check.test.ts covers
// valid documents against checkPlan.
const TSX = "node_modules/.bin/tsx";
function cli(args: string[], input?: string, env: Record<string, string | undefined> = {}) {
  const r = spawnSync(TSX, ["src/cli/heterolane.ts", ...args], {
    input,
    encoding: "utf8",
    timeout: 30_000,
    env: { ...process.env, INIT_CWD: undefined, ...env },
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe("heterolane command line (input errors)", { timeout: 60_000 }, () => {
  const dir = mkdtempSync(join(tmpdir(), "heterolane-cli-"));

  it("--help prints the usage to stdout and exits 0", () => {
    const r = cli(["--help"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Usage: heterolane check <plan.json \| ->/);
    expect(r.stderr).toBe("");
  });
  it("no arguments or an unknown command: usage on stderr, exit 2", () => {
    const none = cli([]);
    expect(none.code).toBe(2);
    expect(none.stderr).toMatch(/Usage:/);
    const unknown = cli(["verify", "x.json"]);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toMatch(/^unknown command "verify"/);
  });
  it("an unreadable file: exit 2 and a message naming it", () => {
    const missing = cli(["check", join(dir, "missing.json")]);
    expect(missing).toEqual({
      code: 2,
      stdout: "",
      stderr: `(document): cannot read ${JSON.stringify(join(dir, "missing.json"))}: no such file\n`,
    });
    const sub = join(dir, "folder");
    mkdirSync(sub);
    expect(cli(["check", sub]).stderr).toMatch(/is a directory/);
  });
  it("a relative file name is read from the folder the command was typed in (npm's INIT_CWD)", () => {
    writeFileSync(join(dir, "here.json"), "[");
    const r = cli(["check", "here.json"], undefined, { INIT_CWD: dir });
    expect(r).toEqual({
      code: 2,
      stdout: "",
      stderr: "(document): not valid JSON: unexpected end of input at line 1, column 2\n",
    });
  });
  it("malformed JSON on stdin: exit 2 with the position", () => {
    const r = cli(["check", "-"], '{\n  "format": "heterolane.plan/1",\n  "name": }');
    expect(r).toEqual({
      code: 2,
      stdout: "",
      stderr: '(document): not valid JSON: unexpected "}" at line 3, column 11\n',
    });
  });
  it("an invalid document in a file: exit 2, one path: message line per error, in document order", () => {
    const doc = validPlanInput() as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
    doc.lasers[0].reach[0].maxGHz = 100;
    doc.chains[1].sideband = "both";
    doc.channels[2].bandwidthMHz = 0;
    doc.channels[0].colour = "red";
    const file = join(dir, "bad.plan.json");
    writeFileSync(file, JSON.stringify(doc, null, 2));
    const r = cli(["check", file]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr.split("\n")).toEqual([
      "lasers[0].reach[0].minGHz: must be below maxGHz (100)",
      'chains[1].sideband: must be "upper" or "lower"',
      "channels[0].colour: unknown key",
      "channels[2].bandwidthMHz: must be greater than 0",
      "",
    ]);
  });
});
