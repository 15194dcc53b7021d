import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { bestSplit, type SplitProblem } from "./best-split";
import { checkPlan } from "./check-plan";
import { splitMargin } from "./internals/split-margin";
import { parsed, sharedLaserInput, withDwells } from "./schedule.test-util";

// The best split of a schedule's cycle (docs/plan-format.md §13.6),
// against a brute-force grid of splits.

/** Every split of `A` into `n` parts on a grid of `steps` steps (the parts' fractions k/steps, summing to 1). */
function gridSplits(n: number, steps: number): number[][] {
  if (n === 1) return [[1]];
  const out: number[][] = [];
  for (let k = 0; k <= steps; k++)
    for (const rest of gridSplits(n - 1, steps - k))
      out.push([k / steps, ...rest.map((f) => (f * (steps - k)) / steps)]);
  return out;
}

/** The dwells of a problem for fractions of the shared time (fixed dwells keep their length). */
function dwellsFor(p: SplitProblem, fractions: number[]): number[] {
  let A = p.cycleMs;
  for (const d of p.dwells) A -= d.fixedMs ?? d.switchMs;
  let k = 0;
  return p.dwells.map((d) => d.fixedMs ?? d.switchMs + (fractions[k++] as number) * A);
}

const channelArb = (withFloor: boolean) =>
  fc.record({
    requiredNedtK: fc.double({ min: 0.05, max: 5, noNaN: true }),
    integrationMs: fc.double({ min: 1, max: 1000, noNaN: true }),
    model: fc.record({
      noiseK2s: fc.double({ min: 1e-4, max: 1, noNaN: true }),
      floorK2: withFloor ? fc.double({ min: 0, max: 0.01, noNaN: true }) : fc.constant(0),
    }),
  });

const problemArb = (withFloor: boolean): fc.Arbitrary<SplitProblem> =>
  fc.record({
    cycleMs: fc.double({ min: 50, max: 1000, noNaN: true }),
    dwells: fc.array(
      fc.record({
        switchMs: fc.double({ min: 0, max: 10, noNaN: true }),
        fixedMs: fc.constant(null),
        channels: fc.array(channelArb(withFloor), { minLength: 1, maxLength: 3 }),
      }),
      { minLength: 1, maxLength: 3 },
    ),
  });

