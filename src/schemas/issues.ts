import type { z } from "zod";

/**
 * Issues of rejected input, shared by the plan document (`parsePlan`), the
 * server's 400 answers and the forms: one path formatter and one way to turn
 * a zod error into issues. Pure: no server or client code.
 */

/** One problem with an input: where (a JSON path, form field or query parameter) and what, in plain words. */
export interface Issue {
  path: string;
  message: string;
}

/** `channels[2].bandwidthMHz`; keys that are not plain names are quoted: `a["x y"]`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let s = "";
  for (const seg of path) {
    if (typeof seg === "number") s += `[${seg}]`;
    else {
      const key = String(seg);
      if (/^[A-Za-z_$][A-Za-z0-9_$]*$/.test(key)) s += s === "" ? key : `.${key}`;
      else s += `[${JSON.stringify(key)}]`;
    }
  }
  return s;
}

/** Every issue of a failed zod parse, in zod's order, with its formatted path; unknown keys are named in the message. */
export function zodIssues(error: z.ZodError): Issue[] {
  return error.issues.map((i) => ({
    path: formatPath(i.path),
    message: i.code === "unrecognized_keys" ? `unknown field ${i.keys.join(", ")}` : i.message,
  }));
}
