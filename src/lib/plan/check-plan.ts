import type { Plan } from "@/schemas/plan";
import { chainContext } from "./internals/chain-context";
import { channelResult } from "./internals/channel-result";
import { evaluateChain } from "./internals/evaluate-chain";
import { FindingsCollector } from "./internals/findings-collector";
import { mergeFindings } from "./internals/merge-findings";
import { type ScheduledChain, scheduleRules } from "./internals/rules/schedule-rules";
import { dutyByChain, scheduleResult, withEffectiveIntegration } from "./internals/schedule-result";
import { scheduledLasers, scheduleTiming } from "./internals/schedule-timing";
import { optimalLoMW } from "./internals/noise-budget";
import { temperatureWindowAt } from "./internals/temperature-window";
import type { WorkCounter } from "./internals/work-counter";
import { feasibilityMap } from "./feasibility-map";
import { placeLo } from "./place-lo";
import {
  type ChainResult,
  type ChannelResult,
  type Finding,
  RESULT_FORMAT,
  type ResultDocument,
  type Spur,
} from "./types";

export interface CheckOptions {
  /**
   * A counter the check adds its work steps to (see `WorkCounter`): how
   * much enumeration the plan's magnitudes caused, for tests that bound the
   * engine's work without timing it.
   */
  work?: WorkCounter;
}

/**
 * Check a parsed plan and build the whole `heterolane.result/2` document
 * (docs/plan-format.md §7 "The result document" and §12.7): per chain the
 * linewidth, photodiode power, feasibility map, place and temperature
 * window; per channel the nominal IF figures and the figures over the
 * operating envelope; every kept spur; every finding in the order of §4.3.
 *
 * With observation schedules (§13) the chains of a schedule are checked
 * with their channels' effective integration times, once more with their
 * own (for the findings and figures that compare the two), and the
 * document gains its `schedules` section; a plan without schedules is
 * checked exactly as before.
 */
export function checkPlan(written: Plan, options: CheckOptions = {}): ResultDocument {
  const { work } = options;
  const timings = scheduledLasers(written).map((l) => scheduleTiming(written, l));
  const duty = dutyByChain(timings);
  const plan = withEffectiveIntegration(written, duty);
  const scheduled = new Map<string, ScheduledChain>();
  const evaluated: { findings: Finding[]; channelIds: string[]; scheduled: ScheduledChain | undefined }[] = [];
  const chains: ChainResult[] = [];
  const byChannelId = new Map<string, ChannelResult>();
  const spurs: Spur[] = [];
  const findings: Finding[] = [];
  for (const chain of plan.chains) {
    const ctx = chainContext(plan, chain.id);
    const evaluation = evaluateChain(ctx, chain.loOffsetGHz, { work });
    const map = feasibilityMap(plan, chain.id, { work });
    const place = placeLo(plan, chain.id, map.feasibleGHz);
    const window = temperatureWindowAt(ctx, chain.loOffsetGHz, evaluation.findings, evaluation.channels);
    chains.push({
      id: chain.id,
      linewidthMHz: ctx.delta * 1000,
      pdInputMW: ctx.pdMW,
      // the map's arrays are built fresh for this call and owned by nobody else
      feasibleGHz: map.feasibleGHz,
      excludedGHz: map.excludedGHz,
      placeGHz: place.placeGHz,
      placeReason: place.placeReason,
      temperatureWindowK: window.intervalsK,
      temperatureMarginK: window.marginK,
      ...(ctx.noise ? { optimalLoPowerMW: optimalLoMW(ctx.noise, ctx.detector.maxInputMW) } : {}),
    });
    for (const c of evaluation.channels) byChannelId.set(c.ch.channel.id, channelResult(c));
    spurs.push(...evaluation.spurs);
    let s: ScheduledChain | undefined;
    if (duty.has(chain.id)) {
      const channelIds = ctx.channels.map((c) => c.channel.id);
      const alone = evaluateChain(chainContext(written, chain.id), chain.loOffsetGHz, { work });
      s = {
        ctx,
        shared: evaluation.channels,
        unshared: alone.channels,
        out: new FindingsCollector(chain.id, channelIds),
      };
      scheduled.set(chain.id, s);
    }
    evaluated.push({ findings: evaluation.findings, channelIds: ctx.channels.map((c) => c.channel.id), scheduled: s });
  }
  for (const t of timings) scheduleRules(t, scheduled);
  for (const e of evaluated)
    findings.push(...(e.scheduled ? mergeFindings(e.findings, e.scheduled.out.ordered(), e.channelIds) : e.findings));
  const channels: ChannelResult[] = [];
  for (const channel of plan.channels) {
    const r = byChannelId.get(channel.id);
    if (r) channels.push(r);
  }
  const doc: ResultDocument = { format: RESULT_FORMAT, chains, channels, spurs, findings };
  if (timings.length) doc.schedules = timings.map((t) => scheduleResult(t, scheduled));
  return doc;
}
