import "server-only";
import { and, eq } from "drizzle-orm";
import { activity, planRevisions, reviews } from "@db/schema";
import type { Actor } from "@/server/auth/actor";
import type { Tx } from "@/server/workspace/tx";

/**
 * Called by the workspace's save path (saveAndCheck) before it stores a new
 * revision. Revisions are never modified by an edit — every change stores a
 * new draft revision, so a baselined revision stays exactly as approved.
 * An edit during a review withdraws that review: the submitted revision goes
 * back to draft and its open review row is closed as `withdrawn`.
 * The caller holds the mission row lock.
 */
export async function onPlanEdited(tx: Tx, missionId: string, actor: Actor): Promise<void> {
  const pending = await tx
    .update(planRevisions)
    .set({ status: "draft" })
    .where(and(eq(planRevisions.missionId, missionId), eq(planRevisions.status, "in-review")))
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
    await tx.insert(activity).values({
      teamId: actor.teamId,
      missionId,
      actorId: actor.userId,
      actorName: actor.name,
      action: "review-withdraw",
      entity: `revision ${p.number}`,
      summary: `Review of revision ${p.number} withdrawn: the plan was edited during the review`,
      revisionBefore: p.number,
      revisionAfter: p.number,
    });
}
