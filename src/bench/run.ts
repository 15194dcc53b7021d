/**
 * Plan engine benchmark (`npm run bench`).
 *
 * 1. Median time of a full `checkPlan` (map and place included) of the
 *    seeded demo mission's plan, `demoPlan()` in
 *    `db/seed/mission-demo-plan.ts` (4 chains, 12 channels; the speed
 *    target is a median under 2 ms), with the CPU time, the best batch and
 *    the load average beside it (the machine may be shared and loaded).
 *    Extra lines: the clean example `docs/examples/clean.plan.json` and a
 *    4-chain, 16-channel plan (four renamed copies of example 2).
 *    And the demo plan with ±1 K of resonator temperature on every chain
 *    (an FSR shift of −6.28 MHz/K): a nonzero operating envelope in both
 *    directions (target also under 2 ms).
 * 2. For a generated 64-channel chain (spurMaxOrder 7, a 300 GHz reach,
 *    a sampled IF so that folding and aliasing are exercised): the
 *    feasibility map computed exactly, and by a 1 MHz grid that evaluates
 *    the L-dependent error codes at every grid point with the lean
 *    per-offset evaluation; their times, the ratio, and whether they agree
 *    at every grid point. Once with ±5 MHz of drift, once over the
 *    envelope D = 10 MHz, Te = 1 K (target ≥ 100× either way).
 *
 * All data here is invented demo data.
 */
import { existsSync, readFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { fileURLToPath } from "node:url";
import { demoPlan } from "@db/seed/mission-demo-plan";
import { type Plan, parsePlan } from "@/schemas/plan";
import { checkPlan, feasibilityMap, mapDiagnostics, placeLo } from "@/lib/plan";
import { type GeneratedEnvelope, generatedChainPlan } from "./generated-chain";

const root = fileURLToPath(new URL("../../", import.meta.url));

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
}

function mustParse(input: unknown, what: string): Plan {
  const r = parsePlan(input);
  if (!r.ok)
    throw new Error(`${what} is not a valid plan: ${r.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}`);
  return r.plan;
}

/**
 * Time `fn` `runs` times after `warm` warm-up calls; returns the median wall
 * time and the median CPU time of this process in ms (the CPU figure is the
 * one to trust on a shared, loaded machine).
 */
function timeMedians(fn: () => unknown, runs: number, warm: number): { wall: number; cpu: number } {
  for (let i = 0; i < warm; i++) fn();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c = process.cpuUsage();
    const a = performance.now();
    fn();
    wall.push(performance.now() - a);
    const d = process.cpuUsage(c);
    cpu.push((d.user + d.system) / 1000);
  }
  return { wall: median(wall), cpu: median(cpu) };
}

/** Median, best batch and load: honest figures on a shared, loaded machine. */
function report(label: string, fn: () => unknown, runs: number, warm: number): void {
  const t = timeMedians(fn, runs, warm);
  // best-of-batches: the fastest mean over batches of 20 calls (the least disturbed figure)
  let best = Number.POSITIVE_INFINITY;
  for (let b = 0; b < 10; b++) {
    const a = performance.now();
    for (let i = 0; i < 20; i++) fn();
    best = Math.min(best, (performance.now() - a) / 20);
  }
  const load = loadavg()
    .map((x) => x.toFixed(2))
    .join(" ");
  console.log(label);
  console.log(
    `  median ${t.wall.toFixed(3)} ms wall, ${t.cpu.toFixed(3)} ms CPU over ${runs} runs; best batch of 20: ${best.toFixed(3)} ms per call; ` +
      `load average ${load} on ${cpus().length} cores (target: median < 2 ms) ${t.wall < 2 ? "PASS" : "MISS"}`,
  );
}

