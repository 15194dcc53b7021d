import { parsePlanText, type PlanIssue } from "@/schemas/plan";
import { ANY_MEMBER, guarded, HttpError, json, readJsonText } from "@/server/core";
import { checkInPool } from "@/server/engine-pool";

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
 * document has its own issue format. The engine runs on the server's engine
 * pool (src/server/engine-pool), never on the request thread: 422
 * `check-failed` if it throws on the plan, 503 `engine-unavailable` if its
 * thread stops.
 */
export const POST = guarded(ANY_MEMBER, { what: "check plans" }, async ({ request }) => {
  const parsed = parsePlanText(await readJsonText(request));
  if (!parsed.ok) throw invalidPlan(parsed.issues);
  return json(await checkInPool(parsed.plan), 200, { "cache-control": "no-store" });
});
