import type { ApiError, ApiIssue } from "@/queries/api";

/**
 * Places the server's issues beside the form's fields: an issue whose path
 * names a field of the form (with or without a leading collection or `body`
 * prefix, in dot or bracket notation) becomes a field error; every other
 * issue is a form error that names its path.
 */
export function splitIssues(
  issues: readonly ApiIssue[],
  fieldNames: readonly string[],
): { fieldErrors: Record<string, string[]>; formErrors: string[] } {
  const fieldErrors: Record<string, string[]> = {};
  const formErrors: string[] = [];
  const known = new Set(fieldNames);
  for (const issue of issues) {
    const name = normalisePath(issue.path);
    const match = candidates(name).find((c) => known.has(c) || [...known].some((k) => c.startsWith(`${k}[`)));
    if (match) (fieldErrors[match] ??= []).push(issue.message);
    else formErrors.push(issue.path ? `${issue.path}: ${issue.message}` : issue.message);
  }
  return { fieldErrors, formErrors };
}

/** "reach.0.minGHz" → "reach[0].minGHz"; leading "$." or "." dropped. */
export function normalisePath(path: string): string {
  return path
    .replace(/^\$?\.?/, "")
    .split(".")
    .reduce((acc, part) => (/^\d+$/.test(part) ? `${acc}[${part}]` : acc ? `${acc}.${part}` : part), "");
}

function candidates(name: string): string[] {
  const out = [name];
  const parts = name.split(".");
  // Drop prefixes such as "body." or "channels[2]." one at a time.
  for (let i = 1; i < parts.length; i++) out.push(parts.slice(i).join("."));
  return out;
}

/** The form-level message for a refused save, by HTTP status. */
export function statusText(err: ApiError): string {
  if (err.status === 400) return err.message || "Some values were refused; see the fields below.";
  if (err.status === 403) return "Your role in this team does not allow this change.";
  if (err.status === 404) return "This item no longer exists (it may have been deleted). Reload the page.";
  return err.message;
}
