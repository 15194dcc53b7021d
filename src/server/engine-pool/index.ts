import "server-only";
import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import type { ResultDocument } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";
import { HttpError } from "@/server/core/http";
import { PoolError, WorkerPool } from "./pool";
import type { EngineAnswer, EngineTask, TextCheck } from "./protocol";

export { PoolError, WorkerPool } from "./pool";
export type { EngineAnswer, EngineTask, TextCheck } from "./protocol";

/** The engine pool's type: engine tasks in, their answers out. */
export type EnginePool = WorkerPool<EngineTask, EngineAnswer>;

/**
 * The server's engine pool (docs/decisions/028-api-speed.md): every check
 * the server runs (`POST /api/v1/check`, and the re-check of a save inside
 * its transaction) runs `checkPlan` on one of these worker threads, so that
 * a long check never holds up the request thread and the other requests
 * it serves.
 *
 * The worker script is named by `new Worker(new URL(…, import.meta.url))`,
 * the form Next's bundler recognises: `next build` compiles
 * engine-worker.ts and the engine into a chunk of its own, which the built
 * app starts. Outside Next (unit tests, tsx scripts) the TypeScript source
 * itself is started, through tsx.
 */

/** Threads of the pool: HETEROLANE_ENGINE_THREADS, or the cores less one for the request thread, 2 to 4. */
export function enginePoolSize(
  setting = process.env.HETEROLANE_ENGINE_THREADS,
  cores = availableParallelism(),
): number {
  if (setting !== undefined && setting !== "") {
    const n = Number(setting);
    if (!Number.isInteger(n) || n < 1 || n > 64)
      throw new Error(`HETEROLANE_ENGINE_THREADS must be a whole number from 1 to 64, not "${setting}"`);
    return n;
  }
  return Math.min(4, Math.max(2, cores - 1));
}

/**
 * Starts one engine thread. Inside a Next server bundle (`NEXT_RUNTIME` is
 * set) the worker is the compiled chunk; elsewhere the TypeScript source is
 * loaded through tsx's loader, registered in the new thread first.
 */
export function spawnEngineWorker(): Worker {
  if (process.env.NEXT_RUNTIME) return new Worker(new URL("./engine-worker.ts", import.meta.url));
  return spawnTypeScriptWorker(new URL("./engine-worker.ts", import.meta.url));
}

/** A worker thread running a TypeScript module through tsx (tests and scripts; tsx is a development dependency). */
export function spawnTypeScriptWorker(url: URL): Worker {
  const boot = `import("tsx/esm/api").then((tsx) => { tsx.register(); return import(${JSON.stringify(url.href)}); });`;
  return new Worker(boot, { eval: true });
}

let pool: EnginePool | null = null;

/** The process's one engine pool, started on first use (its threads on demand). */
export function enginePool(): EnginePool {
  if (!pool) {
    pool = new WorkerPool<EngineTask, EngineAnswer>({ size: enginePoolSize(), spawn: spawnEngineWorker });
    // A stopping Node process (no more work) shuts the pool down; `process.exit` (Next's
    // SIGTERM/SIGINT handling) ends its threads with the process. Idle threads never hold it open.
    process.once("beforeExit", () => void closeEnginePool());
  }
  return pool;
}

/** Shuts the engine pool down (waiting and running checks are refused); the next check starts a new one. */
export async function closeEnginePool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.close();
}

/**
 * 503 `engine-unavailable`: the engine's thread stopped or the pool is
 * shutting down; nothing was saved, and the same request may be retried.
 */
export const engineUnavailable = (why: string) =>
  new HttpError(
    503,
    "engine-unavailable",
    `The plan could not be checked right now (${why}); nothing was saved. Try again in a few seconds.`,
  );

/**
 * 422 `check-failed`: the engine threw on this plan (a fault of the engine,
 * logged on the server); nothing was saved. Retrying the same plan fails again.
 */
export const checkFailed = () =>
  new HttpError(
    422,
    "check-failed",
    "The engine could not check this plan (the fault is on our side and has been logged); nothing was saved.",
  );

/** Runs one engine task on the pool, its faults turned into HttpErrors (422 / 503), never a 500. */
async function runTask(task: EngineTask, what: string, engine: () => EnginePool): Promise<EngineAnswer> {
  try {
    return await engine().run(task);
  } catch (err) {
    if (!(err instanceof PoolError)) throw err;
    console.error(`[engine-pool] check of ${what} failed (${err.kind}): ${err.message}`);
    if (err.kind === "failed") throw checkFailed();
    throw engineUnavailable(err.kind === "closed" ? "the server is stopping" : "the checking thread stopped");
  }
}

/**
 * `checkPlan(plan)` run on the engine pool: the same result document, or an
 * HttpError (422 `check-failed` when the engine throws, 503
 * `engine-unavailable` when its thread dies or the pool is closing), never a 500.
 */
export async function checkInPool(plan: Plan, engine: () => EnginePool = enginePool): Promise<ResultDocument> {
  return (await runTask({ kind: "plan", plan }, `plan "${plan.name}"`, engine)) as ResultDocument;
}

/**
 * `parsePlanText(text)` and, for a valid plan, `JSON.stringify(checkPlan(plan))`,
 * both on the engine pool (POST /api/v1/check): the plan's issues or its
 * result as JSON text; faults as in checkInPool.
 */
export async function checkTextInPool(text: string, engine: () => EnginePool = enginePool): Promise<TextCheck> {
  return (await runTask({ kind: "text", text }, "a posted plan", engine)) as TextCheck;
}
