import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { absInterval, intersect } from "./intervals";
import { foldFn, MAX_ZONE_CROSSINGS, straddleSet, STRADDLES, UNRESOLVED } from "./map-fold";
import { absFn, at, clipFn, lin, outsideSet, withinGuardSet, type IFn, type LSet, type Piece } from "./map-linear";
import { foldInterval, interiorNyquistEdge } from "./nyquist";

/**
 * The exact piecewise-linear operations of the map checked point by point
 * against the engine's plain interval arithmetic (internals/intervals.ts,
 * internals/nyquist.ts), which works on one L at a time.
 */

const dbl = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const slope = fc.constantFrom(-2, -1, 0, 1, 2);

/** A random single-piece interval function on [from, to] with lo ≤ hi everywhere. */
const arbitraryPiece = fc
  .record({
    from: dbl(-30, 30),
    len: dbl(0.1, 40),
    a: dbl(-40, 40),
    b: slope,
    w0: dbl(0, 5),
    wb: fc.constantFrom(0, 1, 2),
  })
  .map(({ from, len, a, b, w0, wb }) => {
    const to = from + len;
    // hi = lo + width, width = w0 + wb·(L − from) ≥ 0 on the piece
    const fn: IFn = [{ from, to, lo: lin(a, b), hi: lin(a + w0 - wb * from, b + wb) }];
    return fn;
  });

/** The raw interval of a one-piece function at L. */
const rawAt = (fn: IFn, L: number): [number, number] => [at(fn[0]!.lo, L), at(fn[0]!.hi, L)];

/** The piece of fn holding L, at least `margin` from its ends, or undefined. */
const pieceHolding = <P extends Piece>(fn: readonly P[], L: number, margin: number) =>
  fn.find((p) => L > p.from + margin && L < p.to - margin);

const inSet = (set: LSet, L: number) => set.some(([lo, hi]) => L > lo && L < hi);
const nearEdge = (set: LSet, L: number, m: number) =>
  set.some(([lo, hi]) => Math.abs(L - lo) < m || Math.abs(L - hi) < m);

