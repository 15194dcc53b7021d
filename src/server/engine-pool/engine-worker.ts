import { parentPort } from "node:worker_threads";
import { checkPlan } from "@/lib/plan";
import { parsePlanText } from "@/schemas/plan";
import type { AnswerMessage, EngineAnswer, EngineTask, TaskMessage } from "./protocol";

/**
 * One thread of the engine pool (pool.ts). A `plan` task is checked with
 * the same `checkPlan` the request thread would run and answers the result
 * document. A `text` task (the body of `POST /api/v1/check`) is validated
 * here too, with the same `parsePlanText`, and answers either its issues or
 * the result document already written as JSON, so that the request thread
 * neither parses the plan nor writes the result. An error the engine throws
 * is answered as its message (the pool turns it into an error answer,
 * never a crash of the server).
 */
function run(task: EngineTask): EngineAnswer {
  if (task.kind === "plan") return checkPlan(task.plan);
  const parsed = parsePlanText(task.text);
  if (!parsed.ok) return { ok: false, issues: parsed.issues };
  return { ok: true, json: JSON.stringify(checkPlan(parsed.plan)) };
}

const port = parentPort;
if (!port) throw new Error("engine-worker.ts runs only as a worker thread of the engine pool");
port.on("message", (task: TaskMessage<EngineTask>) => {
  let answer: AnswerMessage<EngineAnswer>;
  try {
    answer = { id: task.id, ok: true, result: run(task.input) };
  } catch (err) {
    answer = { id: task.id, ok: false, message: err instanceof Error ? err.message : String(err) };
  }
  port.postMessage(answer);
});
