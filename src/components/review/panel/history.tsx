import { reviewStateLabel } from "@/lib/review";
import type { ReviewOverview } from "../use-review";
import { when } from "./abilities";

/** Every review of the mission: who submitted which revision, and the outcome. */
export function History({ data }: { data: ReviewOverview }) {
  if (data.reviews.length === 0) return null;
  return (
    <div className="mt-4">
      <h3 className="text-sm font-semibold text-slate-900">Reviews</h3>
      <ul className="mt-1 space-y-1 text-sm text-slate-800">
        {data.reviews.map((r) => (
          <li key={r.id}>
            Revision {r.revision}: submitted by {r.submittedBy} ({when(r.submittedAt)}){r.note ? ` “${r.note}”` : ""} —{" "}
            {reviewStateLabel(r.outcome, { outcome: true })}
            {r.decidedBy && r.outcome !== "withdrawn" ? ` by ${r.decidedBy}` : ""}
            {r.decisionNote && r.outcome !== "withdrawn" ? `: “${r.decisionNote}”` : ""}
            {r.waivers.length ? ` (${r.waivers.length} waiver${r.waivers.length === 1 ? "" : "s"})` : ""}
          </li>
        ))}
      </ul>
    </div>
  );
}
