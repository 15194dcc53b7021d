import { describe, expect, it } from "vitest";
import { issueLines, runCheck } from "./run-check";
import { validPlanInput } from "../../tests/fixtures/valid-plan";
import type { Plan } from "@/schemas/plan";

describe("runCheck", () => {
  const valid = JSON.stringify(validPlanInput());

  it("passes the parsed plan (defaults applied) to the engine and prints its result as JSON", async () => {
    let seen: Plan | null = null;
    const out = await runCheck(valid, (plan) => {
      seen = plan;
      return { format: "x", n: plan.channels.length };
    });
    expect(out).toEqual({ exitCode: 0, stdout: `${JSON.stringify({ format: "x", n: 3 }, null, 2)}\n`, stderr: "" });
    expect(seen!.chains[1]!.sharedIf).toBe(false);
  });
  it("exit 2 with one path: message line per issue, engine not called", async () => {
    const doc = validPlanInput() as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
    doc.channels[0].bandwidthMHz = -1;
    doc.chains[0].laser = "LP9";
    let called = false;
    const out = await runCheck(JSON.stringify(doc), () => (called = true));
    expect(called).toBe(false);
    expect(out.exitCode).toBe(2);
    expect(out.stdout).toBe("");
    expect(out.stderr).toBe(
      'chains[0].laser: refers to laser "LP9", which does not exist\nchannels[0].bandwidthMHz: must be greater than 0\n',
    );
  });
  it("exit 2 for malformed JSON, named as the whole document", async () => {
    const out = await runCheck("{", () => null);
    expect(out).toEqual({
      exitCode: 2,
      stdout: "",
      stderr: "(document): not valid JSON: unexpected end of input at line 1, column 2\n",
    });
  });
  it("exit 1 when the engine throws (an internal fault, not the user's input)", async () => {
    const out = await runCheck(valid, () => {
      throw new Error("boom");
    });
    expect(out.exitCode).toBe(1);
    expect(out.stdout).toBe("");
    expect(out.stderr).toMatch(/^internal error while checking the plan: Error: boom/);
  });
  it("issueLines", () => {
    expect(issueLines([])).toBe("");
    expect(
      issueLines([
        { path: "", message: "a" },
        { path: "x[1]", message: "b" },
      ]),
    ).toBe("(document): a\nx[1]: b\n");
  });
});
