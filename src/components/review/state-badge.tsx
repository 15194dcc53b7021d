import { reviewStateLabel, type ReviewState } from "@/lib/review";

const LOOK: Record<ReviewState, string> = {
  draft: "bg-slate-100 text-slate-800 ring-slate-300",
  "in-review": "bg-amber-50 text-amber-900 ring-amber-300",
  baselined: "bg-emerald-50 text-emerald-900 ring-emerald-300",
  "changes-requested": "bg-rose-50 text-rose-900 ring-rose-300",
};

/** The review state of a plan as a small labelled badge (text, not colour alone). */
export function ReviewStateBadge({ state }: { state: ReviewState }) {
  const cls = LOOK[state] ?? LOOK.draft;
  return (
    <span
      data-testid="review-state"
      className={`inline-flex items-center rounded px-2 py-0.5 text-xs font-semibold ring-1 ${cls}`}
    >
      {reviewStateLabel(state)}
    </span>
  );
}
