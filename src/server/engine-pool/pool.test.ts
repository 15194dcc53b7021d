import { execFile } from "node:child_process";
import { promisify } from "node:util";
import fc from "fast-check";
import { afterAll, describe, expect, it, vi } from "vitest";
import { checkPlan } from "@/lib/plan";
import { parsePlan, parsePlanText, type Plan } from "@/schemas/plan";
import { HttpError } from "@/server/core/http";
import { demoPlan } from "@db/seed/mission-demo-plan";
import { limitsPlan } from "@/bench/limits-plan";
import { validPlanArb } from "../../../tests/fixtures/plan-arbitrary";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";
import {
  checkInPool,
  checkTextInPool,
  enginePoolSize,
  PoolError,
  spawnEngineWorker,
  spawnTypeScriptWorker,
  WorkerPool,
  type EngineAnswer,
  type EngineTask,
} from ".";

// Correctness of the engine pool (docs/decisions/028-api-speed.md): the
// threads answer exactly what the engine answers in the request thread,
// their faults become error answers (never a crash, never a 500), and the
// pool stops cleanly. No timing is asserted here; speed is for bench:api.
// Each thread starts the TypeScript sources through tsx, which takes a second
// or more on a loaded machine: hence the generous time-outs.
vi.setConfig({ testTimeout: 120_000 });

function plan(doc: unknown): Plan {
  const r = parsePlan(doc);
  if (!r.ok) throw new Error(`fixture plan invalid: ${JSON.stringify(r.issues[0])}`);
  return r.plan;
}
const named = (name: string) => plan({ ...validPlanInput(), name });

const faultyWorker = new URL("../../../tests/fixtures/engine-pool/faulty-worker.ts", import.meta.url);
const pools: WorkerPool<EngineTask, EngineAnswer>[] = [];
function newPool(size: number, spawn = spawnEngineWorker, perThread?: number) {
  const p = new WorkerPool<EngineTask, EngineAnswer>({ size, spawn, perThread });
  pools.push(p);
  return p;
}
const task = (p: Plan): EngineTask => ({ kind: "plan", plan: p });
afterAll(async () => {
  await Promise.all(pools.map((p) => p.close()));
});

describe("engine pool: same results as the engine in the request thread", () => {
  const pool = newPool(2);

  it("checks the demo plan and the plan at the format's limits exactly as checkPlan does", async () => {
    for (const doc of [demoPlan(), limitsPlan()]) {
      const p = plan(doc);
      expect(await checkInPool(p, () => pool)).toEqual(checkPlan(p));
    }
  });

  it("answers every generated plan exactly as checkPlan does, many at once, each with its own result", async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(validPlanArb, { minLength: 1, maxLength: 6 }), async (docs) => {
        const plans = docs.map(plan);
        const answers = await Promise.all(plans.map((p) => checkInPool(p, () => pool)));
        answers.forEach((a, i) => expect(a).toEqual(checkPlan(plans[i]!)));
        // The same plans as JSON text: the thread validates them too and writes the result as JSON.
        const texts = await Promise.all(docs.map((d) => checkTextInPool(JSON.stringify(d), () => pool)));
        texts.forEach((t, i) => expect(t).toEqual({ ok: true, json: JSON.stringify(checkPlan(plans[i]!)) }));
      }),
      { numRuns: 8 },
    );
    expect(pool.threads).toBeLessThanOrEqual(2);
    expect(pool.pending).toBe(0);
  });

  it("answers the issues parsePlanText finds in a posted text, malformed JSON included", async () => {
    const broken = JSON.stringify({ ...validPlanInput(), channels: [{ id: "x" }] });
    for (const text of ["{ not json", "[]", broken, '{"format":"heterolane.plan/9"}']) {
      const expected = parsePlanText(text);
      expect(expected.ok).toBe(false);
      if (expected.ok) continue;
      expect(await checkTextInPool(text, () => pool)).toEqual({ ok: false, issues: expected.issues });
    }
  });
});

