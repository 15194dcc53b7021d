/**
 * A child process for tests that must survive an engine that never returns:
 * reads one plan document (JSON) per stdin line, answers one JSON line
 * `{ steps }` (the work steps `checkPlan` reported), `{ threw }` or
 * `{ invalid }` per document. Prints `ready` first.
 */
import { createInterface } from "node:readline";
import { checkPlan } from "@/lib/plan";
import { parsePlan } from "@/schemas/plan";

process.stdout.write("ready\n");
createInterface({ input: process.stdin }).on("line", (line) => {
  const r = parsePlan(JSON.parse(line));
  if (!r.ok) {
    process.stdout.write(`${JSON.stringify({ invalid: r.issues })}\n`);
    return;
  }
  try {
    const work = { steps: 0 };
    checkPlan(r.plan, { work });
    process.stdout.write(`${JSON.stringify({ steps: work.steps })}\n`);
  } catch (e) {
    process.stdout.write(`${JSON.stringify({ threw: e instanceof Error ? e.message : String(e) })}\n`);
  }
});
