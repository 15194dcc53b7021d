"use client";
import Link from "next/link";
import type { ReviewAbilities } from "./panel/abilities";
import { Actions } from "./panel/actions";
import { Comments } from "./panel/comments";
import { ErrorLine } from "./panel/error-line";
import { History } from "./panel/history";
import { OpenErrors } from "./panel/open-errors";
import { ReviewStateBadge } from "./state-badge";
import { useReviewQuery } from "./use-review";

export type { ReviewAbilities };

/**
 * The review section of the mission overview: state badge, submit and
 * decision buttons for the roles that may use them (the server checks
 * again), a waiver form beside each open error finding, the review history
 * and the comment thread.
 */
export function ReviewPanel({ missionId, can }: { missionId: string; can: ReviewAbilities }) {
  const review = useReviewQuery(missionId);
  const d = review.data;
  return (
    <section aria-labelledby="review-heading" className="mt-8 rounded border border-slate-300 bg-white p-4">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="review-heading" className="text-lg font-semibold text-slate-900">
          Review
        </h2>
        {d ? <ReviewStateBadge state={d.state} /> : null}
        {d?.revision ? (
          <span className="text-sm text-slate-700">
            revision {d.revision.number} by {d.revision.authorName}
            {d.baselineRevision ? ` · baseline: revision ${d.baselineRevision}` : " · no baseline yet"}
          </span>
        ) : null}
        <span className="ml-auto flex gap-3 text-sm">
          {d?.revision && d.revision.number > 1 ? (
            <Link
              className="text-sky-800 underline"
              href={`/missions/${missionId}/compare?from=${d.baselineRevision ?? d.revision.number - 1}&to=${d.revision.number}`}
            >
              Compare revisions
            </Link>
          ) : null}
          <Link className="text-sky-800 underline" href={`/audit?mission=${missionId}`}>
            Audit trail
          </Link>
        </span>
      </div>
      {review.isPending ? <p className="mt-2 text-sm text-slate-600">Loading the review…</p> : null}
      <ErrorLine error={review.error} />
      {d ? (
        <>
          <Actions missionId={missionId} data={d} can={can} />
          <OpenErrors missionId={missionId} data={d} can={can} />
          <History data={d} />
          <Comments missionId={missionId} data={d} can={can} />
        </>
      ) : null}
    </section>
  );
}
