import "server-only";
import { and, eq } from "drizzle-orm";
import { planRevisions, reviews } from "@db/schema";
import type { ReviewState } from "@/lib/review";
import { writeActivity } from "@/server/core/activity";
import type { PlanEditedEvent, PlanEvents } from "@/server/core/plan-events";

/**
 * Review's side of the plan events (src/server/core/plan-events.ts): the one
 * module of review the workspace imports. Revisions are never modified by an
 * edit (every change stores a new draft revision, so a baselined revision
 * stays exactly as approved); an edit during a review withdraws that review:
 * the submitted revision goes back to draft and its open review row is
 * closed as `withdrawn`.
 */
async function withdrawOpenReview({ tx, missionId, actor }: PlanEditedEvent): Promise<void> {
  const inReview: ReviewState = "in-review";
  const draft: ReviewState = "draft";
  const pending = await tx
    .update(planRevisions)
    .set({ status: draft })
    .where(and(eq(planRevisions.missionId, missionId), eq(planRevisions.status, inReview)))
    .returning({ number: planRevisions.number });
  if (pending.length === 0) return;
  await tx
    .update(reviews)
    .set({
      outcome: "withdrawn",
      decidedBy: actor.userId,
      decidedByName: actor.name,
      decidedAt: new Date(),
      decisionNote: "The plan was edited during the review.",
    })
    .where(and(eq(reviews.missionId, missionId), eq(reviews.outcome, "open")));
  for (const p of pending)
    await writeActivity(tx, actor, {
      missionId,
      action: "review-withdraw",
      entity: `revision ${p.number}`,
      summary: `Review of revision ${p.number} withdrawn: the plan was edited during the review`,
      revisionBefore: p.number,
      revisionAfter: p.number,
    });
}

export const reviewPlanEvents: PlanEvents = { planEdited: withdrawOpenReview };
