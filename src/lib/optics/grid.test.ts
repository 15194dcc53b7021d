import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { flexGridSlot } from "./flex-grid-slot";
import { GRID_SPACINGS_GHZ, type GridSpacingGHz, nearestGridChannel } from "./nearest-grid-channel";

// Simpler independent implementation: scan the channel indices around the
// input and keep the closest centre (ties to the higher index).
function nearestByScan(fTHz: number, spacing: number) {
  const guess = Math.trunc((fTHz * 1000 - 193_100) / spacing);
  let best = { index: 0, dist: Infinity };
  for (let n = guess - 3; n <= guess + 3; n++) {
    const dist = Math.abs(fTHz * 1000 - (193_100 + n * spacing));
    if (dist < best.dist - 1e-9 || (Math.abs(dist - best.dist) <= 1e-9 && n > best.index)) best = { index: n, dist };
  }
  return best.index;
}

const spacing = fc.constantFrom(...GRID_SPACINGS_GHZ);

describe("nearestGridChannel", () => {
  it("finds the G.694.1 channels", () => {
    // ITU-T G.694.1: anchor 193.1 THz is N = 0 on every grid
    for (const s of GRID_SPACINGS_GHZ) {
      const ch = nearestGridChannel(193.1, s);
      expect(ch.index).toBe(0);
      expect(ch.offsetGHz).toBe(0);
    }
    // ITU-T G.694.1, 50 GHz grid: 193.15 THz is N = +1; on the 100 GHz grid it is half-way
    expect(nearestGridChannel(193.15, 50)).toMatchObject({ index: 1, centreTHz: 193.15, grid: "fixed" });
    // ITU-T G.694.1 (2012) flexible grid: n = −5 → 193.06875 THz
    const flex = nearestGridChannel(193.06875, 6.25);
    expect(flex).toMatchObject({ index: -5, centreTHz: 193.06875, grid: "flexible" });
    expect(flex.offsetGHz).toBeCloseTo(0, 9);
    // the 193.4 THz carrier of docs/plan-format.md §8 "Worked example 1": 100 GHz grid N = 3 (193.1 + 3 × 0.1), exactly on it (arithmetic)
    const c = nearestGridChannel(193.4, 100);
    expect(c.index).toBe(3);
    expect(c.offsetGHz).toBeCloseTo(0, 9);
    // 193.42 THz on the 50 GHz grid: nearest 193.40 (N = 6), offset +20 GHz (arithmetic)
    const d = nearestGridChannel(193.42, 50);
    expect(d.index).toBe(6);
    expect(d.offsetGHz).toBeCloseTo(20, 9);
  });

  it("never leaves more than half a spacing between frequency and channel", () => {
    fc.assert(
      fc.property(fc.double({ min: 150, max: 250, noNaN: true }), spacing, (f, s) => {
        const ch = nearestGridChannel(f, s);
        expect(Math.abs(ch.offsetGHz)).toBeLessThanOrEqual(s / 2 + 1e-9);
        expect(Number.isInteger(ch.index)).toBe(true);
        expect(ch.centreTHz * 1000 + ch.offsetGHz).toBeCloseTo(f * 1000, 6);
      }),
    );
  });

  it("agrees with a scan of neighbouring channels", () => {
    fc.assert(
      fc.property(fc.double({ min: 185, max: 200, noNaN: true }), spacing, (f, s: GridSpacingGHz) => {
        const ch = nearestGridChannel(f, s);
        const scanned = nearestByScan(f, s);
        // away from exact ties both must pick the same index
        if (Math.abs(Math.abs(ch.offsetGHz) - s / 2) > 1e-6) expect(ch.index).toBe(scanned);
      }),
    );
  });

  it("refuses a spacing that is not a G.694.1 grid", () => {
    expect(() => nearestGridChannel(193.1, 33 as GridSpacingGHz)).toThrow(/spacingGHz/);
  });
});

describe("flexGridSlot", () => {
  it("gives the G.694.1 (2012) example slot", () => {
    // G.694.1 (2012) flexi-grid: n = −5, m = 3 → 193.06875 THz, 37.5 GHz slot
    const slot = flexGridSlot(-5, 3);
    expect(slot.centreTHz).toBeCloseTo(193.06875, 9);
    expect(slot.widthGHz).toBe(37.5);
    expect((slot.upperTHz - slot.lowerTHz) * 1000).toBeCloseTo(37.5, 6);
  });

  it("has its centre on the 6.25 GHz flexible grid", () => {
    fc.assert(
      fc.property(fc.integer({ min: -2000, max: 2000 }), fc.integer({ min: 1, max: 64 }), (n, m) => {
        const slot = flexGridSlot(n, m);
        expect(nearestGridChannel(slot.centreTHz, 6.25).index).toBe(n);
      }),
    );
  });

  it("refuses non-integer n and m < 1", () => {
    expect(() => flexGridSlot(0.5, 1)).toThrow(/^n: /);
    expect(() => flexGridSlot(0, 0)).toThrow(/^m: /);
  });
});
