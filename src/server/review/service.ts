import "server-only";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { db } from "@db/client";
import {
  activity,
  findings,
  planRevisions,
  reviewComments,
  reviews,
  waivers,
  type FindingRow,
  type PlanRevision,
  type WaiverSnapshot,
} from "@db/schema";
import {
  findingKey,
  findMentions,
  nextReviewState,
  type ReviewAction,
  type ReviewRefusal,
  type ReviewState,
  REVIEW_STATES,
} from "@/lib/review";
import { HttpError, notFound } from "@/server/http";
import type { Actor } from "@/server/auth/actor";
import { inTransaction, lockMission, type Queryable, type Tx } from "@/server/workspace/tx";
import { invalidInput, staleVersion } from "@/server/workspace/errors";
import { acceptingMail, listTeamMembers } from "./members";
import { deliver, mentionMail, reviewDecidedMail, reviewRequestedMail } from "./mail";
import type { OutgoingMail } from "@/server/mail";

const asState = (s: string): ReviewState =>
  (REVIEW_STATES as readonly string[]).includes(s) ? (s as ReviewState) : "draft";

async function latestRevision(q: Queryable, missionId: string): Promise<PlanRevision | null> {
  const [r] = await q
    .select()
    .from(planRevisions)
    .where(eq(planRevisions.missionId, missionId))
    .orderBy(desc(planRevisions.number))
    .limit(1);
  return r ?? null;
}

async function revisionFindings(q: Queryable, revisionId: string): Promise<FindingRow[]> {
  return q.select().from(findings).where(eq(findings.revisionId, revisionId)).orderBy(asc(findings.position));
}

async function activeWaivers(q: Queryable, missionId: string) {
  return q
    .select()
    .from(waivers)
    .where(and(eq(waivers.missionId, missionId), isNull(waivers.withdrawnAt)))
    .orderBy(asc(waivers.waivedAt));
}

const keyOfRow = (f: FindingRow) => findingKey({ code: f.code, chain: f.chainKey, channel: f.channelKey });

function refusal(r: ReviewRefusal): HttpError {
  if (r.code === "forbidden") return new HttpError(403, "forbidden", r.reason);
  if (r.code === "unwaived-errors")
    return new HttpError(
      409,
      "unwaived-errors",
      r.reason,
      r.unwaived.map((k) => ({ path: `findings.${k}`, message: "open error finding without a waiver" })),
      { unwaived: r.unwaived },
    );
  return new HttpError(409, "invalid-transition", r.reason);
}

