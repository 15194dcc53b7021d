import { crossFieldIssues } from "./cross-field";
import { noiseFieldIssues } from "./cross-field-noise";
import { planSchema, type Plan } from "./document";
import { readJsonText } from "./json-text";
import { issueMessage, orderIssues, toRawIssues, type PlanIssue } from "./messages";
import { versionIssues } from "./versions";

export type ParsePlanResult = { ok: true; plan: Plan } | { ok: false; issues: PlanIssue[] };

/**
 * Validates a plan document (already parsed from JSON). Never throws: every
 * problem comes back as an issue with its JSON path, in document order. The
 * cross-field rules and the version check run on the raw input too, so they
 * are reported even when other fields are invalid. Both versions of the
 * format are read; the plan is always of the current version.
 */
export function parsePlan(input: unknown): ParsePlanResult {
  const result = planSchema.safeParse(input, { error: issueMessage });
  if (result.success) return { ok: true, plan: result.data };
  return {
    ok: false,
    issues: orderIssues([
      ...toRawIssues(result.error.issues),
      ...crossFieldIssues(input),
      ...noiseFieldIssues(input),
      ...versionIssues(input),
    ]),
  };
}

/**
 * Validates a plan given as JSON text. A syntax error is one issue with the
 * empty path and the position (line and column) where parsing stopped.
 */
export function parsePlanText(text: string): ParsePlanResult {
  const read = readJsonText(text);
  if (!read.ok) return { ok: false, issues: [{ path: "", message: read.message }] };
  return parsePlan(read.value);
}
