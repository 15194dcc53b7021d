import type { RoleName } from "@/lib/permissions";

/** The review state of a plan revision (and of a mission: the state of its newest revision). */
export type ReviewState = "draft" | "in-review" | "baselined" | "changes-requested";
export const REVIEW_STATES: readonly ReviewState[] = ["draft", "in-review", "baselined", "changes-requested"];

/**
 * What someone does to the plan:
 * - `submit`: ask the team's leads and owners to review the newest revision;
 * - `baseline`, `request-changes`: the decision on a revision in review;
 * - `edit`: any change of the plan, which always stores a new draft revision
 *   (a baselined revision is never modified).
 */
export type ReviewAction = "submit" | "baseline" | "request-changes" | "edit";
export const REVIEW_ACTIONS: readonly ReviewAction[] = ["submit", "baseline", "request-changes", "edit"];

/** The decisions a lead or owner takes on a revision in review (the decide endpoint's choices). */
export const REVIEW_DECISIONS = ["baseline", "request-changes"] as const satisfies readonly ReviewAction[];
export type ReviewDecision = (typeof REVIEW_DECISIONS)[number];

export interface ReviewStep {
  state: ReviewState;
  action: ReviewAction;
  role: RoleName;
  /** Finding keys (see `findingKey`) of the revision's open error findings. */
  openErrorKeys: readonly string[];
  /** Finding keys that carry a recorded waiver. */
  waivedKeys: readonly string[];
}

export type ReviewRefusal =
  | { ok: false; code: "forbidden"; reason: string }
  | { ok: false; code: "invalid-transition"; reason: string }
  | { ok: false; code: "unwaived-errors"; reason: string; unwaived: string[] };

export type ReviewOutcome = { ok: true; next: ReviewState } | ReviewRefusal;

/** The part of a finding that review and comparison need. */
export interface FindingLike {
  code: string;
  severity: "error" | "warning" | "info";
  chain: string;
  channel: string | null;
  message: string;
}
