import type { Worker } from "node:worker_threads";
import type { AnswerMessage, TaskMessage } from "./protocol";

/**
 * A fixed-size pool of worker threads (docs/decisions/028-api-speed.md).
 * Tasks wait in one queue, first come first served; a thread is started
 * when a task needs one (up to `size`) and kept for the next. Each thread
 * is handed up to `perThread` tasks at once (it runs them one after the
 * other), so that it finds its next task waiting when it finishes one
 * instead of sleeping until the answer has crossed back and a new task has
 * been sent: on a busy machine every such wake-up waits for a free core.
 * A thread holds the process open only while it works: an idle pool never
 * keeps a stopping server or a finished script alive.
 *
 * Failures never take the caller down: a task whose code throws is rejected
 * with `PoolError` kind `failed` (the thread stays), a thread that dies
 * (crash, out of memory, `process.exit` inside it) rejects the tasks it was
 * handed with kind `crashed` and is replaced for the next task, and after `close()` every
 * waiting and new task is rejected with kind `closed`.
 */

export type PoolErrorKind = "failed" | "crashed" | "closed";

export class PoolError extends Error {
  constructor(
    readonly kind: PoolErrorKind,
    message: string,
  ) {
    super(message);
    this.name = "PoolError";
  }
}

export interface PoolOptions {
  /** Number of threads at most (a positive integer). */
  size: number;
  /** Starts one thread running the pool's worker script (which answers TaskMessage with AnswerMessage). */
  spawn: () => Worker;
  /** Tasks handed to one thread at a time (default 2). */
  perThread?: number;
}

interface Task<I, R> {
  id: number;
  input: I;
  resolve: (r: R) => void;
  reject: (e: Error) => void;
}

interface Slot<I, R> {
  worker: Worker;
  /** The tasks handed to this thread and not answered yet, by id. */
  tasks: Map<number, Task<I, R>>;
  /** The error the thread reported before it exited, if any. */
  error?: Error;
}

export class WorkerPool<I, R> {
  private readonly slots: Slot<I, R>[] = [];
  private readonly queue: Task<I, R>[] = [];
  private readonly exits = new Set<Promise<void>>();
  private nextId = 1;
  private closed = false;

  private readonly perThread: number;

  constructor(private readonly options: PoolOptions) {
    if (!Number.isInteger(options.size) || options.size < 1)
      throw new RangeError(`pool size must be a positive integer, not ${options.size}`);
    this.perThread = options.perThread ?? 2;
    if (!Number.isInteger(this.perThread) || this.perThread < 1)
      throw new RangeError(`tasks per thread must be a positive integer, not ${options.perThread}`);
  }

  /** Threads running now (started on demand, so at most `size`). */
  get threads(): number {
    return this.slots.length;
  }

  /** Tasks waiting for a thread or being run. */
  get pending(): number {
    return this.queue.length + this.slots.reduce((n, s) => n + s.tasks.size, 0);
  }

  /** Tasks handed to each running thread and not yet answered. */
  get handed(): number[] {
    return this.slots.map((s) => s.tasks.size);
  }

  /** Runs one task on a thread of the pool; its answer, or a PoolError. */
  run(input: I): Promise<R> {
    if (this.closed) return Promise.reject(new PoolError("closed", "the pool is shut down"));
    return new Promise<R>((resolve, reject) => {
      this.queue.push({ id: this.nextId++, input, resolve, reject });
      this.dispatch();
    });
  }

  /** Refuses new tasks, rejects the waiting ones and those in flight, and stops every thread. */
  async close(): Promise<void> {
    this.closed = true;
    for (const task of this.queue.splice(0)) task.reject(new PoolError("closed", "the pool is shut down"));
    const stopping = this.slots.map((slot) => {
      for (const task of slot.tasks.values())
        task.reject(new PoolError("closed", "the pool was shut down while the task ran"));
      slot.tasks.clear();
      return slot.worker.terminate();
    });
    await Promise.all(stopping);
    await Promise.all([...this.exits]);
  }

  private dispatch(): void {
    while (this.queue.length > 0 && !this.closed) {
      const slot = this.nextSlot();
      if (!slot) return;
      const task = this.queue.shift()!;
      slot.tasks.set(task.id, task);
      slot.worker.ref();
      try {
        slot.worker.postMessage({ id: task.id, input: task.input } satisfies TaskMessage<I>);
      } catch (err) {
        // The input cannot be copied to a thread (a function, a symbol…): that task alone fails.
        slot.tasks.delete(task.id);
        if (slot.tasks.size === 0) slot.worker.unref();
        task.reject(new PoolError("failed", `the task could not be sent to a thread: ${(err as Error).message}`));
      }
    }
  }

  /** An idle thread, else a new one (up to size), else the least busy thread with room, else none. */
  private nextSlot(): Slot<I, R> | null {
    const idle = this.slots.find((s) => s.tasks.size === 0);
    if (idle) return idle;
    const started = this.startThread();
    if (started) return started;
    let best: Slot<I, R> | null = null;
    for (const s of this.slots)
      if (s.tasks.size < this.perThread && (!best || s.tasks.size < best.tasks.size)) best = s;
    return best;
  }

  private startThread(): Slot<I, R> | null {
    if (this.slots.length >= this.options.size) return null;
    const worker = this.options.spawn();
    worker.unref();
    const slot: Slot<I, R> = { worker, tasks: new Map() };
    this.slots.push(slot);
    worker.on("message", (answer: AnswerMessage<R>) => {
      const task = slot.tasks.get(answer.id);
      if (!task) return;
      slot.tasks.delete(answer.id);
      if (slot.tasks.size === 0) worker.unref();
      if (answer.ok) task.resolve(answer.result);
      else task.reject(new PoolError("failed", answer.message));
      this.dispatch();
    });
    worker.on("error", (err) => {
      slot.error = err;
    });
    const exited: Promise<void> = new Promise<void>((done) => {
      worker.once("exit", (code: number) => {
        const i = this.slots.indexOf(slot);
        if (i >= 0) this.slots.splice(i, 1);
        const why = slot.error ? slot.error.message : `it exited with code ${code}`;
        for (const task of slot.tasks.values())
          task.reject(new PoolError("crashed", `the thread running the task stopped: ${why}`));
        slot.tasks.clear();
        this.exits.delete(exited);
        this.dispatch();
        done();
      });
    });
    this.exits.add(exited);
    return slot;
  }
}
