/** What the engine pool (pool.ts) sends a worker thread: one task, by id. */
export interface TaskMessage<I = unknown> {
  id: number;
  input: I;
}

/** What a worker thread answers for a task: its result, or the message of the error it threw. */
export type AnswerMessage<R = unknown> =
  { id: number; ok: true; result: R } | { id: number; ok: false; message: string };
