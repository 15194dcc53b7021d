/**
 * The seed command (`npm run db:seed`, run by `npm run demo`) as a separate
 * process: plain `tsx src/server/seed/run.ts`, no extra Node flags, against
 * DATABASE_URL. Idempotent: the second run finds the demo mission in place.
 */
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { describe, expect, it } from "vitest";

const run = promisify(execFile);

describe("the seed command", () => {
  it("seeds the demo team and mission without --conditions, and a second run changes nothing", async () => {
    const seed = () =>
      run("node_modules/.bin/tsx", ["src/server/seed/run.ts"], {
        env: { ...process.env, NODE_OPTIONS: "" },
        timeout: 120_000,
      });
    const first = await seed();
    expect(first.stdout).toMatch(/\[seed\] demo team ready \(\S+\) with four demo accounts/);
    expect(first.stdout).toMatch(/\[seed\] demo mission (created|already there)/);
    const second = await seed();
    expect(second.stdout).toMatch(/\[seed\] demo mission already there/);
  }, 240_000);
});
