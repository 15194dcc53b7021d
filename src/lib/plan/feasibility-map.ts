import type { Plan } from "@/schemas/plan";
import { buildMapModel, codesOfMask } from "./internals/map-model";
import { mapPieces } from "./internals/map-sweep";
import type { WorkCounter } from "./internals/work-counter";
import type { FindingCode } from "./types";

/** Feasible intervals shorter than this (GHz, 1 kHz) are not listed. */
const MIN_FEASIBLE_GHZ = 1e-6;

export interface FeasibilityMap {
  /** Closures of the feasible LO intervals longer than 1 kHz, increasing L. */
  feasibleGHz: [number, number][];
  /** The rest of the reach union, in maximal intervals of constant firing codes (rules-table order). */
  excludedGHz: { bandGHz: [number, number]; codes: FindingCode[] }[];
}

/**
 * The feasibility map of one chain (docs/plan-format.md §6 "Feasibility
 * map and place"): every LO offset L within the merged reach for which no error
 * rule that depends on L fires for the chain or any of its channels,
 * computed exactly from the breakpoints of the rules (image-response edges
 * bisected to 1e-6 GHz), never by sampling. `options.work` counts the
 * work steps taken (see `WorkCounter`).
 */
export function feasibilityMap(plan: Plan, chainId: string, options: { work?: WorkCounter } = {}): FeasibilityMap {
  const pieces = mapPieces(buildMapModel(plan, chainId), options.work);
  const feasibleGHz: [number, number][] = [];
  const excludedGHz: FeasibilityMap["excludedGHz"] = [];
  for (const p of pieces) {
    if (p.mask === 0) {
      if (p.hi - p.lo > MIN_FEASIBLE_GHZ) feasibleGHz.push([p.lo, p.hi]);
    } else excludedGHz.push({ bandGHz: [p.lo, p.hi], codes: codesOfMask(p.mask) });
  }
  return { feasibleGHz, excludedGHz };
}