describe("engine pool: faults", () => {
  it("rejects a task whose engine throws with kind failed, and the thread goes on serving", async () => {
    const pool = newPool(1, () => spawnTypeScriptWorker(faultyWorker));
    await expect(pool.run(task(named("throw")))).rejects.toMatchObject({
      kind: "failed",
      message: "engine fault for the test",
    });
    const ok = named("fine");
    expect(await pool.run(task(ok))).toEqual(checkPlan(ok));
    expect(pool.threads).toBe(1);
  });

  it("rejects the task of a thread that dies with kind crashed, replaces the thread and runs the tasks queued behind it", async () => {
    const pool = newPool(1, () => spawnTypeScriptWorker(faultyWorker), 1);
    const ok = named("after the crash");
    const [crashed, after] = await Promise.allSettled([pool.run(task(named("exit"))), pool.run(task(ok))]);
    expect(crashed.status).toBe("rejected");
    expect((crashed as PromiseRejectedResult).reason).toBeInstanceOf(PoolError);
    expect((crashed as PromiseRejectedResult).reason.kind).toBe("crashed");
    expect(after).toEqual({ status: "fulfilled", value: checkPlan(ok) });
  });

  it("with two tasks handed to a thread, rejects both when it dies and runs the next queued task on a new thread", async () => {
    const pool = newPool(1, () => spawnTypeScriptWorker(faultyWorker), 2);
    const ok = named("queued behind");
    const settled = await Promise.allSettled([
      pool.run(task(named("exit"))),
      pool.run(task(named("handed with it"))),
      pool.run(task(ok)),
    ]);
    expect(settled.slice(0, 2).map((r) => r.status === "rejected" && r.reason.kind)).toEqual(["crashed", "crashed"]);
    expect(settled[2]).toEqual({ status: "fulfilled", value: checkPlan(ok) });
  });

  it("hands a thread at most perThread tasks and answers each with its own result", async () => {
    const pool = newPool(2, spawnEngineWorker, 3);
    const plans = Array.from({ length: 9 }, (_, i) => named(`plan ${i}`));
    const running = plans.map((p) => pool.run(task(p)));
    expect(pool.threads).toBe(2);
    expect(pool.handed).toEqual([3, 3]);
    expect(pool.pending).toBe(9);
    const answers = await Promise.all(running);
    answers.forEach((a, i) => expect(a).toEqual(checkPlan(plans[i]!)));
    expect(pool.pending).toBe(0);
  });

  it("refuses an input that cannot be sent to a thread, as that task's failure only", async () => {
    const pool = newPool(1);
    const bad = { ...named("unsendable"), extra: () => 1 } as unknown as Plan;
    await expect(pool.run(task(bad))).rejects.toMatchObject({ kind: "failed" });
    const ok = named("sendable");
    expect(await pool.run(task(ok))).toEqual(checkPlan(ok));
  });

  it("turns the engine's faults into 422 check-failed and 503 engine-unavailable answers, never a 500", async () => {
    const pool = newPool(1, () => spawnTypeScriptWorker(faultyWorker));
    const engine = () => pool;
    const quiet = console.error;
    console.error = () => {};
    try {
      await expect(checkInPool(named("throw"), engine)).rejects.toMatchObject({ status: 422, code: "check-failed" });
      await expect(checkInPool(named("exit"), engine)).rejects.toMatchObject({
        status: 503,
        code: "engine-unavailable",
      });
      const stopping = newPool(1, () => spawnTypeScriptWorker(faultyWorker));
      // Each answer is caught at once (as a route does), so that no rejection is left unhandled.
      const hung = checkInPool(named("hang"), () => stopping).catch((e: unknown) => e);
      const waiting = checkInPool(named("fine"), () => stopping).catch((e: unknown) => e);
      await new Promise((r) => setTimeout(r, 50));
      await stopping.close();
      for (const p of [hung, waiting]) {
        const err = await p;
        expect(err).toBeInstanceOf(HttpError);
        expect((err as HttpError).status).toBe(503);
      }
    } finally {
      console.error = quiet;
    }
    const ok = named("fine");
    expect(await checkInPool(ok, engine)).toEqual(checkPlan(ok));
  });
});

describe("engine pool: shutting down", () => {
  it("close() stops every thread, refuses the waiting and new tasks, and resolves", async () => {
    const pool = newPool(2, () => spawnTypeScriptWorker(faultyWorker));
    const running = Promise.allSettled([
      pool.run(task(named("hang"))),
      pool.run(task(named("hang"))),
      pool.run(task(named("queued"))),
    ]);
    await new Promise((r) => setTimeout(r, 50));
    await pool.close();
    const settled = await running;
    for (const s of settled) {
      expect(s.status).toBe("rejected");
      expect((s as PromiseRejectedResult).reason.kind).toBe("closed");
    }
    expect(pool.threads).toBe(0);
    await expect(pool.run(task(named("late")))).rejects.toMatchObject({ kind: "closed" });
  });

  it("an idle pool does not hold a finished process open", async () => {
    const script = new URL("../../../tests/fixtures/engine-pool/pool-script.ts", import.meta.url);
    const { stdout } = await promisify(execFile)(
      process.execPath,
      ["--conditions=react-server", "--import", "tsx", script.pathname],
      { timeout: 60_000 },
    );
    const expected = checkPlan(plan(validPlanInput())).findings.length;
    expect(stdout.trim()).toBe(`findings ${expected} threads 1`);
  });
});

describe("enginePoolSize", () => {
  it("takes HETEROLANE_ENGINE_THREADS when set, otherwise the cores less one, between 2 and 4", () => {
    expect(enginePoolSize("3", 2)).toBe(3);
    expect(enginePoolSize(undefined, 1)).toBe(2);
    expect(enginePoolSize("", 2)).toBe(2);
    expect(enginePoolSize(undefined, 4)).toBe(3);
    expect(enginePoolSize(undefined, 32)).toBe(4);
    for (const bad of ["0", "-1", "1.5", "many", "65"])
      expect(() => enginePoolSize(bad, 2)).toThrow(/HETEROLANE_ENGINE_THREADS/);
  });
});
