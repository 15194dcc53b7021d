import type { ResultDocument } from "@/lib/plan";
import type { Plan, PlanIssue } from "@/schemas/plan";

/** What the pool (pool.ts) sends a worker thread: one task, by id. */
export interface TaskMessage<I = unknown> {
  id: number;
  input: I;
}

/** What a worker thread answers for a task: its result, or the message of the error it threw. */
export type AnswerMessage<R = unknown> =
  { id: number; ok: true; result: R } | { id: number; ok: false; message: string };

/** The engine threads' tasks (engine-worker.ts): check a parsed plan, or validate and check a plan's JSON text. */
export type EngineTask = { kind: "plan"; plan: Plan } | { kind: "text"; text: string };

/** A text task's answer: the plan's issues, or its result document as JSON text. */
export type TextCheck = { ok: true; json: string } | { ok: false; issues: PlanIssue[] };

export type EngineAnswer = ResultDocument | TextCheck;
