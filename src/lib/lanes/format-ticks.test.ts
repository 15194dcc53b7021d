import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { formatTicks } from "./format-ticks";

describe("formatTicks", () => {
  it("known answers: whole GHz across the band, decimals as the step shrinks", () => {
    const wide = formatTicks([0, 300], 6);
    expect(wide.unit).toBe("GHz");
    expect(wide.ticks.map((t) => t.label)).toEqual(["0", "50", "100", "150", "200", "250", "300"]);
    const mid = formatTicks([183, 184], 5);
    expect(mid.ticks.map((t) => t.label)).toEqual(["183.0", "183.2", "183.4", "183.6", "183.8", "184.0"]);
    expect(formatTicks([-130, -100], 3).ticks.map((t) => t.label)).toEqual(["−130", "−120", "−110", "−100"]);
  });

  it("known answer: below 50 MHz span, MHz offsets from a round anchor", () => {
    const narrow = formatTicks([183.302, 183.318], 4);
    expect(narrow.unit).toBe("MHz");
    expect(narrow.anchorLabel).toBe("183.3 GHz");
    expect(narrow.ticks.map((t) => t.label)).toEqual(["+5", "+10", "+15"]);
  });

  it("stays readable from 360 GHz down to 2 MHz: short, unique labels inside the domain", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -400, max: 400, noNaN: true }),
        fc.double({ min: 0.002, max: 360, noNaN: true }),
        fc.integer({ min: 3, max: 12 }),
        (lo, span, n) => {
          const set = formatTicks([lo, lo + span], n);
          expect(set.ticks.length).toBeGreaterThanOrEqual(1);
          expect(set.ticks.length).toBeLessThanOrEqual(2 * n + 1);
          const labels = set.ticks.map((t) => t.label);
          expect(new Set(labels).size).toBe(labels.length);
          for (const t of set.ticks) {
            expect(t.label.length).toBeLessThanOrEqual(9);
            expect(t.value).toBeGreaterThanOrEqual(lo - span * 1e-6);
            expect(t.value).toBeLessThanOrEqual(lo + span * (1 + 1e-6));
          }
          // the label reads back as the tick's value (GHz, or anchor + MHz offset)
          for (const t of set.ticks) {
            const v = Number(t.label.replace("−", "-").replace("+", ""));
            const back = set.unit === "GHz" ? v : (set.anchor ?? 0) + v / 1000;
            expect(Math.abs(back - t.value)).toBeLessThanOrEqual(span / n);
          }
        },
      ),
    );
  });
});
