import { checkPlan } from "@/lib/plan";
import { parsePlan, parsePlanText, type PlanIssue } from "@/schemas/plan";
import { requireActor } from "@/server/auth/guard";
import { errorResponse, HttpError, readJsonBody } from "@/server/http";

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
 * `invalid-plan` with every issue (malformed JSON included).
 */
export async function POST(request: Request): Promise<Response> {
  try {
    await requireActor(request.headers);
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
    return Response.json(checkPlan(parsed.plan), { headers: { "cache-control": "no-store" } });
  } catch (e) {
    return errorResponse(e);
  }
}
