import "server-only";
import { DEMO_MISSION_DESCRIPTION, DEMO_MISSION_NAME, demoPlan } from "@db/seed/mission-demo-plan";
import { inTransaction } from "@/server/core/db";
import { createMissionIn } from "@/server/workspace/missions";
import { replaceDraft } from "@/server/workspace/plan-io";
import { saveAndCheck } from "@/server/workspace/save-and-check";
import { demoActor, existingMission, parsedDemoPlan } from "./seed-parts";

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
  const existing = await existingMission(teamId, DEMO_MISSION_NAME);
  if (existing) return { missionId: existing, created: false };
  const actor = await demoActor(teamId, authorUserId, "seedDemoMission");
  const plan = parsedDemoPlan(demoPlan(), "demo plan");
  return inTransaction(async (tx) => {
    const mission = await createMissionIn(tx, actor, DEMO_MISSION_NAME, DEMO_MISSION_DESCRIPTION);
    await replaceDraft(tx, mission.id, plan);
    const revision = await saveAndCheck(tx, mission.id, actor, {
      action: "import",
      entity: "plan",
      summary: "Loaded the invented demo plan (demo data).",
    });
    return { missionId: mission.id, created: true, revision: revision.number };
  });
}
