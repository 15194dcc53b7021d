import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { dwellSwitch } from "@/schemas/schedule-fields";
import { checkPlan } from "./check-plan";
import { arbitraryEnvelopePlanInput, parseOrThrow } from "./map-plans.test-util";
import { sharedLaserInput } from "./schedule.test-util";

// Properties of observation schedules (docs/plan-format.md §13).

const dbl = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const ORDERS = [
  [0, 1, 2],
  [0, 2, 1],
  [1, 0, 2],
  [1, 2, 0],
  [2, 0, 1],
  [2, 1, 0],
];

describe("schedule properties", () => {
  it("duty cycles sum to at most 1, and each dwell's usable time is its length less its switch", () => {
    fc.assert(
      fc.property(
        fc.record({
          order: fc.constantFrom(...ORDERS),
          retuneMs: dbl(0, 20),
          retuneMsPerGHz: dbl(0, 0.2),
          relockMs: dbl(0, 30),
          extra: fc.array(dbl(0.001, 200), { minLength: 3, maxLength: 3 }),
          cycleMs: dbl(1, 1000),
        }),
        (g) => {
          const d = sharedLaserInput();
          const chains = g.order.map((i) => d.chains[i]!);
          const timing = { retuneMs: g.retuneMs, retuneMsPerGHz: g.retuneMsPerGHz, relockMs: g.relockMs };
          const dwells = chains.map((c, j) => {
            const prev = chains[(j + 2) % 3]!;
            return { chain: c.id, dwellMs: dwellSwitch(timing, prev, c).switchMs + g.extra[j]! };
          });
          d.lasers[0]!.schedule = { cycleMs: g.cycleMs, ...timing, dwells };
          const s = checkPlan(parseOrThrow(d)).schedules![0]!;
          let sum = 0;
          for (const [j, x] of s.dwells.entries()) {
            expect(x.usableMs).toBeCloseTo(dwells[j]!.dwellMs - x.retuneMs - x.relockMs, 9);
            expect(x.usableMs).toBeGreaterThan(0);
            sum += x.dutyCycle;
          }
          expect(sum).toBeLessThanOrEqual(1 + 1e-12);
          expect(s.cycleMs).toBe(Math.max(g.cycleMs, s.busyMs));
        },
      ),
      { numRuns: 40 },
    );
  });

  it("a single-chain schedule with the whole cycle gives exactly the unscheduled chain's result", () => {
    fc.assert(
      fc.property(
        arbitraryEnvelopePlanInput({ maxChannels: 3 }),
        dbl(0.01, 1000),
        dbl(0, 50),
        dbl(0, 1),
        dbl(0, 50),
        (input, cycleMs, retuneMs, retuneMsPerGHz, relockMs) => {
          const before = checkPlan(parseOrThrow(input));
          const doc = structuredClone(input);
          // one chain has nothing to switch from: any retune and relock times cost nothing
          doc.lasers[0]!.schedule = {
            cycleMs,
            retuneMs,
            retuneMsPerGHz,
            relockMs,
            dwells: [{ chain: doc.chains[0]!.id, dwellMs: cycleMs }],
          };
          const { schedules, ...after } = checkPlan(parseOrThrow(doc));
          expect(after).toEqual(before);
          expect(schedules![0]!.dwells[0]!.dutyCycle).toBe(1);
          for (const c of schedules![0]!.channels) expect(c.effectiveIntegrationMs).toBe(c.integrationMs);
        },
      ),
      { numRuns: 30 },
    );
  });

  it("a schedule touches only its own chains", () => {
    // the shared-laser plan with a fourth chain on a laser of its own: its results do not change with the schedule
    const d = sharedLaserInput();
    d.lasers.push({ ...structuredClone(d.lasers[0]!), id: "LP2", schedule: null });
    d.chains.push({ ...structuredClone(d.chains[1]!), id: "D240", laser: "LP2" });
    d.channels.push({ ...structuredClone(d.channels[1]!), id: "d1", chain: "D240" });
    const a = checkPlan(parseOrThrow(d));
    d.lasers[0]!.schedule!.dwells[2]!.dwellMs = 60;
    const b = checkPlan(parseOrThrow(d));
    expect(b.channels.find((c) => c.id === "d1")).toEqual(a.channels.find((c) => c.id === "d1"));
    expect(b.channels.find((c) => c.id === "c1")).not.toEqual(a.channels.find((c) => c.id === "c1"));
  });
});
