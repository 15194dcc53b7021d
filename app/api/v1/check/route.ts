import { checkPlan } from "@/lib/plan";
import { parsePlan, parsePlanText, type PlanIssue } from "@/schemas/plan";
import { ANY_MEMBER, guarded, HttpError, json, readJsonBody } from "@/server/core";

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
 * may call it; nothing is stored. 401 signed out, 413 above 1 MB, 400
 * `invalid-plan` with every issue (malformed JSON included). The body is
 * parsed here, not by the guard: a plan document has its own issue format.
 */
export const POST = guarded(ANY_MEMBER, { what: "check plans" }, async ({ request }) => {
  // A copy of the body is kept so that malformed JSON can be reported with
  // its position (readJsonBody's own message has none).
  const copy = request.clone();
  let body: unknown;
  try {
    body = await readJsonBody(request);
  } catch (e) {
    if (e instanceof HttpError && e.code === "invalid-json") {
      const parsed = parsePlanText(await copy.text());
      throw invalidPlan(parsed.ok ? [{ path: "", message: "not valid JSON" }] : parsed.issues);
    }
    throw e;
  }
  const parsed = parsePlan(body);
  if (!parsed.ok) throw invalidPlan(parsed.issues);
  return json(checkPlan(parsed.plan), 200, { "cache-control": "no-store" });
});
