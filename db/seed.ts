import { pool } from "./client";
import { seedDemoTeam } from "./seed/demo-team";

/**
 * Demo data for `npm run demo` (idempotent; run it as often as you like).
 * Each area adds its own seed module under db/seed/ and one call below.
 */
async function main() {
  const { teamId } = await seedDemoTeam();
  console.log(`[seed] demo team ready (${teamId}) with four demo accounts`);
}

main()
  .catch((err) => {
    console.error("[seed] failed:", err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
