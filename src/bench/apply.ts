/**
 * Channel-list apply benchmark (`npm run bench:apply`, docs/decisions/023-hardening.md):
 * how long a 256-row channel CSV apply holds the mission lock — the time
 * every other edit of that mission waits. Target: under 200 ms (issue 17;
 * the old row-by-row path held it 8.4 s for a 20 000-row file that was
 * refused at the end). Runs the server's own path against DATABASE_URL
 * (src/ops/bench-apply.sh gives it a throwaway cluster): the file is read
 * and validated, and the plan it leaves checked, outside the lock
 * (`prepareChannelUpload`); the revision and findings are written before
 * the lock (`stageRevision`; a concurrent edit is timed meanwhile, to show
 * it does not wait); then the lock is taken and the locked part
 * (`applyPreparedChannels`: re-read chains, one upsert statement, the stored
 * upload, the plan assembled again and compared, the revision numbered) is
 * timed from the lock to the commit. The first apply inserts 244 rows
 * beside the demo mission's 12; the later ones update all 256. Prints the
 * median and the worst with PASS/MISS, the unlocked preparation beside it,
 * and the load average (the machine may be shared).
 *
 * All data here is invented demo data.
 */
import { register } from "node:module";
import { loadavg } from "node:os";

// The server's modules are marked `import "server-only"`: resolve that one package as Next does (see src/server/seed/run.ts).
const SERVER_ONLY_HOOK = `
export async function resolve(specifier, context, nextResolve) {
  if (specifier !== "server-only") return nextResolve(specifier, context);
  return nextResolve(specifier, { ...context, conditions: [...context.conditions, "react-server"] });
}`;
register(`data:text/javascript,${encodeURIComponent(SERVER_ONLY_HOOK)}`);

const { db, pool } = await import("@db/client");
const { organization } = await import("@db/schema");
const { demoPlan } = await import("@db/seed/mission-demo-plan");
const { channelsToCsv } = await import("@/lib/imports");
const { inTransaction, lockMission } = await import("@/server/core");
const { applyPreparedChannels, createMission, importPlanDocument, prepareChannelUpload, stageRevision } =
  await import("@/server/workspace");

const TARGET_MS = 200;
const RUNS = 9;

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

async function main() {
  const stamp = Date.now().toString(36);
  const teamId = `bench-team-${stamp}`;
  await db
    .insert(organization)
    .values({ id: teamId, name: "Bench team (demo data)", slug: teamId, createdAt: new Date() });
  const actor = {
    userId: `bench-user-${stamp}`,
    email: "bench@demo.heterolane.local",
    name: "Bench",
    teamId,
    role: "owner" as const,
  };
  const mission = await createMission(actor, { name: "Bench: 256-channel apply (demo data)" });
  const plan = demoPlan();
  await importPlanDocument(actor, mission.id, plan);

  // 256 rows: 64 channels on each of the demo's four chains, 20 MHz wide every 30 MHz across the
  // chain's RF input (the demo's own 12 channels among them, updated by key); invented values.
  const base = plan.channels[0]!;
  const rows = (run: number) =>
    plan.chains.flatMap((c, ci) =>
      Array.from({ length: 64 }, (_, i) => {
        const own = ci * 3 + i < plan.channels.length && i < 3 ? plan.channels[ci * 3 + i]! : null;
        return {
          key: own ? own.id : `${c.id}-b${i}`,
          name: `${own ? own.name : `bench channel ${i}`} (run ${run})`,
          chain: c.id,
          centerGHz: Number((c.rfInput.minGHz + 0.05 + i * 0.03).toFixed(3)),
          bandwidthMHz: 20,
          dsbOffsetGHz: null,
          integrationMs: base.integrationMs,
          antennaK: base.antennaK,
          receiverK: base.receiverK,
          gainStability: base.gainStability ?? 0,
          requiredNedtK: base.requiredNedtK ?? null,
        };
      }),
    );

  const locked: number[] = [];
  const prepared: number[] = [];
  const waits: number[] = [];
  for (let run = 0; run < RUNS; run++) {
    const csv = channelsToCsv(rows(run));
    const file = { filename: `bench-${run}.csv`, bytes: Buffer.from(csv) };
    const t0 = performance.now();
    const ready = await prepareChannelUpload(actor, mission.id, { apply: true, offset: 0, limit: 200 }, file);
    const t1 = performance.now();
    if (!("prepared" in ready)) throw new Error("the bench file was previewed, not applied");
    let lockedAt = 0;
    let stagedMs = 0;
    let waited = 0;
    const out = await inTransaction(async (tx) => {
      const s0 = performance.now();
      const check = ready.prepared.check;
      const staged = check ? await stageRevision(tx, mission.id, actor, check) : null;
      stagedMs = performance.now() - s0;
      // Another edit of the mission now, while this transaction holds its staged rows: does it wait?
      const w0 = performance.now();
      await inTransaction((other) => lockMission(other, actor, mission.id));
      waited = performance.now() - w0;
      await lockMission(tx, actor, mission.id);
      lockedAt = performance.now();
      return applyPreparedChannels(tx, actor, mission.id, ready.prepared, staged);
    });
    const committed = performance.now();
    if (out.created + out.updated !== 256) throw new Error(`applied ${out.created + out.updated} rows, not 256`);
    prepared.push(t1 - t0);
    locked.push(committed - lockedAt);
    waits.push(waited);
    console.log(
      `  run ${run + 1}: ${out.created} created, ${out.updated} updated; lock held ${(committed - lockedAt).toFixed(1)} ms ` +
        `(before the lock: reading and checking ${(t1 - t0).toFixed(1)} ms, writing the revision ${stagedMs.toFixed(1)} ms, ` +
        `during which another edit took the lock in ${waited.toFixed(1)} ms)`,
    );
  }
  const med = median(locked);
  const worst = Math.max(...locked);
  console.log(
    `channel CSV apply, 256 rows: mission lock held median ${med.toFixed(1)} ms, worst ${worst.toFixed(1)} ms over ${RUNS} runs ` +
      `(target < ${TARGET_MS} ms) ${med < TARGET_MS ? "PASS" : "MISS"}; reading and checking without the lock median ${median(prepared).toFixed(1)} ms; ` +
      `another edit during the revision write waited median ${median(waits).toFixed(1)} ms; ` +
      `load average ${loadavg()[0]!.toFixed(2)}`,
  );
}

try {
  await main();
} catch (err) {
  console.error("[bench:apply] failed:", err);
  process.exitCode = 1;
} finally {
  await pool.end();
}
