import type { Plan } from "@/schemas/plan";
import { bestSplit } from "../best-split";
import type { BestSplitResult, ScheduleChannelResult, ScheduleResult } from "../schedule-types";
import type { ScheduledChain } from "./rules/schedule-rules";
import type { ScheduleTiming } from "./schedule-timing";
import { type SplitChannel, type SplitProblem, splitMargin, splitNedts } from "./split-margin";

const finite = (v: number | null | undefined): number | null =>
  v !== null && v !== undefined && Number.isFinite(v) ? v + 0 : null;

/** Each scheduled chain's duty cycle (its dwell's usable time over the cycle). */
export function dutyByChain(timings: readonly ScheduleTiming[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const t of timings) for (const d of t.dwells) out.set(d.chain, d.dutyCycle);
  return out;
}

/**
 * The plan the engine checks when some chains share a laser pair: every
 * channel of a scheduled chain integrates `integrationMs × dutyCycle`
 * (docs/plan-format.md §13.4). Channels of other chains, and of a chain
 * with the whole cycle (duty 1), are left exactly as they are.
 */
export function withEffectiveIntegration(plan: Plan, duty: ReadonlyMap<string, number>): Plan {
  if (duty.size === 0) return plan;
  return {
    ...plan,
    channels: plan.channels.map((c) => {
      const k = duty.get(c.chain);
      return k === undefined || k === 1 ? c : { ...c, integrationMs: c.integrationMs * k };
    }),
  };
}

/** The `schedules` entry of one laser pair (docs/plan-format.md §13.5). */
export function scheduleResult(t: ScheduleTiming, chains: ReadonlyMap<string, ScheduledChain>): ScheduleResult {
  const channels: ScheduleChannelResult[] = [];
  const problem: SplitProblem = { cycleMs: t.plannedCycleMs, dwells: [] };
  // where each channel sits in the split problem's list of channels (null: not in it)
  const slotOf: (number | null)[] = [];
  let k = 0;
  for (const d of t.dwells) {
    const c = chains.get(d.chain);
    const splitChannels: SplitChannel[] = [];
    (c?.shared ?? []).forEach((s, i) => {
      const alone = c?.unshared[i];
      // the channel as written (the shared evaluation's copy has the effective integration time)
      const channel = alone?.ch.channel ?? s.ch.channel;
      channels.push({
        id: channel.id,
        chain: d.chain,
        integrationMs: channel.integrationMs,
        effectiveIntegrationMs: s.ch.channel.integrationMs,
        nedtK: finite(s.sensitivity?.nedtK),
        worstNedtK: finite(s.envelope.nedt?.value),
        unsharedNedtK: finite(alone?.sensitivity?.nedtK),
        unsharedWorstNedtK: finite(alone?.envelope.nedt?.value),
        requiredNedtK: channel.requiredNedtK,
      });
      const model = alone?.envelope.nedt?.model;
      if (
        channel.requiredNedtK !== null &&
        model &&
        Number.isFinite(model.noiseK2s) &&
        Number.isFinite(model.floorK2)
      ) {
        splitChannels.push({ requiredNedtK: channel.requiredNedtK, integrationMs: channel.integrationMs, model });
        slotOf.push(k++);
      } else slotOf.push(null);
    });
    problem.dwells.push({
      switchMs: d.retuneMs + d.relockMs,
      fixedMs: splitChannels.length ? null : d.dwellMs,
      channels: splitChannels,
    });
  }
  const best = bestSplit(problem);
  let split: BestSplitResult | null = null;
  if (best) {
    const predicted = splitNedts(problem, best.dwellsMs);
    split = {
      method: best.method,
      commonMargin: best.commonMargin,
      currentMargin: splitMargin(
        problem,
        t.dwells.map((d) => d.dwellMs),
      ),
      dwellsMs: best.dwellsMs.map((v) => Math.floor(v * 1000) / 1000),
      worstNedtK: slotOf.map((s) => (s === null ? null : finite(predicted[s]))),
    };
  }
  return {
    laser: t.laser,
    plannedCycleMs: t.plannedCycleMs,
    busyMs: t.busyMs,
    cycleMs: t.cycleMs,
    idleMs: t.idleMs,
    dwells: t.dwells,
    channels,
    bestSplit: split,
  };
}
