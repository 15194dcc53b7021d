import { atanDiff } from "./lorentz";

/**
 * The effective centre of a received band (docs/plan-format.md §12.3
 * "Effective centre"): the centroid of the wanted mode's response over the
 * band, from `∫x·M dx = (δ²/8)·ln(1 + (2(x − m)/δ)²) + m·∫M dx` (the
 * antiderivative of the Lorentzian's first moment; `∫M dx = (δ/2)·atan`).
 */

/**
 * How far the centroid of the mode's response over a band of width `width`
 * lies from the band's own centre, for a band centred `eps` from the mode
 * (GHz; positive: the band lies above the mode). The centroid lies between
 * the band centre and the mode, so the result has the sign of `−eps`.
 */
export function centroidOffset(eps: number, width: number, delta: number): number {
  const v1 = (2 * (eps - width / 2)) / delta;
  const v2 = (2 * (eps + width / 2)) / delta;
  const dv = (2 * width) / delta;
  // ln((1 + v2²)/(1 + v1²)) without cancellation: log1p((v2 − v1)(v2 + v1)/(1 + v1²))
  const logRatio = Math.log1p((dv * (v1 + v2)) / (1 + v1 * v1));
  const area = (delta / 2) * atanDiff(v1, v2, dv);
  // (a band so far out that its response underflows: its centroid is its centre)
  if (!(area > 0) || !Number.isFinite(logRatio)) return 0;
  // the centroid from the mode, minus the band centre from the mode
  return ((delta * delta) / 8) * (logRatio / area) - eps;
}

/** The Lorentzian power response at detuning `det` from a mode of linewidth δ. */
export function modeResponse(det: number, delta: number): number {
  return 1 / (1 + ((2 * det) / delta) ** 2);
}
