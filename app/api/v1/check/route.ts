import { checkPlan } from "@/lib/plan";
import { parsePlanText, type PlanIssue } from "@/schemas/plan";
import { ANY_MEMBER, guarded, HttpError, json, readJsonText } from "@/server/core";

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
 * document has its own issue format.
 */
export const POST = guarded(ANY_MEMBER, { what: "check plans" }, async ({ request }) => {
  const parsed = parsePlanText(await readJsonText(request));
  if (!parsed.ok) throw invalidPlan(parsed.issues);
  return json(checkPlan(parsed.plan), 200, { "cache-control": "no-store" });
});