describe("piecewise-linear interval functions of L", () => {
  it("absFn matches |[lo, hi]| at every L", () => {
    fc.assert(
      fc.property(arbitraryPiece, dbl(0, 1), (fn, f) => {
        const L = fn[0]!.from + f * (fn[0]!.to - fn[0]!.from);
        const out = absFn(fn);
        const p = pieceHolding(out, L, 0) ?? out.find((q) => L >= q.from && L <= q.to)!;
        const want = absInterval(rawAt(fn, L));
        expect(at(p.lo, L)).toBeCloseTo(want[0], 9);
        expect(at(p.hi, L)).toBeCloseTo(want[1], 9);
      }),
      { numRuns: 500 },
    );
  }, 60_000);

  it("clipFn matches the intersection with a band, and is undefined exactly where it is empty", () => {
    fc.assert(
      fc.property(arbitraryPiece, dbl(0, 1), dbl(0, 20), dbl(0.01, 20), (fn0, f, lo, w) => {
        const fn = absFn(fn0);
        const L = fn0[0]!.from + f * (fn0[0]!.to - fn0[0]!.from);
        const out = clipFn(fn, lo, lo + w);
        const raw = absInterval(rawAt(fn0, L));
        const want = intersect(raw, [lo, lo + w]);
        const p = pieceHolding(out, L, 1e-9);
        if (
          want &&
          want[1] - want[0] > 1e-6 &&
          !out.some((q) => Math.abs(L - q.from) < 1e-6 || Math.abs(L - q.to) < 1e-6)
        ) {
          expect(p).toBeDefined();
          expect(at(p!.lo, L)).toBeCloseTo(want[0], 9);
          expect(at(p!.hi, L)).toBeCloseTo(want[1], 9);
        }
        if (!want) expect(pieceHolding(out, L, 1e-6)).toBeUndefined();
      }),
      { numRuns: 500 },
    );
  }, 60_000);

  it("foldFn matches the Nyquist fold of the band at every L (zone −1 exactly where it straddles k·fs/2, k ≥ 1)", () => {
    fc.assert(
      fc.property(arbitraryPiece, dbl(0, 1), dbl(0.5, 10), (fn0, f, h) => {
        const fn = absFn(fn0);
        const L = fn0[0]!.from + f * (fn0[0]!.to - fn0[0]!.from);
        const out = foldFn(fn, h);
        const p = pieceHolding(out, L, 1e-9);
        if (!p) return;
        const raw = absInterval(rawAt(fn0, L));
        const want = foldInterval(raw, 2 * h);
        expect(at(p.lo, L)).toBeCloseTo(want[0], 8);
        expect(at(p.hi, L)).toBeCloseTo(want[1], 8);
        const straddles = interiorNyquistEdge(raw, 2 * h) !== null;
        // away from the zone edges the straddle status agrees
        const kMid = Math.round(raw[0] / h);
        const edgeClose = Math.abs(raw[0] - kMid * h) < 1e-6 || Math.abs(raw[1] - Math.round(raw[1] / h) * h) < 1e-6;
        if (!edgeClose) {
          expect(p.zone === -1).toBe(straddles);
          if (!straddles) expect(p.zone).toBe(Math.floor((raw[0] + raw[1]) / 2 / h));
        }
      }),
      { numRuns: 500 },
    );
  }, 60_000);

  it("straddleSet, outsideSet and withinGuardSet hold exactly where the plain tests fire", () => {
    fc.assert(
      fc.property(arbitraryPiece, arbitraryPiece, dbl(0, 1), dbl(0.5, 10), dbl(0, 0.5), (a0, b0, f, h, g) => {
        const a = absFn(a0);
        const b = absFn(b0);
        const from = Math.max(a0[0]!.from, b0[0]!.from);
        const to = Math.min(a0[0]!.to, b0[0]!.to);
        fc.pre(to > from);
        const L = from + f * (to - from);
        const ra = absInterval(rawAt(a0, L));
        const rb = absInterval(rawAt(b0, L));
        const st: LSet = [];
        straddleSet(a, h, st);
        if (!nearEdge(st, L, 1e-7)) expect(inSet(st, L)).toBe(interiorNyquistEdge(ra, 2 * h) !== null);
        const os: LSet = [];
        outsideSet(a, 1, 7, os);
        if (!nearEdge(os, L, 1e-7)) expect(inSet(os, L)).toBe(ra[0] < 1 - 1e-9 || ra[1] > 7 + 1e-9);
        const wg: LSet = [];
        withinGuardSet(a, b, g, wg);
        const gap = Math.max(ra[0], rb[0]) - Math.min(ra[1], rb[1]);
        if (!nearEdge(wg, L, 1e-7) && Math.abs(gap - g) > 1e-7) expect(inSet(wg, L)).toBe(gap < g - 1e-9);
      }),
      { numRuns: 1000 },
    );
  }, 60_000);

  it("a constant gap equal to the guard is a tie decided in favour of passing", () => {
    // two parallel bands 0.05 apart (e.g. slots of two channels on the same side of the LO)
    const a: IFn = [{ from: 0, to: 10, lo: lin(1, 1), hi: lin(1.1, 1) }];
    const b: IFn = [{ from: 0, to: 10, lo: lin(1.15, 1), hi: lin(1.3, 1) }];
    const out: LSet = [];
    withinGuardSet(a, b, 0.05, out);
    expect(out).toEqual([]);
    withinGuardSet(a, b, 0.05 + 2e-9, out);
    expect(out).toEqual([[0, 10]]);
  });

  it("work stays bounded: wide bands fold in closed form, endless zone edges are left unresolved", () => {
    // a band 10 GHz wide with fs/2 = 2 holds a whole zone at every L: [0, 2], straddling, one piece
    const wide: IFn = [{ from: -1e12, to: 1e12, lo: lin(1e12 + 5, 1), hi: lin(1e12 + 15, 1) }];
    expect(foldFn(wide, 2)).toEqual([{ from: -1e12, to: 1e12, lo: lin(0, 0), hi: lin(2, 0), zone: STRADDLES }]);
    const st: LSet = [];
    straddleSet(wide, 2, st);
    expect(st).toEqual([[-1e12, 1e12]]);
    // a narrow band sweeping far more zone edges than the limit: one unresolved piece, and the
    // straddle rule marked as firing over it (conservative)
    const sweep: IFn = [{ from: 0, to: 1e9, lo: lin(0.5, 1), hi: lin(0.51, 1) }];
    expect(1e9 / 2).toBeGreaterThan(MAX_ZONE_CROSSINGS);
    const folded = foldFn(sweep, 2);
    expect(folded).toHaveLength(1);
    expect(folded[0]!.zone).toBe(UNRESOLVED);
    const st2: LSet = [];
    straddleSet(sweep, 2, st2);
    expect(st2).toEqual([[0, 1e9]]);
    // below the limit the same band is enumerated exactly: it straddles 2k for L in (2k − 0.51, 2k − 0.5)
    const short: IFn = [{ from: 0, to: 10, lo: lin(0.5, 1), hi: lin(0.51, 1) }];
    const st3: LSet = [];
    straddleSet(short, 2, st3);
    expect(st3.length).toBe(5);
    expect(st3[0]![0]).toBeCloseTo(1.49, 12);
    expect(st3[0]![1]).toBeCloseTo(1.5, 12);
  });
});
