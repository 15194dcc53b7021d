import "server-only";
import { activity } from "@db/schema";
import type { Actor } from "@/server/auth/actor";
import type { Queryable } from "./db";

/** Who acted, and in which team. */
export type ActivityActor = Pick<Actor, "userId" | "name" | "teamId">;

export interface ActivityEntry {
  /** The mission touched, or null for a team-level action (membership, a deleted mission). */
  missionId: string | null;
  /** e.g. create, update, import, review-submit, waiver-create, member-invite. */
  action: string;
  /** What was touched, e.g. "channel wv1", "revision 4", "member erin@example.org". */
  entity: string;
  /** One line for people. */
  summary: string;
  revisionBefore?: number | null;
  revisionAfter?: number | null;
}

/**
 * Writes one row of the activity log, which the audit page, its CSV export
 * and a mission's activity list read. Every mutation writes one, in the
 * same transaction as the change when there is one (pass the `tx`).
 */
export async function writeActivity(q: Queryable, by: ActivityActor, entry: ActivityEntry): Promise<void> {
  await q.insert(activity).values({
    teamId: by.teamId,
    missionId: entry.missionId,
    actorId: by.userId,
    actorName: by.name,
    action: entry.action,
    entity: entry.entity,
    summary: entry.summary,
    revisionBefore: entry.revisionBefore ?? null,
    revisionAfter: entry.revisionAfter ?? null,
  });
}
