import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { visibleItems } from "./visible-items";
import { zoomAbout } from "./zoom-about";
import { GHZ_LIMITS } from "./internals/limits";
import type { Domain } from "./types";

const itemsArb = fc.array(
  fc
    .record({
      lo: fc.double({ min: -10, max: 400, noNaN: true }),
      w: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 50, noNaN: true })),
    })
    .map(({ lo, w }) => ({ lo, hi: lo + w })),
  { maxLength: 60 },
);

describe("visibleItems", () => {
  it("known answer: a band inside, a tone inside and one item each side", () => {
    const items = [
      { lo: 0, hi: 1 },
      { lo: 10, hi: 20 },
      { lo: 15, hi: 15 },
      { lo: 30, hi: 31 },
    ];
    const p = visibleItems(items, [5, 25], 200, 2);
    expect(p.offLeft).toEqual([{ lo: 0, hi: 1 }]);
    expect(p.offRight).toEqual([{ lo: 30, hi: 31 }]);
    expect(p.drawn.map((d) => [d.x0, d.x1])).toEqual([
      [50, 150],
      [99, 101],
    ]);
  });

  it("never loses an item at any zoom: each is drawn at least minPx wide or counted off an edge", () => {
    fc.assert(
      fc.property(
        itemsArb,
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        fc.double({ min: 0, max: 400, noNaN: true }),
        (items, factor, pivot) => {
          const domain: Domain = zoomAbout([-10, 350], factor, pivot, GHZ_LIMITS);
          const p = visibleItems(items, domain, 900, 2);
          expect(p.drawn.length + p.offLeft.length + p.offRight.length).toBe(items.length);
          const seen = new Set([...p.drawn.map((d) => d.item), ...p.offLeft, ...p.offRight]);
          expect(seen.size).toBe(new Set(items).size);
          for (const d of p.drawn) {
            expect(d.x1 - d.x0).toBeGreaterThanOrEqual(2 - 1e-9);
            // a drawn item is at least partly inside the view
            expect(d.x1).toBeGreaterThanOrEqual(-2);
            expect(d.x0).toBeLessThanOrEqual(902);
          }
        },
      ),
    );
  });
});
