import "server-only";
import type { z } from "zod";
import { HttpError, type Issue } from "@/server/http";

/** Formats a zod path as the plan document does: `reach[0].maxGHz`. */
export function formatIssuePath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const seg of path) {
    if (typeof seg === "number") out += `[${seg}]`;
    else out += out === "" ? String(seg) : `.${String(seg)}`;
  }
  return out;
}

export function zodIssues(error: z.ZodError): Issue[] {
  return error.issues.map((i) => ({
    path: formatIssuePath(i.path),
    message: i.code === "unrecognized_keys" ? `unknown field ${(i as { keys: string[] }).keys.join(", ")}` : i.message,
  }));
}

export function invalidInput(issues: Issue[], message = "Some fields are not valid."): HttpError {
  return new HttpError(400, "invalid-input", message, issues);
}

/** Parses with a zod schema or throws a 400 `invalid-input` naming every field. */
export function parseOr400<S extends z.ZodType>(schema: S, value: unknown, what = "request"): z.output<S> {
  const r = schema.safeParse(value);
  if (!r.success) throw invalidInput(zodIssues(r.error), `The ${what} is not valid.`);
  return r.data;
}

export function staleVersion(current: unknown, what: string): HttpError {
  return new HttpError(
    409,
    "stale-version",
    `Someone else changed this ${what} since you loaded it; nothing was saved. Reload and apply your change again.`,
    undefined,
    { current },
  );
}

/** PostgreSQL unique violation on a `…_key_uq` index → 400 naming `key`. */
export function mapDbError(err: unknown, what: string): unknown {
  // drizzle wraps the driver's error; the PostgreSQL fields sit on `cause`.
  const wrapped = err as { code?: string; cause?: unknown };
  const e = (wrapped && !wrapped.code && wrapped.cause ? wrapped.cause : err) as { code?: string; constraint?: string };
  if (e && e.code === "23505" && typeof e.constraint === "string" && e.constraint.endsWith("_key_uq"))
    return invalidInput([{ path: "key", message: `another ${what} of this mission already uses this key` }]);
  if (e && e.code === "23503")
    return new HttpError(
      409,
      "in-use",
      `This ${what} is still referenced by another row; remove that reference first.`,
    );
  return err;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUuid = (s: string) => UUID.test(s);
