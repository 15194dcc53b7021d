/**
 * The operating envelope of a chain (docs/plan-format.md §12.2 "The
 * envelope"): LO shifts `u ∈ [−D, D]` and resonator temperature offsets
 * `t ∈ [tLo, tHi]` (the chain's box is `[−Te, Te]`; the temperature window
 * and the temperature map use boxes of a single temperature). At `(u, t)`
 * the wanted mode sits at `n*·(fsr + t·φ)`, so a received band that moves
 * with `u` is detuned from it by `d = u − k·t`, `k = n*·φ` (GHz/K).
 */
export interface EnvelopeBox {
  /** LO drift D (GHz): u ∈ [−D, D]. */
  D: number;
  /** Temperature offsets t ∈ [tLo, tHi] (K). */
  tLo: number;
  tHi: number;
  /** FSR change per kelvin φ (GHz/K). */
  phi: number;
  /** Motion of the wanted mode per kelvin, k = n*·φ (GHz/K). */
  k: number;
}

/** A point of the box: LO shift u (GHz) and temperature offset t (K). */
export interface BoxPoint {
  u: number;
  t: number;
}

export function envelopeBox(D: number, tLo: number, tHi: number, phi: number, nStar: number): EnvelopeBox {
  return { D, tLo, tHi, phi, k: nStar * phi };
}

/** The box is one point (u = t = 0): every worst value is the nominal one. */
export function isPointBox(box: EnvelopeBox): boolean {
  return box.D === 0 && (box.k === 0 || (box.tLo === 0 && box.tHi === 0));
}

/** The range of the detuning `d = u − k·t` over the box, [dMin, dMax]. */
export function detuningRange(box: EnvelopeBox): [number, number] {
  const a = -box.k * box.tLo;
  const b = -box.k * box.tHi;
  return [-box.D + Math.min(a, b), box.D + Math.max(a, b)];
}

/** The range of `−k·t` over the box (how far the mode moves against a band that does not move with u). */
export function modeShiftRange(box: EnvelopeBox): [number, number] {
  const a = -box.k * box.tLo;
  const b = -box.k * box.tHi;
  return [Math.min(a, b), Math.max(a, b)];
}

/** The temperature offsets t at which detuning d is reached (u = d + k·t within ±D), as [lo, hi]; empty when lo > hi. */
export function temperaturesAt(box: EnvelopeBox, d: number): [number, number] {
  if (box.k === 0) return Math.abs(d) <= box.D ? [box.tLo, box.tHi] : [1, 0];
  const p = (-box.D - d) / box.k;
  const q = (box.D - d) / box.k;
  return [Math.max(box.tLo, Math.min(p, q)), Math.min(box.tHi, Math.max(p, q))];
}

/**
 * The point of the box where detuning d is reached with the temperature
 * offset nearest 0 (the nominal temperature when it can be); d is clamped
 * to the box's range first.
 */
export function pointAt(box: EnvelopeBox, d: number): BoxPoint {
  // (called once per evaluation of the searches: no arrays)
  const a = -box.k * box.tLo;
  const b = -box.k * box.tHi;
  const dMin = -box.D + Math.min(a, b);
  const dMax = box.D + Math.max(a, b);
  const dd = Math.min(dMax, Math.max(dMin, d));
  let lo: number;
  let hi: number;
  if (box.k === 0) {
    lo = box.tLo;
    hi = box.tHi;
  } else {
    const p = (-box.D - dd) / box.k;
    const q = (box.D - dd) / box.k;
    lo = Math.max(box.tLo, Math.min(p, q));
    hi = Math.min(box.tHi, Math.max(p, q));
  }
  const t = lo > hi ? (Math.abs(lo) < Math.abs(hi) ? lo : hi) : Math.min(hi, Math.max(lo, 0));
  const u = Math.min(box.D, Math.max(-box.D, dd + box.k * t));
  return { u: u + 0, t: t + 0 };
}
