import { REVIEW_OUTCOME_WORDS, REVIEW_STATE_WORDS } from "./internals/review-words";
import type { ReviewState } from "./types";

/**
 * The label of a review state ("Returned", never the stored code
 * `changes-requested`), or of a review's outcome with `{ outcome: true }`
 * ("returned for rework", "withdrawn by an edit"). An unknown code is shown
 * as it is, so nothing stored is ever hidden.
 */
export function reviewStateLabel(code: ReviewState | string, opts: { outcome?: boolean } = {}): string {
  if (opts.outcome) return REVIEW_OUTCOME_WORDS[code] ?? code;
  return (REVIEW_STATE_WORDS as Record<string, string>)[code] ?? code;
}
