import type { ReviewState } from "../types";

/**
 * The product's words for the review states and outcomes (ADR 030). The
 * stored codes (`changes-requested`, the `request-changes` decision) stay as
 * they are: they are identifiers of the API and the database, not words.
 */
export const REVIEW_STATE_WORDS: Record<ReviewState, string> = {
  draft: "Draft",
  "in-review": "In review",
  baselined: "Baselined",
  "changes-requested": "Returned",
};

/** Outcomes of one review (db/schema/review.ts `outcome`), in lower case for running text. */
export const REVIEW_OUTCOME_WORDS: Record<string, string> = {
  open: "waiting for a decision",
  baselined: "baselined",
  "changes-requested": "returned for rework",
  withdrawn: "withdrawn by an edit",
};
