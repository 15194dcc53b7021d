import type { ChainContext } from "../chain-context";
import type { ChannelAtOffset } from "../offset-state";
import type { FindingsCollector } from "../findings-collector";
import { fGHz, fK, pair } from "../format";
import { type Interval, insideOf } from "../intervals";
import type { ScheduleTiming } from "../schedule-timing";
import { TOL, exceeds } from "../tolerance";

/** What the schedule rules read about one chain of a schedule. */
export interface ScheduledChain {
  ctx: ChainContext;
  /** The chain's channels with the effective integration (as the result gives them). */
  shared: ChannelAtOffset[];
  /** The same channels with the chain's own integration time. */
  unshared: ChannelAtOffset[];
  out: FindingsCollector;
}

const ms = (v: number) => String(Number(v.toPrecision(6)) + 0);
const pct = (v: number) => `${Number((v * 100).toPrecision(3))} %`;

/**
 * The rules of an observation schedule (docs/plan-format.md §13.7):
 * `schedule-overrun` (on the chain of the first dwell), `retune-blocked`
 * (on the chain retuned into) and, per channel, `shared-nedt-unmet`.
 */
export function scheduleRules(t: ScheduleTiming, chains: ReadonlyMap<string, ScheduledChain>): void {
  const first = chains.get(t.dwells[0]?.chain ?? "");
  if (first && exceeds(t.busyMs, t.plannedCycleMs)) {
    first.out.add(
      "schedule-overrun",
      null,
      `The dwells of laser pair ${t.laser}'s schedule add up to ${ms(t.busyMs)} ms, ${ms(t.busyMs - t.plannedCycleMs)} ms more than its ${ms(t.plannedCycleMs)} ms cycle; each cycle really takes ${ms(t.cycleMs)} ms, and the duty cycles are worked out with that.`,
      { laser: t.laser, busyMs: t.busyMs, plannedCycleMs: t.plannedCycleMs, overrunMs: t.busyMs - t.plannedCycleMs },
    );
  }
  const n = t.dwells.length;
  t.dwells.forEach((d, j) => {
    const prev = t.dwells[(j - 1 + n) % n];
    const into = chains.get(d.chain);
    const from = prev ? chains.get(prev.chain) : undefined;
    if (!into || !from || !prev || prev.chain === d.chain) return;
    const a = from.ctx.chain.loOffsetGHz;
    const b = into.ctx.chain.loOffsetGHz;
    const path: Interval = [Math.min(a, b), Math.max(a, b)];
    const reach = into.ctx.reach;
    if (path[1] - path[0] <= TOL || reach.some((r) => insideOf(path, r))) return;
    const reachText = reach.length ? reach.map((r) => `${fGHz(r[0])}–${fGHz(r[1])} GHz`).join(", ") : "no interval";
    into.out.add(
      "retune-blocked",
      null,
      `Retuning laser 2 of ${t.laser} from chain ${prev.chain}'s LO at ${fGHz(a)} GHz to ${d.chain}'s at ${fGHz(b)} GHz crosses LO offsets the laser cannot reach: the path is not inside one reach interval (${reachText}). Put the two settings in one reach interval or give one chain a laser pair of its own.`,
      { laser: t.laser, fromChain: prev.chain, fromGHz: a, toGHz: b, reachGHz: reach.map(pair) },
    );
  });
  for (const d of t.dwells) {
    const c = chains.get(d.chain);
    if (!c) continue;
    c.shared.forEach((s, i) => {
      const req = s.ch.channel.requiredNedtK;
      const worst = s.envelope.nedt;
      const own = c.unshared[i];
      const alone = own?.envelope.nedt;
      if (req === null || !worst || !own || !alone || !exceeds(worst.value, req) || exceeds(alone.value, req)) return;
      const tauMs = own.ch.channel.integrationMs;
      const { noiseK2s, floorK2 } = alone.model;
      const room = req * req - floorK2;
      const neededDuty = room > 0 ? noiseK2s / ((tauMs / 1000) * room) : null;
      c.out.add(
        "shared-nedt-unmet",
        i,
        `NEΔT of ${s.ch.channel.id} is ${fK(worst.value)} K with the ${pct(d.dutyCycle)} of each cycle chain ${d.chain} gets from laser pair ${t.laser} (${ms(s.ch.channel.integrationMs)} of ${ms(tauMs)} ms integration), above the required ${fK(req)} K by ${fK(worst.value - req)} K; with the laser pair to itself it would be ${fK(alone.value)} K and meet it${neededDuty !== null ? `: the chain needs a duty cycle of at least ${pct(neededDuty)}` : ""}.`,
        {
          laser: t.laser,
          nedtK: worst.value,
          unsharedNedtK: alone.value,
          requiredNedtK: req,
          dutyCycle: d.dutyCycle,
          neededDutyCycle: neededDuty,
        },
      );
    });
  }
}
