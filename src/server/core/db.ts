import "server-only";
import { db } from "@db/client";
import { HttpError, invalidInput } from "./http";

export type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];
/** The database or a transaction: read helpers accept either. */
export type Queryable = typeof db | Tx;

/** Runs `fn` in one transaction; anything thrown rolls everything back. */
export function inTransaction<T>(fn: (tx: Tx) => Promise<T>): Promise<T> {
  return db.transaction(fn);
}

/**
 * Maps PostgreSQL constraint errors to answers: a unique violation on a
 * `…_key_uq` index → 400 naming `key`; a foreign-key violation → 409
 * `in-use`. Anything else is returned unchanged (to be rethrown).
 */
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
