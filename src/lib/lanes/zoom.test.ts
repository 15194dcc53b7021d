import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { scaleLinear } from "d3-scale";
import { zoomAbout } from "./zoom-about";
import { clampDomain } from "./clamp-domain";
import { zoomToItem } from "./zoom-to-item";
import { GHZ_LIMITS, IF_LIMITS } from "./internals/limits";
import type { Domain } from "./types";

const domainArb = fc
  .record({
    lo: fc.double({ min: -50, max: 400, noNaN: true }),
    span: fc.double({ min: 0.002, max: 360, noNaN: true }),
  })
  .map(({ lo, span }): Domain => [lo, lo + span]);

describe("zoomAbout", () => {
  it("known answer: zooming [100, 300] by 2 about 200 gives [150, 250] (arithmetic)", () => {
    expect(zoomAbout([100, 300], 2, 200, GHZ_LIMITS)).toEqual([150, 250]);
    expect(zoomAbout([100, 300], 2, 100, GHZ_LIMITS)).toEqual([100, 200]);
  });

  it("keeps the pivot on the same pixel (checked with a d3 linear scale)", () => {
    fc.assert(
      fc.property(
        domainArb,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (d, t, f) => {
          const pivot = d[0] + t * (d[1] - d[0]);
          const next = zoomAbout(d, f, pivot, GHZ_LIMITS);
          const before = scaleLinear().domain(d).range([0, 1000]);
          const after = scaleLinear().domain(next).range([0, 1000]);
          expect(Math.abs(after(pivot) - before(pivot))).toBeLessThan(1e-6);
        },
      ),
    );
  });

  it("holds the span within the limits", () => {
    fc.assert(
      fc.property(domainArb, fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (d, f) => {
        const [lo, hi] = zoomAbout(d, f, (d[0] + d[1]) / 2, GHZ_LIMITS);
        expect(hi - lo).toBeGreaterThanOrEqual(GHZ_LIMITS.minSpan * (1 - 1e-9));
        expect(hi - lo).toBeLessThanOrEqual(GHZ_LIMITS.maxSpan * (1 + 1e-9));
      }),
    );
  });

  it("zoom in then out about the same point returns the domain (when the limits do not bite)", () => {
    fc.assert(
      fc.property(
        domainArb,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 1, max: 8, noNaN: true }),
        (d, t, f) => {
          const span = d[1] - d[0];
          fc.pre(span / f >= GHZ_LIMITS.minSpan);
          const pivot = d[0] + t * span;
          const back = zoomAbout(zoomAbout(d, f, pivot, GHZ_LIMITS), 1 / f, pivot, GHZ_LIMITS);
          expect(back[0]).toBeCloseTo(d[0], 6);
          expect(back[1]).toBeCloseTo(d[1], 6);
        },
      ),
    );
  });

  it("ignores a meaningless factor", () => {
    expect(zoomAbout([1, 2], Number.NaN, 1.5, IF_LIMITS)).toEqual([1, 2]);
    expect(zoomAbout([1, 2], 0, 1.5, IF_LIMITS)).toEqual([1, 2]);
  });
});

describe("clampDomain", () => {
  const bounds: Domain = [-10, 400];
  it("known answers: shifts into the bounds without resizing", () => {
    expect(clampDomain([-30, 10], bounds, GHZ_LIMITS)).toEqual([-10, 30]);
    expect(clampDomain([390, 420], bounds, GHZ_LIMITS)).toEqual([370, 400]);
    expect(clampDomain([100, 101], bounds, GHZ_LIMITS)).toEqual([100, 101]);
  });
  it("always lies inside the bounds with a span within the limits, and leaves a good domain alone", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1000, max: 1000, noNaN: true }),
        fc.double({ min: -100, max: 1000, noNaN: true }),
        (lo, span) => {
          const [a, b] = clampDomain([lo, lo + span], bounds, GHZ_LIMITS);
          expect(b - a).toBeGreaterThanOrEqual(GHZ_LIMITS.minSpan * (1 - 1e-9));
          expect(b - a).toBeLessThanOrEqual(GHZ_LIMITS.maxSpan * (1 + 1e-9));
          expect(a).toBeGreaterThanOrEqual(bounds[0] - 1e-9);
          expect(b).toBeLessThanOrEqual(bounds[1] + 1e-9);
          const again = clampDomain([a, b], bounds, GHZ_LIMITS);
          expect(again[0]).toBeCloseTo(a, 9);
          expect(again[1]).toBeCloseTo(b, 9);
        },
      ),
    );
  });
});

describe("zoomToItem", () => {
  it("known answer: a 10 MHz band with 25 % padding gives a 15 MHz view centred on it (arithmetic)", () => {
    const [a, b] = zoomToItem(183.305, 183.315, 0.25, GHZ_LIMITS);
    expect(a).toBeCloseTo(183.3025, 9);
    expect(b).toBeCloseTo(183.3175, 9);
  });
  it("contains the item, is centred on it and respects the limits", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -400, max: 400, noNaN: true }),
        fc.double({ min: 0, max: 300, noNaN: true }),
        (lo, w) => {
          const [a, b] = zoomToItem(lo, lo + w, 0.1, GHZ_LIMITS);
          expect(b - a).toBeGreaterThanOrEqual(GHZ_LIMITS.minSpan * (1 - 1e-9));
          expect(b - a).toBeLessThanOrEqual(GHZ_LIMITS.maxSpan * (1 + 1e-9));
          expect((a + b) / 2).toBeCloseTo(lo + w / 2, 6);
          if (w * 1.2 <= GHZ_LIMITS.maxSpan) {
            expect(a).toBeLessThanOrEqual(lo + 1e-9);
            expect(b).toBeGreaterThanOrEqual(lo + w - 1e-9);
          }
        },
      ),
    );
  });
});
