import { roleCan, type Permission } from "@/lib/permissions";
import type { ReviewAction, ReviewOutcome, ReviewState, ReviewStep } from "./types";

const NEEDS: Record<ReviewAction, { permission: Permission; what: string }> = {
  submit: { permission: { review: ["submit"] }, what: "submit a plan for review" },
  baseline: { permission: { review: ["decide"] }, what: "baseline a plan" },
  "request-changes": { permission: { review: ["decide"] }, what: "return a plan for rework" },
  edit: { permission: { plan: ["edit"] }, what: "edit the plan" },
};

/** States each action may start from. */
const FROM: Record<ReviewAction, readonly ReviewState[]> = {
  submit: ["draft", "changes-requested"],
  baseline: ["in-review"],
  "request-changes": ["in-review"],
  edit: ["draft", "in-review", "baselined", "changes-requested"],
};

const TO: Record<ReviewAction, ReviewState> = {
  submit: "in-review",
  baseline: "baselined",
  "request-changes": "changes-requested",
  edit: "draft",
};

const LABEL: Record<ReviewState, string> = {
  draft: "a draft",
  "in-review": "in review",
  baselined: "baselined",
  "changes-requested": "returned for rework",
};

/**
 * The review workflow as one pure function: the next state of the plan, or
 * a refusal with a reason. Checks, in order: the role may act (`forbidden`),
 * the action is allowed from the state (`invalid-transition`), and for a
 * baseline every open error finding carries a waiver (`unwaived-errors`).
 *
 * draft ─submit→ in-review ─baseline→ baselined
 *                    └─request-changes→ changes-requested ─submit→ in-review
 * Any edit stores a new draft revision (from a baselined one too, which
 * stays as it was).
 */
export function nextReviewState(step: ReviewStep): ReviewOutcome {
  const need = NEEDS[step.action];
  if (!roleCan(step.role, need.permission))
    return { ok: false, code: "forbidden", reason: `The ${step.role} role may not ${need.what}.` };
  if (!FROM[step.action].includes(step.state))
    return {
      ok: false,
      code: "invalid-transition",
      reason: `The plan is ${LABEL[step.state]}; you can ${need.what} only when it is ${FROM[step.action]
        .map((s) => LABEL[s])
        .join(" or ")}.`,
    };
  if (step.action === "baseline") {
    const waived = new Set(step.waivedKeys);
    const unwaived = [...new Set(step.openErrorKeys)].filter((k) => !waived.has(k));
    if (unwaived.length > 0)
      return {
        ok: false,
        code: "unwaived-errors",
        reason: `${unwaived.length} open error finding${unwaived.length === 1 ? " has" : "s have"} no waiver; record a waiver for each or fix the plan before baselining.`,
        unwaived,
      };
  }
  return { ok: true, next: TO[step.action] };
}
