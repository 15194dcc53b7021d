import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@db/client";
import { member, notificationPreferences, user } from "@db/schema";
import type { Queryable } from "@/server/core/db";

export interface TeamMember {
  userId: string;
  email: string;
  name: string;
  role: string;
}

/** The people of a team with their role. */
export async function listTeamMembers(teamId: string, q: Queryable = db): Promise<TeamMember[]> {
  return q
    .select({ userId: user.id, email: user.email, name: user.name, role: member.role })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(eq(member.organizationId, teamId));
}

export type PreferenceKind = "reviewRequested" | "reviewDecided" | "mentioned";

/** Everyone wants every review e-mail until they say otherwise. */
export async function getPreferences(userId: string) {
  const [p] = await db.select().from(notificationPreferences).where(eq(notificationPreferences.userId, userId));
  return {
    reviewRequested: p?.reviewRequested ?? true,
    reviewDecided: p?.reviewDecided ?? true,
    mentioned: p?.mentioned ?? true,
  };
}

export async function setPreferences(
  userId: string,
  prefs: { reviewRequested: boolean; reviewDecided: boolean; mentioned: boolean },
) {
  await db
    .insert(notificationPreferences)
    .values({ userId, ...prefs, updatedAt: new Date() })
    .onConflictDoUpdate({ target: notificationPreferences.userId, set: { ...prefs, updatedAt: new Date() } });
}

/** The subset of `userIds` who accept mail of `kind`. */
export async function acceptingMail(userIds: string[], kind: PreferenceKind): Promise<Set<string>> {
  if (userIds.length === 0) return new Set();
  const rows = await db
    .select()
    .from(notificationPreferences)
    .where(and(inArray(notificationPreferences.userId, userIds)));
  const off = new Set(rows.filter((r) => !r[kind]).map((r) => r.userId));
  return new Set(userIds.filter((id) => !off.has(id)));
}
