import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@db/client";
import { missions, user } from "@db/schema";
import { parsePlan, type Plan } from "@/schemas/plan";
import type { Actor } from "@/server/auth/actor";

/** The id of the team's mission called `name`, if it has one (the demo seeds are idempotent by name). */
export async function existingMission(teamId: string, name: string): Promise<string | undefined> {
  const [existing] = await db
    .select({ id: missions.id })
    .from(missions)
    .where(and(eq(missions.teamId, teamId), eq(missions.name, name)));
  return existing?.id;
}

/** The demo author as the engineer who saves the demo revisions. */
export async function demoActor(teamId: string, authorUserId: string, seed: string): Promise<Actor> {
  const [author] = await db.select().from(user).where(eq(user.id, authorUserId));
  if (!author) throw new Error(`${seed}: no user ${authorUserId}`);
  return { userId: author.id, email: author.email, name: author.name, teamId, role: "engineer" };
}

/** A demo plan document parsed, or an error naming each invalid path. */
export function parsedDemoPlan(doc: unknown, what: string): Plan {
  const parsed = parsePlan(doc);
  if (!parsed.ok)
    throw new Error(`${what} is invalid: ${parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}`);
  return parsed.plan;
}
