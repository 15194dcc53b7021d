import "server-only";
import { eq, sql } from "drizzle-orm";
import { findings, missions, planRevisions } from "@db/schema";
import { parsePlan } from "@/schemas/plan";
import { checkPlan, type ResultDocument } from "@/lib/plan";
import type { Actor } from "@/server/auth/actor";
import { writeActivity, type ActivityEntry } from "@/server/core/activity";
import type { Tx } from "@/server/core/db";
import { HttpError } from "@/server/core/http";
import type { PlanEvents } from "@/server/core/plan-events";
import { reviewPlanEvents } from "@/server/review/plan-events";
import { assemblePlan } from "./assemble";

/**
 * Who hears of every stored plan change (the contract is in
 * src/server/core/plan-events.ts). Review's module is the only one of
 * review the workspace imports; review imports nothing of the workspace.
 */
const PLAN_LISTENERS: readonly PlanEvents[] = [reviewPlanEvents];

/** What a change did, for its activity row (src/server/core/activity.ts). */
export type ActivityNote = Pick<ActivityEntry, "action" | "entity" | "summary">;

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
  // A revision is never modified; listeners may react to the edit (review withdraws an open review).
  for (const l of PLAN_LISTENERS) await l.planEdited({ tx, missionId, actor });
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
  await writeActivity(tx, actor, { missionId, ...note, revisionBefore: before, revisionAfter: number });
  await tx.update(missions).set({ updatedAt: new Date() }).where(eq(missions.id, missionId));
  return info;
}
