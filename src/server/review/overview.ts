import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@db/client";
import { planRevisions, reviews } from "@db/schema";
import type { ReviewState } from "@/lib/review";
import { activeWaivers, asState, keyOfRow, latestRevision, revisionFindings } from "./reads";
import { waiverDto } from "./waivers";

/** What the review panel and the printable report read: the state of a mission's review and the approval of a revision. */

/** Everything the review panel shows: state, newest revision, its error findings with their waivers, reviews, the baseline. */
export async function getReviewOverview(missionId: string) {
  const latest = await latestRevision(db, missionId);
  const active = await activeWaivers(db, missionId);
  const rows = latest ? await revisionFindings(db, latest.id) : [];
  const history = await db
    .select()
    .from(reviews)
    .where(eq(reviews.missionId, missionId))
    .orderBy(desc(reviews.submittedAt));
  const baselined: ReviewState = "baselined";
  const [baseline] = await db
    .select({ number: planRevisions.number })
    .from(planRevisions)
    .where(and(eq(planRevisions.missionId, missionId), eq(planRevisions.status, baselined)))
    .orderBy(desc(planRevisions.number))
    .limit(1);
  const byKey = new Map(active.map((w) => [w.findingKey, w]));
  return {
    state: latest ? asState(latest.status) : ("draft" as ReviewState),
    revision: latest
      ? {
          number: latest.number,
          authorName: latest.authorName,
          createdAt: latest.createdAt.toISOString(),
          errorCount: latest.errorCount,
        }
      : null,
    baselineRevision: baseline?.number ?? null,
    channels: ((latest?.plan as { channels?: { id: string }[] } | undefined)?.channels ?? []).map((c) => c.id),
    errors: rows
      .filter((f) => f.severity === "error")
      .map((f) => {
        const w = byKey.get(keyOfRow(f));
        return {
          id: f.id,
          key: keyOfRow(f),
          code: f.code,
          chain: f.chainKey,
          channel: f.channelKey,
          message: f.message,
          waiver: w ? waiverDto(w) : null,
        };
      }),
    reviews: history.map((r) => ({
      id: r.id,
      revision: r.revisionNumber,
      submittedBy: r.submittedByName,
      submittedAt: r.submittedAt.toISOString(),
      note: r.note,
      outcome: r.outcome,
      decidedBy: r.decidedByName,
      decidedAt: r.decidedAt?.toISOString() ?? null,
      decisionNote: r.decisionNote,
      waivers: r.waiversAtDecision ?? [],
    })),
  };
}

/** The approval of one revision for the printable report: its state, the decision and the waivers it was baselined with. */
export async function getApproval(missionId: string, revisionNumber: number) {
  const [rev] = await db
    .select()
    .from(planRevisions)
    .where(and(eq(planRevisions.missionId, missionId), eq(planRevisions.number, revisionNumber)));
  if (!rev) return null;
  const [decision] = await db
    .select()
    .from(reviews)
    .where(and(eq(reviews.revisionId, rev.id), eq(reviews.outcome, "baselined")))
    .orderBy(desc(reviews.decidedAt))
    .limit(1);
  const [lastReview] = await db
    .select()
    .from(reviews)
    .where(eq(reviews.revisionId, rev.id))
    .orderBy(desc(reviews.submittedAt))
    .limit(1);
  return {
    revision: rev.number,
    state: asState(rev.status),
    submittedBy: lastReview?.submittedByName ?? null,
    submittedAt: lastReview?.submittedAt.toISOString() ?? null,
    approvedBy: decision?.decidedByName ?? null,
    approvedAt: decision?.decidedAt?.toISOString() ?? null,
    decisionNote: decision?.decisionNote ?? null,
    waivers: decision?.waiversAtDecision ?? [],
  };
}
