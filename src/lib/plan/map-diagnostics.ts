import type { Plan } from "@/schemas/plan";
import { buildMapModel, codesOfMask } from "./internals/map-model";
import { makePointEvaluator } from "./internals/map-point";
import { type MapPiece, mapPieces } from "./internals/map-sweep";
import type { FindingCode } from "./types";

/**
 * The feasibility map of one chain opened up for the benchmark and for
 * diagnostics (product code uses `feasibilityMap`).
 */
export interface MapDiagnostics {
  /** Merged reach intervals of the chain's laser pair (GHz), increasing. */
  reachGHz: [number, number][];
  channelCount: number;
  /** The detector's sample rate (GHz), null for an IF that is not digitised. */
  sampleRateGHz: number | null;
  /** The exact map before it is cut into feasible and excluded intervals: pieces tiling the reach union, each with its code-set mask. */
  pieces: MapPiece[];
  /**
   * The lean per-offset check of the same rules: the code-set mask at one
   * LO offset L (GHz), evaluated directly from the rules (the grid
   * reference the exact map is compared with). Built once, called per offset.
   */
  maskAt: (L: number) => number;
  /** The codes of a mask, in rules-table order. */
  codesOf: (mask: number) => FindingCode[];
}

/** Open up the feasibility map of chain `chainId` (see `MapDiagnostics`). Throws when the chain does not exist. */
export function mapDiagnostics(plan: Plan, chainId: string): MapDiagnostics {
  const model = buildMapModel(plan, chainId);
  return {
    reachGHz: model.reach,
    channelCount: model.channels.length,
    sampleRateGHz: model.halfFs === null ? null : model.halfFs * 2,
    pieces: mapPieces(model),
    maskAt: makePointEvaluator(model),
    codesOf: codesOfMask,
  };
}
