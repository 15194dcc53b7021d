/**
 * The rounding allowance of every threshold comparison
 * (docs/plan-format.md §1.4 "The 1e-9 allowance"): 1e-9 in the unit of the
 * quantity (GHz, dB, K, mW), always in favour of passing.
 */
export const TOL = 1e-9;

/** `value > limit` with the allowance in favour of passing (the rule fires only when clearly above). */
export function exceeds(value: number, limit: number): boolean {
  return value > limit + TOL;
}

/** `value < limit` with the allowance in favour of passing (the rule fires only when clearly below). */
export function fallsShort(value: number, limit: number): boolean {
  return value < limit - TOL;
}
