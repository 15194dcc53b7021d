import type { Finding, Spur } from "../types";
import type { ChainContext } from "./chain-context";
import type { EnvelopeBox } from "./envelope-box";
import { FindingsCollector } from "./findings-collector";
import { type ChannelAtOffset, offsetState } from "./offset-state";
import { detectorRules } from "./rules/detector-rules";
import { imageRules } from "./rules/image-rules";
import { lockRules } from "./rules/lock-rules";
import { loRules } from "./rules/lo-rules";
import { overlapRules } from "./rules/overlap-rules";
import { passbandRules } from "./rules/passband-rules";
import { noiseRules } from "./rules/noise-rules";
import { powerRules } from "./rules/power-rules";
import { centreRules } from "./rules/centre-rules";
import { regulatoryRules } from "./rules/regulatory-rules";
import { plausibilityRules } from "./rules/plausibility-rules";
import { samplingRules } from "./rules/sampling-rules";
import { sensitivityRules } from "./rules/sensitivity-rules";
import { spurRules } from "./rules/spur-rules";
import type { WorkCounter } from "./work-counter";

export type { ChannelAtOffset } from "./offset-state";

/** What to evaluate at an offset. */
export interface EvaluateOptions {
  /**
   * Only the error rules that depend on L (those that shape the feasibility
   * map): skips the harmonic and intermodulation families, sensitivity and
   * every rule that does not depend on L. Default false.
   */
  mapOnly?: boolean;
  /** Counts the work steps of the evaluation (see `WorkCounter`). */
  work?: WorkCounter;
  /** The operating envelope the worst values are taken over; the chain's own (±D, ±Te) unless told. */
  box?: EnvelopeBox;
}

export interface ChainEvaluation {
  L: number;
  channels: ChannelAtOffset[];
  /** Every finding of the chain and its channels, in the order of docs/plan-format.md §4.3. */
  findings: Finding[];
  /** Every kept spur of the chain (family in table order, then band); in map-only mode the error families only. */
  spurs: Spur[];
}

/**
 * Evaluate every rule of one chain at LO offset L (GHz). The chain's own
 * `loOffsetGHz` is ignored; pass it for the plan as written.
 *
 * The geometry at L is worked out once (`offsetState`); each rule family
 * (`rules/`) reads it and adds its findings to one `FindingsCollector`,
 * which puts them in the order of docs/plan-format.md §4.3 "Order of findings".
 */
export function evaluateChain(ctx: ChainContext, L: number, options: EvaluateOptions = {}): ChainEvaluation {
  const at = offsetState(ctx, L, options.mapOnly === true, options.box ?? ctx.box);
  const out = new FindingsCollector(
    ctx.chain.id,
    ctx.channels.map((ch) => ch.channel.id),
  );
  loRules(at, out);
  samplingRules(at, out);
  lockRules(at, out);
  powerRules(at, out);
  noiseRules(at, out);
  passbandRules(at, out);
  centreRules(at, out);
  detectorRules(at, out);
  overlapRules(at, out);
  imageRules(at, out);
  const spurs = spurRules(at, out, options.work);
  sensitivityRules(at, out);
  regulatoryRules(at, out);
  plausibilityRules(at, out);
  return { L, channels: at.channels, findings: out.ordered(), spurs };
}
