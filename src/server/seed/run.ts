/**
 * `npm run db:seed` (and `npm run demo`): seeds the demo data into
 * DATABASE_URL. Entry point only; the work is in seed-demo.ts.
 *
 * The seed runs the server's own save path, whose modules are marked
 * `import "server-only"`. That marker package throws unless it is resolved
 * with the `react-server` export condition (as Next.js does for server
 * code). This command is server code run by Node, so the hook below resolves
 * that one package with that condition — and nothing else differently (no
 * `--conditions` flag, which would change how every package resolves).
 * The seed is loaded afterwards, by dynamic import, so the hook applies.
 */
import { register } from "node:module";

const SERVER_ONLY_HOOK = `
export async function resolve(specifier, context, nextResolve) {
  if (specifier !== "server-only") return nextResolve(specifier, context);
  return nextResolve(specifier, { ...context, conditions: [...context.conditions, "react-server"] });
}`;
register(`data:text/javascript,${encodeURIComponent(SERVER_ONLY_HOOK)}`);

const { pool } = await import("@db/client");
const { seedDemo } = await import("./seed-demo");
try {
  await seedDemo();
} catch (err) {
  console.error("[seed] failed:", err);
  process.exitCode = 1;
} finally {
  await pool.end();
}