function demoSection(): void {
  const plan = mustParse(demoPlan(), "demo plan");
  report(
    `full checkPlan of the demo plan, demoPlan() in db/seed/mission-demo-plan.ts (${plan.chains.length} chains, ${plan.channels.length} channels; its envelope: ±20–100 MHz of LO drift and the chains' temperature excursions):`,
    () => checkPlan(plan),
    400,
    100,
  );
  // the same plan as a version 2 document with a resonator temperature envelope on every chain
  const warm = demoPlan();
  warm.format = "heterolane.plan/2";
  for (const r of warm.resonators) r.fsrShiftMHzPerK = -6.28;
  for (const c of warm.chains) c.temperatureExcursionK = 1;
  const warmPlan = mustParse(warm, "demo plan with a temperature envelope");
  report(
    "full checkPlan of the demo plan with ±1 K of resonator temperature at −6.28 MHz/K on every chain (the LO drift as above):",
    () => checkPlan(warmPlan),
    400,
    100,
  );
}

function fullCheckSection(): void {
  const file = `${root}docs/examples/clean.plan.json`;
  if (!existsSync(file)) {
    console.log("docs/examples/clean.plan.json: missing, skipped");
    return;
  }
  const plan = mustParse(JSON.parse(readFileSync(file, "utf8")), file);
  report(
    `full checkPlan of ${file.slice(root.length)} (${plan.chains.length} chains, ${plan.channels.length} channels):`,
    () => checkPlan(plan),
    400,
    100,
  );
}

/** Four renamed copies of worked example 2 (sampled IF, four channels each): 4 chains, 16 channels. */
function fourChainPlan(): unknown {
  const ex2 = JSON.parse(readFileSync(`${root}tests/fixtures/plans/ex2-lower-sideband-sampled.plan.json`, "utf8"));
  const out = {
    ...ex2,
    name: "Demo data: four copies of worked example 2",
    lasers: [],
    resonators: [],
    detectors: [],
    chains: [],
    channels: [],
  };
  for (let k = 1; k <= 4; k++) {
    const tag = (id: string) => `${id}-${k}`;
    out.lasers.push(...ex2.lasers.map((x: { id: string }) => ({ ...x, id: tag(x.id) })));
    out.resonators.push(...ex2.resonators.map((x: { id: string }) => ({ ...x, id: tag(x.id) })));
    out.detectors.push(...ex2.detectors.map((x: { id: string }) => ({ ...x, id: tag(x.id) })));
    out.chains.push(
      ...ex2.chains.map((x: { id: string; laser: string; resonator: string; detector: string }) => ({
        ...x,
        id: tag(x.id),
        laser: tag(x.laser),
        resonator: tag(x.resonator),
        detector: tag(x.detector),
      })),
    );
    out.channels.push(
      ...ex2.channels.map((x: { id: string; chain: string }) => ({ ...x, id: tag(x.id), chain: tag(x.chain) })),
    );
  }
  return out;
}

function fourChainSection(): void {
  const plan = mustParse(fourChainPlan(), "four-chain plan");
  report(
    `full checkPlan of four copies of worked example 2 (${plan.chains.length} chains, ${plan.channels.length} channels, sampled IF):`,
    () => checkPlan(plan),
    200,
    50,
  );
}

