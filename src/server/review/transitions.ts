import "server-only";
import { and, eq } from "drizzle-orm";
import { planRevisions, reviews, type WaiverSnapshot } from "@db/schema";
import { findingKeyText, nextReviewState, type ReviewAction, type ReviewRefusal } from "@/lib/review";
import type { Actor } from "@/server/auth/actor";
import { writeActivity } from "@/server/core/activity";
import { inTransaction, type Tx } from "@/server/core/db";
import { HttpError } from "@/server/core/http";
import { lockMission } from "@/server/core/mission-scope";
import { deliver, reviewDecidedMail, reviewRequestedMail } from "./mail";
import { acceptingMail, listTeamMembers } from "./members";
import { activeWaivers, asState, keyOfRow, latestRevision, revisionFindings } from "./reads";

/** The review workflow's transitions: submitting a revision for review and deciding it (baseline or request changes). */

function refusal(r: ReviewRefusal): HttpError {
  if (r.code === "forbidden") return new HttpError(403, "forbidden", r.reason);
  if (r.code === "unwaived-errors")
    return new HttpError(
      409,
      "unwaived-errors",
      r.reason,
      r.unwaived.map((k) => ({ path: `findings.${k}`, message: `no waiver yet for ${findingKeyText(k)}` })),
      { unwaived: r.unwaived },
    );
  return new HttpError(409, "invalid-transition", r.reason);
}

/** How many channels a stored plan document holds (0 for anything that is not a plan with a channel list). */
function planChannelCount(plan: unknown): number {
  const channels = (plan as { channels?: unknown } | null)?.channels;
  return Array.isArray(channels) ? channels.length : 0;
}

/** Loads the newest revision under the mission lock and applies one workflow action through the state machine. */
async function transition(tx: Tx, actor: Actor, missionId: string, action: ReviewAction, expectedRevision?: number) {
  const mission = await lockMission(tx, actor, missionId);
  const latest = await latestRevision(tx, mission.id);
  if (!latest)
    throw new HttpError(
      409,
      "no-revision",
      "This mission has no plan revision yet; add hardware, chains and channels first.",
    );
  if (expectedRevision !== undefined && expectedRevision !== latest.number)
    throw new HttpError(
      409,
      "stale-revision",
      `The plan has moved on to revision ${latest.number} since you loaded revision ${expectedRevision}; reload and try again.`,
      undefined,
      { current: latest.number },
    );
  const rows = await revisionFindings(tx, latest.id);
  const open = rows.filter((f) => f.severity === "error");
  const active = await activeWaivers(tx, mission.id);
  const outcome = nextReviewState({
    state: asState(latest.status),
    action,
    role: actor.role,
    openErrorKeys: open.map(keyOfRow),
    waivedKeys: active.map((w) => w.findingKey),
  });
  if (!outcome.ok) throw refusal(outcome);
  if (action === "submit" && planChannelCount(latest.plan) === 0)
    throw new HttpError(
      409,
      "no-channels",
      `Revision ${latest.number} has no channels, so no rule has checked anything yet: add at least one channel before submitting the plan for review.`,
    );
  await tx.update(planRevisions).set({ status: outcome.next }).where(eq(planRevisions.id, latest.id));
  return { mission, latest, next: outcome.next, open, active };
}

export async function submitReview(actor: Actor, missionId: string, input: { revision?: number; note?: string }) {
  const note = input.note ?? "";
  const done = await inTransaction(async (tx) => {
    const t = await transition(tx, actor, missionId, "submit", input.revision);
    const [review] = await tx
      .insert(reviews)
      .values({
        missionId: t.mission.id,
        revisionId: t.latest.id,
        revisionNumber: t.latest.number,
        submittedBy: actor.userId,
        submittedByName: actor.name,
        note,
      })
      .returning();
    await writeActivity(tx, actor, {
      missionId: t.mission.id,
      action: "review-submit",
      entity: `revision ${t.latest.number}`,
      summary: `Submitted revision ${t.latest.number} for review${note ? `: ${note}` : ""}`,
      revisionBefore: t.latest.number,
      revisionAfter: t.latest.number,
    });
    return { ...t, review: review! };
  });
  // Reviewers: the team's leads and owners, except the person who submitted.
  const members = await listTeamMembers(actor.teamId);
  const reviewers = members.filter((m) => (m.role === "lead" || m.role === "owner") && m.userId !== actor.userId);
  const ok = await acceptingMail(
    reviewers.map((r) => r.userId),
    "reviewRequested",
  );
  const mails = reviewers
    .filter((r) => ok.has(r.userId))
    .map((r) =>
      reviewRequestedMail(r.email, {
        mission: done.mission.name,
        missionId: done.mission.id,
        revision: done.latest.number,
        by: actor.name,
        note,
        openErrors: done.open.length,
      }),
    );
  await deliver(mails);
  return { state: done.next, revision: done.latest.number, reviewId: done.review.id, notified: mails.map((m) => m.to) };
}

export async function decideReview(
  actor: Actor,
  missionId: string,
  input: { decision: "baseline" | "request-changes"; revision?: number; note?: string },
) {
  const note = input.note ?? "";
  const done = await inTransaction(async (tx) => {
    const t = await transition(tx, actor, missionId, input.decision, input.revision);
    const snapshot: WaiverSnapshot[] | null =
      input.decision === "baseline"
        ? t.active
            .filter((w) => t.open.some((f) => keyOfRow(f) === w.findingKey))
            .map((w) => ({
              findingKey: w.findingKey,
              reason: w.reason,
              waivedByName: w.waivedByName,
              waivedAt: w.waivedAt.toISOString(),
            }))
        : null;
    const [review] = await tx
      .update(reviews)
      .set({
        outcome: input.decision === "baseline" ? "baselined" : "changes-requested",
        decidedBy: actor.userId,
        decidedByName: actor.name,
        decidedAt: new Date(),
        decisionNote: note,
        waiversAtDecision: snapshot,
      })
      .where(and(eq(reviews.revisionId, t.latest.id), eq(reviews.outcome, "open")))
      .returning();
    const verb = input.decision === "baseline" ? "Baselined" : "Requested changes to";
    await writeActivity(tx, actor, {
      missionId: t.mission.id,
      action: input.decision === "baseline" ? "review-baseline" : "review-request-changes",
      entity: `revision ${t.latest.number}`,
      summary: `${verb} revision ${t.latest.number}${snapshot && snapshot.length ? ` with ${snapshot.length} waiver${snapshot.length === 1 ? "" : "s"}` : ""}${note ? `: ${note}` : ""}`,
      revisionBefore: t.latest.number,
      revisionAfter: t.latest.number,
    });
    return { ...t, review: review ?? null };
  });
  // The author: whoever submitted the revision, and the revision's author when that is someone else.
  const authors = new Set<string>([done.latest.authorId]);
  if (done.review) authors.add(done.review.submittedBy);
  authors.delete(actor.userId);
  const members = await listTeamMembers(actor.teamId);
  const ok = await acceptingMail([...authors], "reviewDecided");
  const mails = members
    .filter((m) => authors.has(m.userId) && ok.has(m.userId))
    .map((m) =>
      reviewDecidedMail(m.email, {
        mission: done.mission.name,
        missionId: done.mission.id,
        revision: done.latest.number,
        by: actor.name,
        decision: input.decision,
        note,
      }),
    );
  await deliver(mails);
  return { state: done.next, revision: done.latest.number, notified: mails.map((m) => m.to) };
}
