import "server-only";
import { seedDemoMission } from "./demo-mission";
import { seedSharedLaserMission } from "./demo-shared-laser-mission";
import { seedDemoTeam } from "./demo-team";

/**
 * Demo data for `npm run demo` (idempotent; run it as often as you like):
 * the demo team with one person per role, then the demo mission. Each area
 * adds its own seed module beside this one and one call below.
 */
export async function seedDemo(log: (line: string) => void = console.log): Promise<void> {
  const { teamId, userIds } = await seedDemoTeam();
  log(`[seed] demo team ready (${teamId}) with four demo accounts`);
  const author = userIds.engineer ?? Object.values(userIds)[0];
  if (!author) throw new Error("the demo team has no members");
  const mission = await seedDemoMission(teamId, author);
  log(
    mission.created
      ? `[seed] demo mission created (${mission.missionId}), checked as revision ${mission.revision}`
      : `[seed] demo mission already there (${mission.missionId})`,
  );
  const shared = await seedSharedLaserMission(teamId, author);
  log(
    shared.created
      ? `[seed] shared-laser demo mission created (${shared.missionId}), best split applied as revision ${shared.revision}`
      : `[seed] shared-laser demo mission already there (${shared.missionId})`,
  );
}
