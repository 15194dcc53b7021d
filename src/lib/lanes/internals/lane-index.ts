import type { LaneFindingInput, LanePlanInput, LaneResultInput } from "../types";

type Of<T extends readonly unknown[]> = T[number];

/** The plan's parts and the result's entries by id, built once per lane model. */
export interface LaneIndex {
  chanResult: Map<string, Of<LaneResultInput["channels"]>>;
  chainResult: Map<string, Of<LaneResultInput["chains"]>>;
  /** Findings of each channel, and the chain-level findings (`channel: null`) of each chain, in result order. */
  findingsByChannel: Map<string, LaneFindingInput[]>;
  findingsByChain: Map<string, LaneFindingInput[]>;
  chainOf: Map<string, Of<LanePlanInput["chains"]>>;
  laserOf: Map<string, Of<LanePlanInput["lasers"]>>;
  resonatorOf: Map<string, Of<LanePlanInput["resonators"]>>;
  detectorOf: Map<string, Of<LanePlanInput["detectors"]>>;
}

export function laneIndex(plan: LanePlanInput, result: LaneResultInput): LaneIndex {
  const chanResult = new Map(result.channels.map((c) => [c.id, c]));
  const chainResult = new Map(result.chains.map((c) => [c.id, c]));
  const findingsByChannel = new Map<string, LaneFindingInput[]>();
  const findingsByChain = new Map<string, LaneFindingInput[]>();
  for (const f of result.findings) {
    if (f.channel !== null) {
      const list = findingsByChannel.get(f.channel) ?? [];
      list.push(f);
      findingsByChannel.set(f.channel, list);
    } else {
      const list = findingsByChain.get(f.chain) ?? [];
      list.push(f);
      findingsByChain.set(f.chain, list);
    }
  }
  return {
    chanResult,
    chainResult,
    findingsByChannel,
    findingsByChain,
    chainOf: new Map(plan.chains.map((c) => [c.id, c])),
    laserOf: new Map(plan.lasers.map((l) => [l.id, l])),
    resonatorOf: new Map(plan.resonators.map((r) => [r.id, r])),
    detectorOf: new Map(plan.detectors.map((d) => [d.id, d])),
  };
}
