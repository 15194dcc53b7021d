import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@db/client";
import { missions, user } from "@db/schema";
import { DEMO_MISSION_DESCRIPTION, DEMO_MISSION_NAME, demoPlan } from "@db/seed/mission-demo-plan";
import { parsePlan } from "@/schemas/plan";
import type { Actor } from "@/server/auth/actor";
import { inTransaction } from "@/server/core/db";
import { createMissionIn } from "@/server/workspace/missions";
import { replaceDraft } from "@/server/workspace/plan-io";
import { saveAndCheck } from "@/server/workspace/save-and-check";

/**
 * Seeds the invented demo mission into a team (idempotent: skipped when the
 * team already has a mission of that name). The plan goes through the same
 * saveAndCheck path as every edit, so the stored revision, result and
 * findings are the engine's. The demo plan itself is data in
 * db/seed/mission-demo-plan.ts (also read by the benchmark and the tests).
 */
export async function seedDemoMission(
  teamId: string,
  authorUserId: string,
): Promise<{ missionId: string; created: boolean; revision?: number }> {
  const [existing] = await db
    .select({ id: missions.id })
    .from(missions)
    .where(and(eq(missions.teamId, teamId), eq(missions.name, DEMO_MISSION_NAME)));
  if (existing) return { missionId: existing.id, created: false };
  const [author] = await db.select().from(user).where(eq(user.id, authorUserId));
  if (!author) throw new Error(`seedDemoMission: no user ${authorUserId}`);
  const actor: Actor = { userId: author.id, email: author.email, name: author.name, teamId, role: "engineer" };
  const parsed = parsePlan(demoPlan());
  if (!parsed.ok)
    throw new Error(`demo plan is invalid: ${parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}`);
  return inTransaction(async (tx) => {
    const mission = await createMissionIn(tx, actor, DEMO_MISSION_NAME, DEMO_MISSION_DESCRIPTION);
    await replaceDraft(tx, mission.id, parsed.plan);
    const revision = await saveAndCheck(tx, mission.id, actor, {
      action: "import",
      entity: "plan",
      summary: "Loaded the invented demo plan (demo data).",
    });
    return { missionId: mission.id, created: true, revision: revision.number };
  });
}