describe("bestSplit", () => {
  it("closed form, hand-worked: two alike dwells split the shared time evenly", () => {
    // cycle 100 ms, switches 5 ms each: A = 90 ms; each chain needs noise/(τ·req²) = 0.01/(0.1·1) = 0.1 of a unit duty
    const ch = { requiredNedtK: 1, integrationMs: 100, model: { noiseK2s: 0.01, floorK2: 0 } };
    const p: SplitProblem = {
      cycleMs: 100,
      dwells: [
        { switchMs: 5, fixedMs: null, channels: [ch] },
        { switchMs: 5, fixedMs: null, channels: [ch] },
      ],
    };
    const b = bestSplit(p)!;
    expect(b.method).toBe("closed-form");
    expect(b.dwellsMs[0]).toBeCloseTo(50, 12);
    expect(b.dwellsMs[1]).toBeCloseTo(50, 12);
    // duty 0.45 each: NEΔT = √(0.01/(0.1·0.45)) = 0.4714 K, margin 1 − √(100·0.2/90) = 0.5286
    expect(b.commonMargin).toBeCloseTo(1 - Math.sqrt((100 * 0.2) / 90), 12);
  });
  it("closed form: a channel needing four times the time gets four times the share (NEΔT ∝ 1/√τ)", () => {
    const a = { requiredNedtK: 1, integrationMs: 100, model: { noiseK2s: 0.01, floorK2: 0 } };
    const b = { ...a, requiredNedtK: 0.5 };
    const r = bestSplit({
      cycleMs: 100,
      dwells: [
        { switchMs: 0, fixedMs: null, channels: [a] },
        { switchMs: 0, fixedMs: null, channels: [b] },
      ],
    })!;
    expect(r.dwellsMs[0]).toBeCloseTo(20, 12);
    expect(r.dwellsMs[1]).toBeCloseTo(80, 12);
  });
  it("keeps a dwell without requirements as it is, and gives null when nothing is left to share", () => {
    const ch = { requiredNedtK: 1, integrationMs: 100, model: { noiseK2s: 0.01, floorK2: 0 } };
    const r = bestSplit({
      cycleMs: 100,
      dwells: [
        { switchMs: 5, fixedMs: 30, channels: [] },
        { switchMs: 5, fixedMs: null, channels: [ch] },
      ],
    })!;
    expect(r.dwellsMs).toEqual([30, 70]);
    expect(bestSplit({ cycleMs: 10, dwells: [{ switchMs: 10, fixedMs: null, channels: [ch] }] })).toBeNull();
    expect(bestSplit({ cycleMs: 10, dwells: [{ switchMs: 1, fixedMs: 5, channels: [] }] })).toBeNull();
  });
  it.each([false, true])("is never beaten by a grid of splits (gain drift: %s)", (withFloor) => {
    fc.assert(
      fc.property(problemArb(withFloor), (p) => {
        const b = bestSplit(p);
        let A = p.cycleMs;
        for (const d of p.dwells) A -= d.switchMs;
        if (!(A > 0)) return b === null;
        expect(b).not.toBeNull();
        expect(b!.method).toBe(
          withFloor && p.dwells.some((d) => d.channels.some((c) => c.model.floorK2 > 0)) ? "search" : "closed-form",
        );
        // the split fills the cycle
        expect(b!.dwellsMs.reduce((s, x) => s + x, 0)).toBeCloseTo(p.cycleMs, 6);
        expect(splitMargin(p, b!.dwellsMs)).toBe(b!.commonMargin);
        const steps = p.dwells.length === 3 ? 40 : 200;
        for (const f of gridSplits(p.dwells.length, steps)) {
          const m = splitMargin(p, dwellsFor(p, f));
          expect(m).toBeLessThanOrEqual(b!.commonMargin + 1e-9 * Math.max(1, Math.abs(m)));
        }
        return true;
      }),
      { numRuns: 60 },
    );
  });
  it("the search agrees with the closed form when the gain drift is negligible", () => {
    fc.assert(
      fc.property(problemArb(false), (p) => {
        const closed = bestSplit(p);
        const tiny: SplitProblem = {
          ...p,
          dwells: p.dwells.map((d) => ({
            ...d,
            channels: d.channels.map((c) => ({ ...c, model: { ...c.model, floorK2: 1e-300 } })),
          })),
        };
        const search = bestSplit(tiny);
        if (closed === null) return search === null;
        expect(search!.method).toBe("search");
        expect(search!.commonMargin).toBeCloseTo(closed.commonMargin, 9);
        search!.dwellsMs.forEach((x, j) => expect(x).toBeCloseTo(closed.dwellsMs[j]!, 6));
        return true;
      }),
      { numRuns: 100 },
    );
  });
});

describe("the best split of the shared-laser demo plan, through the engine", () => {
  const result = checkPlan(parsed(sharedLaserInput()));
  const best = result.schedules![0]!.bestSplit!;
  /** The common margin of a plan's result: the smallest 1 − worst/required over its channels. */
  const marginOf = (dwellsMs: number[]) => {
    const r = checkPlan(withDwells(dwellsMs));
    return Math.min(...r.channels.map((c, j) => 1 - c.envelope.worstNedtK! / [6, 6.5, 6][j]!));
  };
  it("meets every requirement, which the split as written does not", () => {
    expect(best.method).toBe("closed-form");
    expect(best.currentMargin).toBeLessThan(0);
    expect(best.commonMargin).toBeGreaterThan(0);
    expect(best.dwellsMs.reduce((s, x) => s + x, 0)).toBeLessThanOrEqual(200);
  });
  it("applied and checked again, gives the figures it predicted and no NEΔT finding", () => {
    const r = checkPlan(withDwells(best.dwellsMs));
    expect(r.findings.filter((f) => f.severity === "error")).toEqual([]);
    r.channels.forEach((c, j) => expect(c.envelope.worstNedtK!).toBeCloseTo(best.worstNedtK[j]!, 4));
    expect(marginOf(best.dwellsMs)).toBeCloseTo(best.commonMargin, 4);
  });
  it("no split on a grid of the engine's own results beats it", () => {
    // switches 8.4, 2.6 and 7.8 ms: 181.2 ms to share, in steps of 1/12
    const switches = [8.4, 2.6, 7.8];
    let bestGrid = -Infinity;
    for (let a = 1; a < 12; a++)
      for (let b = 1; a + b < 12; b++) {
        const f = [a / 12, b / 12, (12 - a - b) / 12];
        bestGrid = Math.max(bestGrid, marginOf(switches.map((s, j) => s + f[j]! * 181.2)));
      }
    expect(bestGrid).toBeLessThanOrEqual(best.commonMargin + 1e-9);
    expect(bestGrid).toBeGreaterThan(best.commonMargin - 0.05);
  });
});
