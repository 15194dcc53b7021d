import type { PlanIssue } from "@/schemas/plan";
import { ANY_MEMBER, guarded, HttpError, readJsonText } from "@/server/core";
import { checkTextInPool } from "@/server/engine-pool";

export const dynamic = "force-dynamic";

function invalidPlan(issues: PlanIssue[]): HttpError {
  const n = issues.length;
  return new HttpError(
    400,
    "invalid-plan",
    `The plan document is not valid: ${n} problem${n === 1 ? "" : "s"}.`,
    issues,
  );
}

/**
 * POST /api/v1/check: checks a plan document (`heterolane.plan/1`) and
 * answers the result document (`heterolane.result/1`). Any signed-in member
 * may call it; nothing is stored. 401 signed out, 415 for a body that is not
 * JSON, 413 above 1 MB (declared or streamed; the body is read once, never
 * copied), 400 `invalid-plan` with every issue (malformed JSON included,
 * with its position). The body is parsed here, not by the guard: a plan
 * document has its own issue format. Validation and the engine run on the
 * server's engine pool (src/server/engine-pool), never on the request
 * thread, with the same parsePlanText and checkPlan as before: 422
 * `check-failed` if it throws on the plan, 503 `engine-unavailable` if its
 * thread stops.
 */
export const POST = guarded(ANY_MEMBER, { what: "check plans" }, async ({ request }) => {
  const checked = await checkTextInPool(await readJsonText(request));
  if (!checked.ok) throw invalidPlan(checked.issues);
  // The result comes back from the engine thread already written as JSON.
  return new Response(checked.json, {
    status: 200,
    headers: { "content-type": "application/json", "cache-control": "no-store" },
  });
});
