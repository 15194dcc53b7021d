import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { timelineSegments } from "./timeline-segments";

const dwell = (chain: string, dwellMs: number, retuneMs: number, relockMs: number) => ({
  chain,
  dwellMs,
  loStepGHz: 1,
  retuneMs,
  relockMs,
  usableMs: dwellMs - retuneMs - relockMs,
  dutyCycle: 0,
});

describe("timelineSegments", () => {
  it("lays out relock, retune and usable time per dwell, then the idle rest (hand-worked)", () => {
    const s = { cycleMs: 100, dwells: [dwell("A", 30, 3, 5), dwell("B", 40, 2, 0)] };
    expect(timelineSegments(s)).toEqual([
      { kind: "relock", chain: "A", startMs: 0, endMs: 5 },
      { kind: "retune", chain: "A", startMs: 5, endMs: 8 },
      { kind: "dwell", chain: "A", startMs: 8, endMs: 30 },
      { kind: "retune", chain: "B", startMs: 30, endMs: 32 },
      { kind: "dwell", chain: "B", startMs: 32, endMs: 70 },
      { kind: "idle", chain: null, startMs: 70, endMs: 100 },
    ]);
  });
  it("tiles the cycle without gaps or overlaps", () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.tuple(
            fc.double({ min: 0, max: 10, noNaN: true }),
            fc.double({ min: 0, max: 10, noNaN: true }),
            fc.double({ min: 0.001, max: 50, noNaN: true }),
          ),
          { minLength: 1, maxLength: 5 },
        ),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (parts, idle) => {
          const dwells = parts.map(([re, rl, u], j) => dwell(`C${j}`, re + rl + u, re, rl));
          const busy = dwells.reduce((a, d) => a + d.dwellMs, 0);
          const segs = timelineSegments({ cycleMs: busy + idle, dwells });
          expect(segs[0]!.startMs).toBe(0);
          for (let i = 1; i < segs.length; i++) expect(segs[i]!.startMs).toBe(segs[i - 1]!.endMs);
          expect(segs.at(-1)!.endMs).toBeCloseTo(busy + idle, 9);
          for (const s of segs) expect(s.endMs).toBeGreaterThan(s.startMs);
        },
      ),
      // found by the property: a retune of 5e-324 ms does not move the clock, so it must not make a stretch of no length
      {
        examples: [
          [
            [
              [0, 0, 0.001],
              [0, 5e-324, 0.001],
            ],
            0,
          ],
        ],
      },
    );
  });
});
