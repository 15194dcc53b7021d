import "server-only";
import { isDeepStrictEqual } from "node:util";
import { eq, sql } from "drizzle-orm";
import { findings, missions, planRevisions } from "@db/schema";
import { parsePlan, planBoundIssues, type Plan } from "@/schemas/plan";
import type { ResultDocument } from "@/lib/plan";
import type { Actor } from "@/server/auth/actor";
import { writeActivity, type ActivityEntry } from "@/server/core/activity";
import type { Tx } from "@/server/core/db";
import { HttpError } from "@/server/core/http";
import { checkInPool } from "@/server/engine-pool";
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
 * A check computed before the lock for the plan a change is expected to
 * leave (a bulk apply prepares it outside the lock, so the engine's time
 * holds no one up). It is used only if the plan assembled under the lock is
 * exactly that plan; otherwise the check runs again there.
 */
export interface PreparedCheck {
  plan: Plan;
  result: ResultDocument;
}

/** Checks a plan document as saveAndCheck would store it (on the engine pool), or null when it is not a valid plan. */
export async function prepareCheck(doc: unknown): Promise<PreparedCheck | null> {
  const parsed = parsePlan(doc);
  return parsed.ok ? { plan: parsed.plan, result: await checkInPool(parsed.plan) } : null;
}

/** A prepared check already written as a revision row with its findings, under a placeholder number. */
export interface StagedRevision extends PreparedCheck {
  id: string;
}

const counts = (result: ResultDocument) => {
  const count = (s: string) => result.findings.filter((f) => f.severity === s).length;
  return { errorCount: count("error"), warningCount: count("warning"), infoCount: count("info") };
};

async function insertFindings(tx: Tx, missionId: string, revisionId: string, result: ResultDocument) {
  if (result.findings.length === 0) return;
  await tx.insert(findings).values(
    result.findings.map((f, i) => ({
      revisionId,
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
}

/**
 * Writes a prepared check as a revision row and its findings before the
 * caller takes the mission lock, in the caller's transaction: the biggest
 * writes of a save (the plan, the engine's result and one row per finding)
 * then hold no one up. The row carries a placeholder number, minus this
 * database session's process id (unique among running transactions, never
 * committed: saveAndCheck gives it its number under the lock, or deletes
 * it, and a rollback removes it). It holds only a key-share lock on the
 * mission row, which lockMission's `for no key update` does not wait for.
 */
export async function stageRevision(
  tx: Tx,
  missionId: string,
  actor: Actor,
  check: PreparedCheck,
): Promise<StagedRevision> {
  const [rev] = await tx
    .insert(planRevisions)
    .values({
      missionId,
      number: sql`-pg_backend_pid()`,
      plan: check.plan,
      result: check.result,
      authorId: actor.userId,
      authorName: actor.name,
      summary: "(being saved)",
      ...counts(check.result),
    })
    .returning({ id: planRevisions.id });
  if (!rev) throw new Error("revision insert returned no row");
  await insertFindings(tx, missionId, rev.id, check.result);
  return { ...check, id: rev.id };
}

/**
 * Re-checks the mission inside the transaction of a row change: assembles
 * the plan document from the rows, validates it (an invalid assembly throws
 * 400 `invalid-plan` with every issue, so the caller's transaction rolls
 * back and nothing is saved), runs the engine and stores an immutable
 * revision with its result and findings, plus the activity row.
 * The caller must hold the mission row lock (lockMission).
 *
 * With `prepared` (a check made before the lock, or one already staged as
 * a revision row by stageRevision), the engine does not run again when the
 * assembled plan is exactly the prepared one, compared field by field in
 * this transaction: the stored result is then still the check of exactly
 * the stored plan. A staged row that does not match is deleted and the
 * revision written as usual.
 */
export async function saveAndCheck(
  tx: Tx,
  missionId: string,
  actor: Actor,
  note: ActivityNote,
  prepared?: PreparedCheck | StagedRevision | null,
): Promise<RevisionInfo> {
  const doc = await assemblePlan(tx, missionId);
  const parsed = parsePlan(doc);
  const staged = prepared && "id" in prepared ? prepared : null;
  const matches = !!prepared && parsed.ok && isDeepStrictEqual(prepared.plan, parsed.plan);
  if (staged && !matches) await tx.delete(planRevisions).where(eq(planRevisions.id, staged.id));
  if (!parsed.ok)
    throw new HttpError(
      400,
      "invalid-plan",
      "This change would leave the plan invalid; nothing was saved.",
      parsed.issues,
    );
  // Hard ranges (ADR 030) on every save: a stored value outside them, kept from before they existed, is named here.
  const outOfRange = planBoundIssues(parsed.plan);
  if (outOfRange.length)
    throw new HttpError(
      400,
      "invalid-plan",
      "The plan would hold a value outside what a laboratory bench can produce; nothing was saved.",
      outOfRange,
    );
  // The engine runs on the pool's thread (src/server/engine-pool) while this transaction waits.
  const result: ResultDocument = matches ? prepared!.result : await checkInPool(parsed.plan);
  // Placeholder numbers of staged rows are negative: they are not revisions yet.
  const [{ max } = { max: null }] = await tx
    .select({ max: sql<number | null>`max(${planRevisions.number}) filter (where ${planRevisions.number} > 0)` })
    .from(planRevisions)
    .where(eq(planRevisions.missionId, missionId));
  const before = max === null ? null : Number(max);
  const number = (before ?? 0) + 1;
  // A revision is never modified; listeners may react to the edit (review withdraws an open review).
  for (const l of PLAN_LISTENERS) await l.planEdited({ tx, missionId, actor });
  const info: RevisionInfo = { number, ...counts(result) };
  if (staged && matches) {
    await tx
      .update(planRevisions)
      .set({ number, summary: note.summary, createdAt: new Date() })
      .where(eq(planRevisions.id, staged.id));
  } else {
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
    await insertFindings(tx, missionId, rev.id, result);
  }
  await writeActivity(tx, actor, { missionId, ...note, revisionBefore: before, revisionAfter: number });
  await tx.update(missions).set({ updatedAt: new Date() }).where(eq(missions.id, missionId));
  return info;
}