function writeActivity(
  tx: Tx,
  actor: Actor,
  missionId: string,
  action: string,
  entity: string,
  summary: string,
  before: number | null,
  after: number | null,
) {
  return tx.insert(activity).values({
    teamId: actor.teamId,
    missionId,
    actorId: actor.userId,
    actorName: actor.name,
    action,
    entity,
    summary,
    revisionBefore: before,
    revisionAfter: after,
  });
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
    await writeActivity(
      tx,
      actor,
      t.mission.id,
      "review-submit",
      `revision ${t.latest.number}`,
      `Submitted revision ${t.latest.number} for review${note ? `: ${note}` : ""}`,
      t.latest.number,
      t.latest.number,
    );
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
    await writeActivity(
      tx,
      actor,
      t.mission.id,
      input.decision === "baseline" ? "review-baseline" : "review-request-changes",
      `revision ${t.latest.number}`,
      `${verb} revision ${t.latest.number}${snapshot && snapshot.length ? ` with ${snapshot.length} waiver${snapshot.length === 1 ? "" : "s"}` : ""}${note ? `: ${note}` : ""}`,
      t.latest.number,
      t.latest.number,
    );
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

const waiverDto = (w: typeof waivers.$inferSelect) => ({
  id: w.id,
  findingKey: w.findingKey,
  code: w.code,
  chain: w.chainKey,
  channel: w.channelKey,
  revision: w.revisionNumber,
  findingMessage: w.findingMessage,
  reason: w.reason,
  waivedBy: w.waivedByName,
  waivedAt: w.waivedAt.toISOString(),
  withdrawnBy: w.withdrawnByName,
  withdrawnAt: w.withdrawnAt?.toISOString() ?? null,
  active: w.withdrawnAt === null,
  version: w.version,
});

export async function listWaivers(missionId: string) {
  const rows = await db.select().from(waivers).where(eq(waivers.missionId, missionId)).orderBy(desc(waivers.waivedAt));
  return rows.map(waiverDto);
}

export async function createWaiver(actor: Actor, missionId: string, input: { findingId: string; reason: string }) {
  return inTransaction(async (tx) => {
    const mission = await lockMission(tx, actor, missionId);
    const latest = await latestRevision(tx, mission.id);
    const [f] = await tx
      .select()
      .from(findings)
      .where(and(eq(findings.id, input.findingId), eq(findings.missionId, mission.id)));
    if (!f)
      throw invalidInput(
        [{ path: "findingId", message: "no finding with this id in this mission" }],
        "The waiver is not valid.",
      );
    if (!latest || f.revisionId !== latest.id)
      throw new HttpError(
        409,
        "stale-revision",
        "This finding belongs to an older revision; reload and waive the finding of the current revision.",
        [{ path: "findingId", message: "finding of an older revision" }],
      );
    if (f.severity !== "error")
      throw invalidInput(
        [{ path: "findingId", message: `only error findings need a waiver; this one is a ${f.severity}` }],
        "The waiver is not valid.",
      );
    const key = keyOfRow(f);
    const existing = (await activeWaivers(tx, mission.id)).find((w) => w.findingKey === key);
    if (existing)
      throw new HttpError(
        409,
        "already-waived",
        "This finding already has a waiver; change or withdraw that one.",
        undefined,
        { waiver: waiverDto(existing) },
      );
    const [w] = await tx
      .insert(waivers)
      .values({
        missionId: mission.id,
        findingKey: key,
        code: f.code,
        chainKey: f.chainKey,
        channelKey: f.channelKey,
        revisionNumber: latest.number,
        findingMessage: f.message,
        reason: input.reason,
        waivedBy: actor.userId,
        waivedByName: actor.name,
      })
      .returning();
    await writeActivity(
      tx,
      actor,
      mission.id,
      "waiver-create",
      `finding ${key}`,
      `Waived ${f.code} on chain ${f.chainKey}${f.channelKey ? `, channel ${f.channelKey}` : ""}: ${input.reason}`,
      latest.number,
      latest.number,
    );
    return waiverDto(w!);
  });
}

async function lockedWaiver(tx: Tx, actor: Actor, missionId: string, waiverId: string) {
  const mission = await lockMission(tx, actor, missionId);
  if (!/^[0-9a-f-]{36}$/i.test(waiverId)) throw notFound("waiver");
  const [w] = await tx
    .select()
    .from(waivers)
    .where(and(eq(waivers.id, waiverId), eq(waivers.missionId, mission.id)));
  if (!w) throw notFound("waiver");
  if (w.withdrawnAt) throw new HttpError(409, "withdrawn", "This waiver was withdrawn; record a new one instead.");
  const latest = await latestRevision(tx, mission.id);
  return { mission, w, latestNumber: latest?.number ?? null };
}

export async function updateWaiver(
  actor: Actor,
  missionId: string,
  waiverId: string,
  input: { reason: string; version: number },
) {
  return inTransaction(async (tx) => {
    const { mission, w, latestNumber } = await lockedWaiver(tx, actor, missionId, waiverId);
    if (w.version !== input.version) throw staleVersion(waiverDto(w), "waiver");
    const [u] = await tx
      .update(waivers)
      .set({ reason: input.reason, version: w.version + 1 })
      .where(eq(waivers.id, w.id))
      .returning();
    await writeActivity(
      tx,
      actor,
      mission.id,
      "waiver-update",
      `finding ${w.findingKey}`,
      `Changed the reason of the waiver of ${w.code}: ${input.reason}`,
      latestNumber,
      latestNumber,
    );
    return waiverDto(u!);
  });
}

export async function withdrawWaiver(actor: Actor, missionId: string, waiverId: string) {
  return inTransaction(async (tx) => {
    const { mission, w, latestNumber } = await lockedWaiver(tx, actor, missionId, waiverId);
    const [u] = await tx
      .update(waivers)
      .set({ withdrawnAt: new Date(), withdrawnBy: actor.userId, withdrawnByName: actor.name, version: w.version + 1 })
      .where(eq(waivers.id, w.id))
      .returning();
    await writeActivity(
      tx,
      actor,
      mission.id,
      "waiver-withdraw",
      `finding ${w.findingKey}`,
      `Withdrew the waiver of ${w.code} on chain ${w.chainKey}`,
      latestNumber,
      latestNumber,
    );
    return waiverDto(u!);
  });
}

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
  const [baseline] = await db
    .select({ number: planRevisions.number })
    .from(planRevisions)
    .where(and(eq(planRevisions.missionId, missionId), eq(planRevisions.status, "baselined")))
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

// ---- comments ----

export async function listComments(
  missionId: string,
  filter: { revision?: number; channel?: string; finding?: string },
) {
  const conds = [eq(reviewComments.missionId, missionId)];
  if (filter.revision !== undefined) conds.push(eq(reviewComments.revisionNumber, filter.revision));
  if (filter.channel) conds.push(eq(reviewComments.channelKey, filter.channel));
  if (filter.finding) conds.push(eq(reviewComments.findingId, filter.finding));
  const rows = await db
    .select()
    .from(reviewComments)
    .where(and(...conds))
    .orderBy(asc(reviewComments.createdAt));
  return rows.map((c) => ({
    id: c.id,
    revision: c.revisionNumber,
    channelKey: c.channelKey,
    findingId: c.findingId,
    authorName: c.authorName,
    body: c.body,
    mentions: c.mentions,
    createdAt: c.createdAt.toISOString(),
  }));
}

export async function createComment(
  actor: Actor,
  missionId: string,
  input: { body: string; revision?: number; channelKey?: string; findingId?: string },
) {
  const members = await listTeamMembers(actor.teamId);
  const mentioned = findMentions(input.body, members).filter((m) => m.userId !== actor.userId);
  const made = await inTransaction(async (tx) => {
    const mission = await lockMission(tx, actor, missionId);
    let rev: PlanRevision | null;
    if (input.revision !== undefined) {
      const [r] = await tx
        .select()
        .from(planRevisions)
        .where(and(eq(planRevisions.missionId, mission.id), eq(planRevisions.number, input.revision)));
      if (!r)
        throw invalidInput(
          [{ path: "revision", message: `this mission has no revision ${input.revision}` }],
          "The comment is not valid.",
        );
      rev = r;
    } else rev = await latestRevision(tx, mission.id);
    if (!rev) throw new HttpError(409, "no-revision", "This mission has no plan revision to comment on yet.");
    let target = `revision ${rev.number}`;
    if (input.channelKey !== undefined) {
      const plan = rev.plan as { channels?: { id: string }[] };
      if (!(plan.channels ?? []).some((c) => c.id === input.channelKey))
        throw invalidInput(
          [{ path: "channelKey", message: `revision ${rev.number} has no channel "${input.channelKey}"` }],
          "The comment is not valid.",
        );
      target = `channel ${input.channelKey}`;
    }
    if (input.findingId !== undefined) {
      const [f] = await tx
        .select()
        .from(findings)
        .where(and(eq(findings.id, input.findingId), eq(findings.revisionId, rev.id)));
      if (!f)
        throw invalidInput(
          [{ path: "findingId", message: `revision ${rev.number} has no finding with this id` }],
          "The comment is not valid.",
        );
      target = `finding ${f.code} (chain ${f.chainKey}${f.channelKey ? `, channel ${f.channelKey}` : ""})`;
    }
    const [c] = await tx
      .insert(reviewComments)
      .values({
        missionId: mission.id,
        revisionNumber: rev.number,
        channelKey: input.channelKey ?? null,
        findingId: input.findingId ?? null,
        authorId: actor.userId,
        authorName: actor.name,
        body: input.body,
        mentions: mentioned.map((m) => m.userId),
      })
      .returning();
    await writeActivity(
      tx,
      actor,
      mission.id,
      "comment",
      target,
      `Commented on ${target}${mentioned.length ? ` mentioning ${mentioned.map((m) => m.name).join(", ")}` : ""}`,
      rev.number,
      rev.number,
    );
    return { mission, rev, c: c!, target };
  });
  const ok = await acceptingMail(
    mentioned.map((m) => m.userId),
    "mentioned",
  );
  const mails: OutgoingMail[] = mentioned
    .filter((m) => ok.has(m.userId))
    .map((m) =>
      mentionMail(m.email, {
        mission: made.mission.name,
        missionId: made.mission.id,
        revision: made.rev.number,
        by: actor.name,
        body: input.body,
        target: made.target,
      }),
    );
  await deliver(mails);
  return {
    id: made.c.id,
    revision: made.c.revisionNumber,
    channelKey: made.c.channelKey,
    findingId: made.c.findingId,
    authorName: made.c.authorName,
    body: made.c.body,
    mentions: made.c.mentions,
    createdAt: made.c.createdAt.toISOString(),
    notified: mails.map((m) => m.to),
  };
}
