import type { Plan } from "@/schemas/plan";
import { chainContext, type ChannelContext } from "./internals/chain-context";
import { optimalLoMW } from "./internals/noise-budget";
import { receivedSensitivity, slotAt } from "./internals/slot";
import type { NoiseBudget } from "./types";

/** The hardware a what-if changes (each optional; the plan's value otherwise). */
export interface NoiseWhatIfInputs {
  loPowerMW?: number;
  /** The carrier (pump) power into the resonator. */
  carrierPowerMW?: number;
  conversionEfficiency?: number;
  /** The carrier notch before the detector. */
  carrierRejectionDB?: number;
}

export interface NoiseWhatIfChannel {
  id: string;
  /** The budget with the what-if hardware; null when the chain has none. */
  budget: NoiseBudget | null;
  /** NEΔT at the chain's LO with the budget's total as receiver temperature (K); null without a slot or budget. */
  nedtK: number | null;
  /**
   * The receiver temperature (K) at which NEΔT equals the channel's
   * requirement, everything else as planned: the requirement translated
   * into a receiver-temperature budget; null without a requirement, or
   * when even a noiseless receiver misses it.
   */
  receiverBudgetK: number | null;
}

export interface NoiseWhatIf {
  chain: string;
  /** The LO power minimising every channel's receiver temperature without pd-overload (mW), or null. */
  optimalLoPowerMW: number | null;
  /** Power per photodiode (mW). */
  pdInputMW: number;
  channels: NoiseWhatIfChannel[];
}

function nedtWith(ctx: ReturnType<typeof chainContext>, ch: ChannelContext, receiverK: number): number | null {
  const geo = slotAt(ch, ctx.chain.loOffsetGHz, ctx.D);
  if (!geo) return null;
  const v = receivedSensitivity(ctx, { ...ch, receiverK }, geo, ctx.chain.loOffsetGHz, 0, 0).nedtK;
  return Number.isFinite(v) ? v : null;
}

/**
 * The noise budget of every channel of chain `chainId` with some of its
 * hardware changed (docs/plan-format.md §14.4, §14.5): the budget, the
 * nominal NEΔT with the computed receiver temperature, the requirement as
 * a receiver-temperature budget, and the optimal LO power. For the
 * what-if controls: no spurs, map or envelope are worked out, so it runs
 * within a frame.
 */
export function noiseWhatIf(plan: Plan, chainId: string, inputs: NoiseWhatIfInputs = {}): NoiseWhatIf {
  const chain = plan.chains.find((c) => c.id === chainId);
  if (!chain) throw new Error(`The plan has no chain "${chainId}"`);
  const changed: Plan = {
    ...plan,
    lasers: plan.lasers.map((l) =>
      l.id === chain.laser
        ? {
            ...l,
            loPowerMW: inputs.loPowerMW ?? l.loPowerMW,
            carrierPowerMW: inputs.carrierPowerMW ?? l.carrierPowerMW,
          }
        : l,
    ),
    resonators: plan.resonators.map((r) =>
      r.id === chain.resonator && inputs.conversionEfficiency !== undefined
        ? { ...r, conversionEfficiency: inputs.conversionEfficiency }
        : r,
    ),
    chains: plan.chains.map((c) =>
      c.id === chainId ? { ...c, carrierRejectionDB: inputs.carrierRejectionDB ?? c.carrierRejectionDB } : c,
    ),
    channels: plan.channels.filter((c) => c.chain === chainId),
  };
  const ctx = chainContext(changed, chainId);
  const channels = ctx.channels.map((ch): NoiseWhatIfChannel => {
    const budget = ch.budget;
    const nedtK = budget ? nedtWith(ctx, ch, budget.totalK) : null;
    const req = ch.channel.requiredNedtK;
    let receiverBudgetK: number | null = null;
    const at0 = nedtWith(ctx, ch, 0);
    if (req !== null && at0 !== null && at0 <= req) {
      // NEΔT grows with the receiver temperature: bisect for NEΔT = requirement
      let lo = 0;
      let hi = 1;
      while ((nedtWith(ctx, ch, hi) ?? Infinity) < req && hi < 1e12) hi *= 4;
      for (let i = 0; i < 80 && hi - lo > 1e-9 * hi; i++) {
        const mid = (lo + hi) / 2;
        if ((nedtWith(ctx, ch, mid) ?? Infinity) < req) lo = mid;
        else hi = mid;
      }
      receiverBudgetK = lo;
    }
    return { id: ch.channel.id, budget, nedtK, receiverBudgetK };
  });
  return {
    chain: chainId,
    optimalLoPowerMW: ctx.noise ? optimalLoMW(ctx.noise, ctx.detector.maxInputMW) : null,
    pdInputMW: ctx.pdMW,
    channels,
  };
}
