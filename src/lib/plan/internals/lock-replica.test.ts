import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { besselJ } from "./bessel";
import { lockOrderWeightDB, lockReplicaDB } from "./lock-replica";

describe("lock replica share (docs/plan-format.md §3.2 'Per channel', Lock replica)", () => {
  it("matches the format's formula written out directly (example 1: −24.715 dB)", () => {
    // fm = 60 MHz, β = 0.5, 2 orders, δ = 19.34 MHz, B = 10 MHz
    const fm = 0.06;
    const delta = 0.01934;
    const B = 0.01;
    let num = 0;
    let den = 1;
    for (let m = 1; m <= 2; m++) {
      const w =
        20 * Math.log10(Math.abs(besselJ(m, 0.5) / besselJ(0, 0.5))) - 10 * Math.log10(1 + ((2 * m * fm) / delta) ** 2);
      num += 2 * 10 ** (w / 10) * Math.min(1, (m * fm) / B);
      den += 2 * 10 ** (w / 10);
    }
    expect(lockReplicaDB(fm, 0.5, 2, delta, B)).toBeCloseTo(10 * Math.log10(num / den), 12);
    expect(lockReplicaDB(fm, 0.5, 2, delta, B)).toBeCloseTo(-24.7151, 3);
  });

  it("grows with the modulation index for β < 2.4 (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 2.3, noNaN: true }),
        fc.double({ min: 0.001, max: 0.09, noNaN: true }),
        fc.double({ min: 1e-3, max: 1, noNaN: true }),
        fc.double({ min: 1e-4, max: 1, noNaN: true }),
        fc.double({ min: 1e-4, max: 2, noNaN: true }),
        fc.integer({ min: 1, max: 4 }),
        (beta, dBeta, fm, delta, B, orders) => {
          expect(lockReplicaDB(fm, beta + dBeta, orders, delta, B)).toBeGreaterThan(
            lockReplicaDB(fm, beta, orders, delta, B),
          );
        },
      ),
    );
  });

  it("stays finite for a vanishing index or huge order counts", () => {
    expect(Number.isFinite(lockReplicaDB(0.06, 1e-300, 2, 0.02, 0.01))).toBe(true);
    expect(Number.isFinite(lockReplicaDB(0.06, 0.5, 1e9, 0.02, 0.01))).toBe(true);
    expect(Number.isFinite(lockOrderWeightDB(300, 0.06, 0.5, 0.02))).toBe(true);
    expect(Number.isFinite(lockReplicaDB(1e-300, 0.5, 2, 0.02, 1e300))).toBe(true);
  });
});
