import type { Plan } from "@/schemas/plan";
import { checkChainAtOffset } from "./check-chain-at-offset";
import type { MapPiece } from "./internals/map-sweep";
import { L_DEPENDENT_ERROR_CODES, type FindingCode } from "./types";

/** Helpers shared by the feasibility map's tests. */

/** The L-dependent error codes the full per-offset check reports at L, in rules-table order. */
export function fullCheckCodes(plan: Plan, chainId: string, L: number): FindingCode[] {
  const seen = new Set<FindingCode>();
  for (const f of checkChainAtOffset(plan, chainId, L)) {
    if (f.severity === "error" && L_DEPENDENT_ERROR_CODES.includes(f.code)) seen.add(f.code);
  }
  return L_DEPENDENT_ERROR_CODES.filter((c) => seen.has(c));
}

/** Points inside every piece, kept `margin` away from its edges (image edges are bisected to 1e-6 GHz). */
export function interiorPoints(
  pieces: readonly MapPiece[],
  fractions: readonly number[],
  margin = 3e-6,
): { L: number; piece: MapPiece }[] {
  const out: { L: number; piece: MapPiece }[] = [];
  for (const piece of pieces) {
    if (piece.hi - piece.lo <= 2 * margin) continue;
    for (const f of fractions) out.push({ L: piece.lo + margin + f * (piece.hi - piece.lo - 2 * margin), piece });
  }
  return out;
}

export const FRACTIONS = [0, 0.013, 0.31, 0.5, 0.77, 0.999, 1];
