"use client";

import { ApiError, apiFetch } from "./api";

/** The part of the review overview (GET …/review) this check reads. */
export interface ReviewStateSummary {
  state: string;
  revision: { number: number } | null;
}

/** The question asked before saving while a revision is in review: it names what the save does. */
export function editDuringReviewQuestion(revision: number): string {
  return (
    `Revision ${revision} is in review. Saving stores your change as a new draft revision and withdraws ` +
    `that review: the reviewers are told by e-mail, and the plan must be submitted again. Save anyway?`
  );
}

/**
 * Asks before a save while the mission's newest revision is in review and
 * throws `not-saved` (an ApiError, shown like any refusal) when the person
 * says no. The review state is read fresh from the server, not from a cache
 * that someone else's submit may have outdated; when it cannot be read the
 * save goes ahead (the server withdraws the review and mails the reviewers
 * either way). `ask` and `read` are parameters for the tests.
 */
export async function confirmEditDuringReview(
  missionId: string,
  ask: (question: string) => boolean = (q) => window.confirm(q),
  read: (url: string) => Promise<ReviewStateSummary> = (url) => apiFetch<ReviewStateSummary>(url),
): Promise<void> {
  let overview: ReviewStateSummary;
  try {
    overview = await read(`/api/v1/missions/${encodeURIComponent(missionId)}/review`);
  } catch {
    return;
  }
  if (overview.state !== "in-review" || !overview.revision) return;
  if (!ask(editDuringReviewQuestion(overview.revision.number)))
    throw new ApiError(
      0,
      "not-saved",
      `Not saved: revision ${overview.revision.number} stays in review. Your change is still in the form.`,
    );
}

/** The mission of an upload URL that applies (…/missions/ID/uploads/…?…apply=1), or null for a preview. */
export function missionOfApplyingUpload(url: string): string | null {
  const m = /\/api\/v1\/missions\/([^/?]+)\/uploads\/[^?]*\?(?:.*&)?apply=1(?:&|$)/.exec(url);
  return m ? decodeURIComponent(m[1]!) : null;
}
