/**
 * What-if benchmark of the noise budget (`npm run bench:noise`): the
 * engine's part of one frame of the what-if controls in the lane view,
 * `noiseWhatIf` on chain H2O-183 of the demo plan (db/seed/mission-demo-plan.ts,
 * which carries a conversion efficiency there) with the LO power moved a
 * little each frame, N frames (HETEROLANE_BENCH_FRAMES, default 2000).
 * Prints the median, 95th percentile and maximum time per frame. Target:
 * well under the 16 ms frame (React's render of the small chart comes on
 * top; the Chromium lane bench, `npm run bench:lanes`, measures that for the
 * lane chart). Starts nothing.
 */
import { demoPlan } from "@db/seed/mission-demo-plan";
import { noiseWhatIf } from "@/lib/plan";
import { parsePlan } from "@/schemas/plan";

const parsed = parsePlan(demoPlan());
if (!parsed.ok) throw new Error("the demo plan is invalid");
const plan = parsed.plan;
const frames = Number(process.env.HETEROLANE_BENCH_FRAMES ?? 2000);
const times: number[] = [];
let sink = 0;
for (let i = 0; i < frames; i++) {
  const t0 = performance.now();
  const w = noiseWhatIf(plan, "H2O-183", { loPowerMW: 0.5 + (i % 200) * 0.05, conversionEfficiency: 0.01 });
  times.push(performance.now() - t0);
  sink += w.channels[0]?.nedtK ?? 0;
}
times.sort((a, b) => a - b);
const q = (p: number) => times[Math.min(times.length - 1, Math.floor(p * times.length))]!;
console.log(
  `noiseWhatIf, chain H2O-183 of the demo plan (${plan.channels.filter((c) => c.chain === "H2O-183").length} channels), ${frames} frames:`,
);
console.log(
  `  per frame: median ${q(0.5).toFixed(3)} ms, p95 ${q(0.95).toFixed(3)} ms, max ${times[times.length - 1]!.toFixed(3)} ms (target ≤ 16 ms)`,
);
if (!Number.isFinite(sink)) console.log("  (a NEΔT was not finite)");
