import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@db/client";
import { invitation, member, organization, user } from "@db/schema";

/** What the invitation page needs to know (it shows the address only to the signed-in invitee). */
export async function getInvitationSummary(id: string) {
  const rows = await db
    .select({
      id: invitation.id,
      email: invitation.email,
      role: invitation.role,
      status: invitation.status,
      expiresAt: invitation.expiresAt,
      teamId: invitation.organizationId,
      teamName: organization.name,
      inviterName: user.name,
    })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .innerJoin(user, eq(user.id, invitation.inviterId))
    .where(eq(invitation.id, id))
    .limit(1);
  return rows[0] ?? null;
}

/** The teams a user belongs to, with their role in each, by name. */
export async function listTeamsOf(userId: string) {
  return db
    .select({ id: organization.id, name: organization.name, slug: organization.slug, role: member.role })
    .from(member)
    .innerJoin(organization, eq(organization.id, member.organizationId))
    .where(eq(member.userId, userId))
    .orderBy(organization.name);
}

/** Number of owners of a team (the last owner may neither leave nor be removed or demoted). */
export async function countOwners(teamId: string): Promise<number> {
  const rows = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(member)
    .where(and(eq(member.organizationId, teamId), eq(member.role, "owner")));
  return rows[0]?.n ?? 0;
}

/** The role of a user in a team (their member row), or null when they are not a member. */
export async function memberRole(userId: string, teamId: string): Promise<string | null> {
  const rows = await db
    .select({ role: member.role })
    .from(member)
    .where(and(eq(member.userId, userId), eq(member.organizationId, teamId)))
    .limit(1);
  return rows[0]?.role ?? null;
}
