import { parentPort } from "node:worker_threads";
import { checkPlan } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";
import type { TaskMessage, AnswerMessage } from "./protocol";

/**
 * One thread of the engine pool (pool.ts): checks each plan it is sent with
 * the same `checkPlan` the request thread would run, and answers the result
 * document, or the engine's error message when it throws (the pool turns
 * that into an error answer, never a crash of the server).
 */
const port = parentPort;
if (!port) throw new Error("engine-worker.ts runs only as a worker thread of the engine pool");
port.on("message", (task: TaskMessage<Plan>) => {
  let answer: AnswerMessage;
  try {
    answer = { id: task.id, ok: true, result: checkPlan(task.input) };
  } catch (err) {
    answer = { id: task.id, ok: false, message: err instanceof Error ? err.message : String(err) };
  }
  port.postMessage(answer);
});
