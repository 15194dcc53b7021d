import "server-only";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { findings, planRevisions, waivers, type FindingRow, type PlanRevision } from "@db/schema";
import { findingKey, REVIEW_STATES, type ReviewState } from "@/lib/review";
import type { Queryable } from "@/server/core/db";

/** Reads shared by the review modules (transitions, waivers, comments, overview). */

/** A stored status as a review state (the shared list of src/lib/review); anything unknown reads as draft. */
export const asState = (s: string): ReviewState =>
  (REVIEW_STATES as readonly string[]).includes(s) ? (s as ReviewState) : "draft";

/** The newest revision of a mission, or null before the first one. */
export async function latestRevision(q: Queryable, missionId: string): Promise<PlanRevision | null> {
  const [r] = await q
    .select()
    .from(planRevisions)
    .where(eq(planRevisions.missionId, missionId))
    .orderBy(desc(planRevisions.number))
    .limit(1);
  return r ?? null;
}

export async function revisionFindings(q: Queryable, revisionId: string): Promise<FindingRow[]> {
  return q.select().from(findings).where(eq(findings.revisionId, revisionId)).orderBy(asc(findings.position));
}

/** The waivers of a mission that have not been withdrawn, oldest first. */
export async function activeWaivers(q: Queryable, missionId: string) {
  return q
    .select()
    .from(waivers)
    .where(and(eq(waivers.missionId, missionId), isNull(waivers.withdrawnAt)))
    .orderBy(asc(waivers.waivedAt));
}

/** The finding key (code|chain|channel) of a stored finding. */
export const keyOfRow = (f: FindingRow) => findingKey({ code: f.code, chain: f.chainKey, channel: f.channelKey });
