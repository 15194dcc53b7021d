import "server-only";
import { db } from "@db/client";
import { HttpError, invalidInput } from "./http";

export type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];
/** The database or a transaction: read helpers accept either. */
export type Queryable = typeof db | Tx;

/** Work queued by `afterCommit`, per open transaction (a WeakMap: a finished transaction leaves nothing behind). */
const AFTER_COMMIT = new WeakMap<Tx, (() => Promise<void>)[]>();

/**
 * Runs `fn` in one transaction; anything thrown rolls everything back.
 * Work queued with `afterCommit` runs once the transaction has committed
 * (never after a rollback), in order; a failure there is logged and does not
 * undo the committed change.
 */
export async function inTransaction<T>(fn: (tx: Tx) => Promise<T>): Promise<T> {
  const queued: (() => Promise<void>)[] = [];
  const out = await db.transaction((tx) => {
    AFTER_COMMIT.set(tx, queued);
    return fn(tx);
  });
  for (const work of queued) {
    try {
      await work();
    } catch (err) {
      console.error("[db] work after commit failed:", err);
    }
  }
  return out;
}

/**
 * Queues `work` (e.g. sending e-mail about the change) to run after `tx`
 * commits. Outside a transaction of `inTransaction` the work is dropped with
 * a log line: it must never run for a change that may still roll back.
 */
export function afterCommit(tx: Tx, work: () => Promise<void>): void {
  const queued = AFTER_COMMIT.get(tx);
  if (queued) queued.push(work);
  else console.error("[db] afterCommit outside inTransaction: the work was dropped");
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
