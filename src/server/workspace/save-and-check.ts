import "server-only";
import { eq, sql } from "drizzle-orm";
import { activity, findings, missions, planRevisions } from "@db/schema";
import { parsePlan } from "@/schemas/plan";
import { checkPlan, type ResultDocument } from "@/lib/plan";
import { HttpError } from "@/server/http";
import type { Actor } from "@/server/auth/actor";
import { onPlanEdited } from "@/server/review/on-plan-edited";
import { assemblePlan } from "./assemble";
import type { Tx } from "./tx";

export interface ActivityNote {
  /** create | update | delete | import | upload | settings | … */
  action: string;
  /** What was touched, e.g. "channel wv1", "laser LP1", "plan". */
  entity: string;
  /** One line for people. */
  summary: string;
}

export interface RevisionInfo {
  number: number;
  errorCount: number;
  warningCount: number;
  infoCount: number;
}

/**
 * Re-checks the mission inside the transaction of a row change: assembles
 * the plan document from the rows, validates it (an invalid assembly throws
 * 400 `invalid-plan` with every issue, so the caller's transaction rolls
 * back and nothing is saved), runs the engine and stores an immutable
 * revision with its result and findings, plus the activity row.
 * The caller must hold the mission row lock (lockMission).
 */
export async function saveAndCheck(tx: Tx, missionId: string, actor: Actor, note: ActivityNote): Promise<RevisionInfo> {
  const doc = await assemblePlan(tx, missionId);
  const parsed = parsePlan(doc);
  if (!parsed.ok)
    throw new HttpError(
      400,
      "invalid-plan",
      "This change would leave the plan invalid; nothing was saved.",
      parsed.issues,
    );
  const result: ResultDocument = checkPlan(parsed.plan);
  const count = (s: string) => result.findings.filter((f) => f.severity === s).length;
  const [{ max } = { max: null }] = await tx
    .select({ max: sql<number | null>`max(${planRevisions.number})` })
    .from(planRevisions)
    .where(eq(planRevisions.missionId, missionId));
  const before = max === null ? null : Number(max);
  const number = (before ?? 0) + 1;
  // Review: a revision is never modified; an edit during a review withdraws it (src/server/review).
  await onPlanEdited(tx, missionId, actor);
  const info: RevisionInfo = {
    number,
    errorCount: count("error"),
    warningCount: count("warning"),
    infoCount: count("info"),
  };
  const [rev] = await tx
    .insert(planRevisions)
    .values({
      missionId,
      number,
      plan: parsed.plan,
      result,
      authorId: actor.userId,
      authorName: actor.name,
      summary: note.summary,
      errorCount: info.errorCount,
      warningCount: info.warningCount,
      infoCount: info.infoCount,
    })
    .returning({ id: planRevisions.id });
  if (!rev) throw new Error("revision insert returned no row");
  if (result.findings.length > 0)
    await tx.insert(findings).values(
      result.findings.map((f, i) => ({
        revisionId: rev.id,
        missionId,
        position: i,
        code: f.code,
        severity: f.severity,
        chainKey: f.chain,
        channelKey: f.channel,
        message: f.message,
        data: f.data,
      })),
    );
  await tx.insert(activity).values({
    teamId: actor.teamId,
    missionId,
    actorId: actor.userId,
    actorName: actor.name,
    action: note.action,
    entity: note.entity,
    summary: note.summary,
    revisionBefore: before,
    revisionAfter: number,
  });
  await tx.update(missions).set({ updatedAt: new Date() }).where(eq(missions.id, missionId));
  return info;
}
