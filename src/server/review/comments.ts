import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@db/client";
import { findings, planRevisions, reviewComments, type PlanRevision } from "@db/schema";
import { resolveMentions, unresolvedMentionsMessage } from "@/lib/review";
import { paramTextSchema } from "@/schemas/fields";
import type { Actor } from "@/server/auth/actor";
import { writeActivity } from "@/server/core/activity";
import { inTransaction } from "@/server/core/db";
import { HttpError, invalidInput } from "@/server/core/http";
import { UUID } from "@/server/core/input";
import { lockMission } from "@/server/core/mission-scope";
import type { OutgoingMail } from "@/server/mail";
import { deliver, mentionMail } from "./mail";
import { acceptingMail, listTeamMembers } from "./members";
import { latestRevision } from "./reads";

/** Review comments on a revision, one of its channels or one of its findings, with @mentions mailed. */

/** The filter of the comment list (`GET …/review/comments?revision=&channel=&finding=`). */
export const commentsQuerySchema = z.object({
  revision: z
    .string()
    .regex(/^[1-9]\d{0,8}$/, "must be a revision number (1 or more)")
    .transform(Number)
    .optional(),
  channel: paramTextSchema(200).optional(),
  finding: z.string().regex(UUID, "must be the id of a finding").optional(),
});
export type CommentsQuery = z.output<typeof commentsQuerySchema>;

export async function listComments(missionId: string, filter: CommentsQuery) {
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
  const resolved = resolveMentions(input.body, members);
  const unknown = unresolvedMentionsMessage(resolved.unresolved);
  if (unknown)
    throw invalidInput(
      [{ path: "body", message: `${unknown}. Mention team members by name or e-mail address.` }],
      "The comment mentions someone who is not in the team; nothing was posted.",
    );
  const mentioned = resolved.mentioned.filter((m) => m.userId !== actor.userId);
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
    await writeActivity(tx, actor, {
      missionId: mission.id,
      action: "comment",
      entity: target,
      summary: `Commented on ${target}${mentioned.length ? ` mentioning ${mentioned.map((m) => m.name).join(", ")}` : ""}`,
      revisionBefore: rev.number,
      revisionAfter: rev.number,
    });
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
