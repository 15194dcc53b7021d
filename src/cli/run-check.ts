import { parsePlanText, type Plan, type PlanIssue } from "@/schemas/plan";

/** What one `check` run produces; the caller writes it out and exits. */
export interface CheckOutcome {
  /** 0 valid document (whatever its findings), 2 invalid input, 1 internal fault. */
  exitCode: 0 | 1 | 2;
  stdout: string;
  stderr: string;
}

/** One `path: message` line per issue; the whole document is named `(document)`. */
export function issueLines(issues: readonly PlanIssue[]): string {
  return issues.map((i) => `${i.path === "" ? "(document)" : i.path}: ${i.message}\n`).join("");
}

/**
 * Validates plan text and checks it. `check` is the engine's `checkPlan`,
 * passed in so that this step can be tested on its own and the engine is
 * loaded only for a valid document.
 */
export async function runCheck(text: string, check: (plan: Plan) => unknown | Promise<unknown>): Promise<CheckOutcome> {
  const parsed = parsePlanText(text);
  if (!parsed.ok) return { exitCode: 2, stdout: "", stderr: issueLines(parsed.issues) };
  try {
    const result = await check(parsed.plan);
    return { exitCode: 0, stdout: `${JSON.stringify(result, null, 2)}\n`, stderr: "" };
  } catch (e) {
    const detail = e instanceof Error ? (e.stack ?? e.message) : String(e);
    return { exitCode: 1, stdout: "", stderr: `internal error while checking the plan: ${detail}\n` };
  }
}
