import type { Sensitivity } from "./slot";

/**
 * A channel's NEΔT as a function of its integration time τ
 * (docs/plan-format.md §13.4): the radiometer equation of §3.2 written as
 * `NEΔT(τ)² = noise/τ + floor`, with `noise = ∫S²/(∫W)²` (K²·s, integrals
 * in hertz) and `floor = (ΔG/G)²(∫S)²/(∫W)²` (K²), the gain-stability term
 * that more integration does not shrink.
 */
export interface NedtModel {
  noiseK2s: number;
  floorK2: number;
}

/** The model of a channel from its sensitivity figures at one point and its gain stability. */
export function nedtModel(s: Sensitivity, gainStability: number): NedtModel {
  const w = s.intW * 1e9;
  return { noiseK2s: s.intS2 / (w * w), floorK2: (gainStability * s.intS) ** 2 / (w * w) };
}

/** NEΔT (K) with integration time `integrationMs`. */
export function nedtWith(m: NedtModel, integrationMs: number): number {
  return Math.sqrt(m.noiseK2s / (integrationMs / 1000) + m.floorK2);
}