function mapSection(envelope?: GeneratedEnvelope): void {
  const plan = mustParse(generatedChainPlan(envelope), "generated chain");
  const diag = mapDiagnostics(plan, "G");
  const exact = timeMedians(() => feasibilityMap(plan, "G"), 15, 3);
  const exactMs = exact.wall;
  const map = feasibilityMap(plan, "G");
  const { pieces, codesOf } = diag;

  // 1 MHz grid over the reach, lean per-offset evaluation at every point
  const [r0, r1] = diag.reachGHz[0] as [number, number];
  const n = Math.round((r1 - r0) * 1000);
  const evalAt = diag.maskAt;
  const gridMask = new Uint8Array(n + 1);
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  for (let i = 0; i <= n; i++) gridMask[i] = evalAt(r0 + i / 1000);
  const gridMs = performance.now() - t0;
  const c1 = process.cpuUsage(c0);
  const gridCpuMs = (c1.user + c1.system) / 1000;

  // agreement: walk the pieces alongside the grid
  let agreeInterior = 0;
  let disagreeInterior = 0;
  let onEdge = 0;
  let onEdgeOutside = 0;
  const examples: string[] = [];
  let p = 0;
  for (let i = 0; i <= n; i++) {
    const L = r0 + i / 1000;
    while (p + 1 < pieces.length && (pieces[p] as { hi: number }).hi < L) p++;
    const piece = pieces[p]!;
    const g = gridMask[i] as number;
    const nearLo = L - piece.lo < 1e-6 && p > 0;
    const nearHi = piece.hi - L < 1e-6 && p + 1 < pieces.length;
    if (nearLo || nearHi) {
      // a grid point on a map edge: the code set there is decided by the tie rule and must
      // lie between the intersection and the union of the two neighbouring pieces' sets
      onEdge++;
      const other = pieces[nearLo ? p - 1 : p + 1]!;
      const inter = piece.mask & other.mask;
      const union = piece.mask | other.mask;
      if ((g & inter) !== inter || (g & ~union) !== 0) {
        onEdgeOutside++;
        if (examples.length < 5)
          examples.push(`L=${L.toFixed(6)} grid ${codesOf(g)} vs ${codesOf(piece.mask)} | ${codesOf(other.mask)}`);
      }
    } else if (g === piece.mask) agreeInterior++;
    else {
      disagreeInterior++;
      if (examples.length < 5) examples.push(`L=${L.toFixed(6)} grid ${codesOf(g)} vs map ${codesOf(piece.mask)}`);
    }
  }

  const feasibleGHz = map.feasibleGHz.reduce((s, iv) => s + iv[1] - iv[0], 0);
  const laser = plan.lasers[0]!;
  const env = `D = ${laser.driftMHz} MHz, Te = ${plan.chains[0]!.temperatureExcursionK} K, FSR shift ${plan.resonators[0]!.fsrShiftMHzPerK} MHz/K`;
  console.log(
    `generated chain: ${diag.channelCount} channels, spurMaxOrder ${plan.settings.spurMaxOrder}, reach [${r0}, ${r1}] GHz, fs ${diag.sampleRateGHz ?? "none"} GHz; ${env}`,
  );
  const place = placeLo(plan, "G", map.feasibleGHz);
  console.log(
    `  exact map: median ${exactMs.toFixed(2)} ms wall, ${exact.cpu.toFixed(2)} ms CPU over 15 runs; ${map.feasibleGHz.length} feasible intervals (${feasibleGHz.toFixed(3)} GHz), ${map.excludedGHz.length} excluded intervals; place ${place.placeGHz ?? place.placeReason} GHz`,
  );
  console.log(`  feasible: ${map.feasibleGHz.map((iv) => `[${iv[0].toFixed(4)}, ${iv[1].toFixed(4)}]`).join(" ")}`);
  console.log(
    `  1 MHz grid: ${n + 1} points in ${(gridMs / 1000).toFixed(2)} s wall, ${(gridCpuMs / 1000).toFixed(2)} s CPU (${((gridMs / (n + 1)) * 1000).toFixed(2)} µs per point)`,
  );
  console.log(
    `  ratio grid/exact: ${(gridMs / exactMs).toFixed(0)}× wall, ${(gridCpuMs / exact.cpu).toFixed(0)}× CPU (target ≥ 100×) ${gridMs / exactMs >= 100 ? "PASS" : "MISS"}`,
  );
  console.log(
    `  agreement: ${agreeInterior} of ${agreeInterior + disagreeInterior} grid points off the map's edges identical; ` +
      `${onEdge} grid points lie on a map edge (within 1 kHz), ${onEdge - onEdgeOutside} of them between the neighbouring sets`,
  );
  const identical = disagreeInterior === 0 && onEdgeOutside === 0;
  console.log(`  identical answers at every grid point: ${identical ? "YES" : "NO"}`);
  for (const e of examples) console.log(`    ${e}`);
}

demoSection();
fullCheckSection();
fourChainSection();
mapSection();
// the speed case of the operating envelope (issue 11): D = 10 MHz, Te = 1 K
mapSection({ driftMHz: 10, temperatureExcursionK: 1, fsrShiftMHzPerK: -6.28 });
