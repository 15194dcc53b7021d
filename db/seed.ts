import { pool } from "./client";
import { seedDemoTeam } from "./seed/demo-team";
import { seedDemoMission } from "./seed/mission-demo";

/**
 * Demo data for `npm run demo` (idempotent; run it as often as you like).
 * Each area adds its own seed module under db/seed/ and one call below.
 */
async function main() {
  const { teamId, userIds } = await seedDemoTeam();
  console.log(`[seed] demo team ready (${teamId}) with four demo accounts`);
  const author = userIds.engineer ?? Object.values(userIds)[0];
  if (!author) throw new Error("the demo team has no members");
  const mission = await seedDemoMission(teamId, author);
  console.log(
    mission.created
      ? `[seed] demo mission created (${mission.missionId}), checked as revision ${mission.revision}`
      : `[seed] demo mission already there (${mission.missionId})`,
  );
}

main()
  .catch((err) => {
    console.error("[seed] failed:", err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
