import "server-only";
import { INT4_MAX, textProblem } from "@/schemas/fields";
import { formatPath, type Issue } from "@/schemas/issues";
import type { Plan } from "@/schemas/plan";

/**
 * What a valid plan document may hold that the database cannot store: the
 * plan format takes any whole number for a chain's `mode` and a lock's
 * `orders` (the check endpoint judges such plans), but the workspace keeps
 * them in `integer` columns; and its names are plain strings, while stored
 * text follows the shared text rule (src/schemas/fields.ts: no control
 * characters but tab and line breaks, no lone surrogates). Each problem is
 * an issue with the document path, so an import answers 400 instead of
 * failing in the database.
 */
export function unstorableIssues(plan: Plan): Issue[] {
  const issues: Issue[] = [];
  walkStrings(plan, [], issues);
  const int = (value: number, path: (string | number)[]) => {
    if (value > INT4_MAX) issues.push({ path: formatPath(path), message: `must be at most ${INT4_MAX} to be stored` });
  };
  plan.lasers.forEach((l, i) => int(l.lock.orders, ["lasers", i, "lock", "orders"]));
  plan.chains.forEach((c, i) => int(c.mode, ["chains", i, "mode"]));
  return issues;
}

function walkStrings(value: unknown, path: (string | number)[], issues: Issue[]): void {
  if (typeof value === "string") {
    const problem = textProblem(value, { multiLine: true });
    if (problem) issues.push({ path: formatPath(path), message: problem });
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => walkStrings(v, [...path, i], issues));
  } else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) walkStrings(v, [...path, k], issues);
  }
}
