import "server-only";
import { eq } from "drizzle-orm";
import { lasers } from "@db/schema";
import {
  SHARED_LASER_MISSION_DESCRIPTION,
  SHARED_LASER_MISSION_NAME,
  sharedLaserDemoPlan,
} from "@db/seed/shared-laser-demo-plan";
import { checkPlan } from "@/lib/plan";
import { inTransaction } from "@/server/core/db";
import { submitReview } from "@/server/review";
import { createMissionIn } from "@/server/workspace/missions";
import { replaceDraft } from "@/server/workspace/plan-io";
import { saveAndCheck } from "@/server/workspace/save-and-check";
import { demoActor, existingMission, parsedDemoPlan } from "./seed-parts";

/**
 * Seeds the second invented demo mission, the shared-laser instrument
 * (idempotent: skipped when the team already has a mission of that name):
 * the plan as written is one revision, the same plan with the
 * best split of its schedule applied the next, both through saveAndCheck;
 * that revision is then submitted for review by the demo engineer (the
 * team's leads and owners are mailed, as for any submission).
 */
export async function seedSharedLaserMission(
  teamId: string,
  authorUserId: string,
): Promise<{ missionId: string; created: boolean; revision?: number }> {
  const existing = await existingMission(teamId, SHARED_LASER_MISSION_NAME);
  if (existing) return { missionId: existing, created: false };
  const actor = await demoActor(teamId, authorUserId, "seedSharedLaserMission");
  const plan = parsedDemoPlan(sharedLaserDemoPlan(), "shared-laser demo plan");
  const best = checkPlan(plan).schedules?.[0]?.bestSplit;
  if (!best) throw new Error("the shared-laser demo plan has no best split");
  const seeded = await inTransaction(async (tx) => {
    const mission = await createMissionIn(tx, actor, SHARED_LASER_MISSION_NAME, SHARED_LASER_MISSION_DESCRIPTION);
    await replaceDraft(tx, mission.id, plan);
    await saveAndCheck(tx, mission.id, actor, {
      action: "import",
      entity: "plan",
      summary: "Loaded the invented shared-laser demo plan (demo data).",
    });
    const [laser] = await tx.select().from(lasers).where(eq(lasers.missionId, mission.id));
    if (!laser?.schedule) throw new Error("the shared-laser demo laser has no schedule");
    await tx
      .update(lasers)
      .set({
        schedule: {
          ...laser.schedule,
          dwells: laser.schedule.dwells.map((d, j) => ({ ...d, dwellMs: best.dwellsMs[j]! })),
        },
        version: laser.version + 1,
        updatedAt: new Date(),
      })
      .where(eq(lasers.id, laser.id));
    const revision = await saveAndCheck(tx, mission.id, actor, {
      action: "update",
      entity: `laser ${laser.key}`,
      summary: `Applied the best split of laser ${laser.key}'s schedule (demo data).`,
    });
    return { missionId: mission.id, created: true, revision: revision.number };
  });
  await submitReview(actor, seeded.missionId, {
    revision: seeded.revision,
    note: "Demo data: the best split of the shared laser pair applied; every channel meets its requirement.",
  });
  return seeded;
}
