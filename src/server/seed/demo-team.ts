import "server-only";
import { randomBytes } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@db/client";
import { account, member, organization, user } from "@db/schema";
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_TEAM } from "./demo-people";

const newId = () => randomBytes(16).toString("base64url");

/**
 * Seeds the invented demo team and its four people (demo-people.ts).
 * Idempotent: existing rows are kept (and the role and verified flag
 * corrected), nothing is duplicated.
 */
export async function seedDemoTeam(): Promise<{ teamId: string; userIds: Record<string, string> }> {
  const now = new Date();
  let team = (await db.select().from(organization).where(eq(organization.slug, DEMO_TEAM.slug)).limit(1))[0];
  if (!team) {
    [team] = await db
      .insert(organization)
      .values({
        id: newId(),
        name: DEMO_TEAM.name,
        slug: DEMO_TEAM.slug,
        createdAt: now,
        metadata: JSON.stringify({ demo: true }),
      })
      .returning();
  }
  const teamId = team!.id;
  const userIds: Record<string, string> = {};
  for (const p of DEMO_PEOPLE) {
    let u = (await db.select().from(user).where(eq(user.email, p.email)).limit(1))[0];
    if (!u) {
      [u] = await db
        .insert(user)
        .values({ id: newId(), name: p.name, email: p.email, emailVerified: true })
        .returning();
    } else if (!u.emailVerified) {
      await db.update(user).set({ emailVerified: true }).where(eq(user.id, u.id));
    }
    const userId = u!.id;
    userIds[p.role] = userId;
    const acct = (
      await db
        .select()
        .from(account)
        .where(and(eq(account.userId, userId), eq(account.providerId, "credential")))
        .limit(1)
    )[0];
    if (!acct) {
      await db.insert(account).values({
        id: newId(),
        accountId: userId,
        providerId: "credential",
        userId,
        password: await hashPassword(DEMO_PASSWORD),
        updatedAt: now,
      });
    }
    const m = (
      await db
        .select()
        .from(member)
        .where(and(eq(member.userId, userId), eq(member.organizationId, teamId)))
        .limit(1)
    )[0];
    if (!m)
      await db.insert(member).values({ id: newId(), organizationId: teamId, userId, role: p.role, createdAt: now });
    else if (m.role !== p.role) await db.update(member).set({ role: p.role }).where(eq(member.id, m.id));
  }
  return { teamId, userIds };
}
