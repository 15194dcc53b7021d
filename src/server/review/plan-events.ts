import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { missions, planRevisions, reviews } from "@db/schema";
import type { ReviewState } from "@/lib/review";
import { writeActivity } from "@/server/core/activity";
import { afterCommit } from "@/server/core/db";
import type { PlanEditedEvent, PlanEvents } from "@/server/core/plan-events";
import { deliver, reviewWithdrawnMail } from "./mail";
import { acceptingMail, listTeamMembers } from "./members";

/**
 * Review's side of the plan events (src/server/core/plan-events.ts): the one
 * module of review the workspace imports. Revisions are never modified by an
 * edit (every change stores a new draft revision, so a baselined revision
 * stays exactly as approved); an edit during a review withdraws that review:
 * the submitted revision goes back to draft and its open review row is
 * closed as `withdrawn`. Once the edit has committed, the team's leads and
 * owners (but the person who edited, and anyone who turned review-request
 * mail off) get an e-mail saying the review was withdrawn.
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
  const [mission] = await tx
    .select({ name: missions.name, teamId: missions.teamId })
    .from(missions)
    .where(eq(missions.id, missionId));
  const [latest] = await tx
    .select({ number: planRevisions.number })
    .from(planRevisions)
    .where(eq(planRevisions.missionId, missionId))
    .orderBy(desc(planRevisions.number))
    .limit(1);
  if (mission)
    afterCommit(tx, () =>
      mailWithdrawn(
        actor,
        missionId,
        mission,
        pending.map((p) => p.number),
        (latest?.number ?? 0) + 1,
      ),
    );
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

/** The withdrawal e-mails, after the edit has committed. */
async function mailWithdrawn(
  actor: PlanEditedEvent["actor"],
  missionId: string,
  mission: { name: string; teamId: string },
  revisions: number[],
  newRevision: number,
): Promise<void> {
  const members = await listTeamMembers(mission.teamId);
  const reviewers = members.filter((m) => (m.role === "lead" || m.role === "owner") && m.userId !== actor.userId);
  const ok = await acceptingMail(
    reviewers.map((r) => r.userId),
    "reviewRequested",
  );
  const mails = reviewers
    .filter((r) => ok.has(r.userId))
    .flatMap((r) =>
      revisions.map((revision) =>
        reviewWithdrawnMail(r.email, { mission: mission.name, missionId, revision, by: actor.name, newRevision }),
      ),
    );
  await deliver(mails);
}

export const reviewPlanEvents: PlanEvents = { planEdited: withdrawOpenReview };
