import "server-only";
import { and, desc, eq, gte, ilike, lt, or, type SQL } from "drizzle-orm";
import { db } from "@db/client";
import { activity, missions } from "@db/schema";
import type { AuditQuery } from "@/schemas/review";
import type { Actor } from "@/server/auth/actor";

const nextDay = (d: string) => new Date(Date.parse(`${d}T00:00:00Z`) + 86_400_000);

/**
 * The audit trail of the actor's team from the activity log, newest first,
 * filtered by mission, person (user id, or part of the name), action and
 * UTC date range (both days included).
 */
export async function listAudit(actor: Actor, q: AuditQuery, limit = 5000) {
  const conds: SQL[] = [eq(activity.teamId, actor.teamId)];
  if (q.mission) conds.push(eq(activity.missionId, q.mission));
  if (q.person)
    conds.push(
      or(eq(activity.actorId, q.person), ilike(activity.actorName, `%${q.person.replace(/[\\%_]/g, "\\$&")}%`))!,
    );
  if (q.action) conds.push(eq(activity.action, q.action));
  if (q.from) conds.push(gte(activity.at, new Date(`${q.from}T00:00:00Z`)));
  if (q.to) conds.push(lt(activity.at, nextDay(q.to)));
  const rows = await db
    .select({ a: activity, missionName: missions.name })
    .from(activity)
    .leftJoin(missions, eq(missions.id, activity.missionId))
    .where(and(...conds))
    .orderBy(desc(activity.at))
    .limit(limit);
  return rows.map(({ a, missionName }) => ({
    id: a.id,
    at: a.at,
    actorId: a.actorId,
    actorName: a.actorName,
    missionId: a.missionId,
    missionName,
    action: a.action,
    entity: a.entity,
    summary: a.summary,
    revisionBefore: a.revisionBefore,
    revisionAfter: a.revisionAfter,
  }));
}

/** The distinct actions and people of the team's log, for the filter menus. */
export async function auditFacets(actor: Actor) {
  const rows = await db
    .selectDistinct({ action: activity.action, actorId: activity.actorId, actorName: activity.actorName })
    .from(activity)
    .where(eq(activity.teamId, actor.teamId));
  const actions = [...new Set(rows.map((r) => r.action))].sort();
  const people = [...new Map(rows.map((r) => [r.actorId, r.actorName])).entries()]
    .map(([id, name]) => ({ id, name }))
    .sort((x, y) => x.name.localeCompare(y.name));
  const ms = await db
    .select({ id: missions.id, name: missions.name })
    .from(missions)
    .where(eq(missions.teamId, actor.teamId));
  return { actions, people, missions: ms };
}
