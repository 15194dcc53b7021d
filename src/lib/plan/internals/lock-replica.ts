import { besselJLog10Parts } from "./bessel";

/**
 * Weight of lock order m in dB (docs/plan-format.md §3.2 "Per channel", Lock replica; phase
 * modulation sidebands `J_m(β)`, e.g. Black, Am. J. Phys. 69, 79 (2001)):
 * `w_m = 20·log10|J_m(β)/J_0(β)| − 10·log10(1 + (2·m·fm/δ)²)`.
 */
export function lockOrderWeightDB(m: number, fm: number, beta: number, delta: number): number {
  // 20·log10|J_m/J_0| from the split form, so tiny β or large m never underflows to −∞
  const jm = besselJLog10Parts(m, beta);
  const j0 = besselJLog10Parts(0, beta);
  const ratioDB = 20 * (jm.log10Lead + Math.log10(Math.abs(jm.series / j0.series)));
  const u = (2 * m * fm) / delta;
  return ratioDB - 10 * Math.log10(1 + u * u);
}

/**
 * Share of the channel's response that comes from outside its own passband,
 * `F = Σ_{±m} 10^(w_m/10)·min(1, m·fm/B) / (1 + Σ_{±m} 10^(w_m/10))`, in dB.
 * Summed in the log domain so that very weak sidebands never underflow to
 * `−∞`.
 */
/** Orders above this contribute nothing in double precision (J_m(2.4) < 1e-300). */
export const MAX_REPLICA_ORDER = 400;

export function lockReplicaDB(fm: number, beta: number, orders: number, delta: number, B: number): number {
  const numTerms: number[] = [];
  const denTerms: number[] = [];
  // Beyond m ≈ 170, J_m(β < 2.4) underflows to 0 (weight −∞); the cap only keeps huge `orders` cheap.
  const last = Math.min(orders, MAX_REPLICA_ORDER);
  for (let m = 1; m <= last; m++) {
    const w = lockOrderWeightDB(m, fm, beta, delta);
    const both = w + 10 * Math.log10(2); // +m and −m
    denTerms.push(both);
    // min(1, m·fm/B) in dB, formed from logarithms so it never underflows
    numTerms.push(both + Math.min(0, 10 * (Math.log10(m) + Math.log10(fm) - Math.log10(B))));
  }
  const num = logSumDB(numTerms);
  const den = 10 * Math.log10(1 + 10 ** (logSumDB(denTerms) / 10));
  return num - den;
}

/** `10·log10(Σ 10^(tᵢ/10))`, stable for very negative terms. */
function logSumDB(terms: readonly number[]): number {
  let max = -Infinity;
  for (const t of terms) if (t > max) max = t;
  if (max === -Infinity) return -Infinity;
  let sum = 0;
  for (const t of terms) sum += 10 ** ((t - max) / 10);
  return max + 10 * Math.log10(sum);
}
