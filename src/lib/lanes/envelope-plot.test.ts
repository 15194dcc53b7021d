import fc from "fast-check";
import { scaleLinear } from "d3-scale";
import { describe, expect, it } from "vitest";
import { envelopeCurves, type EnvelopeCurve } from "@/lib/plan";
import { example1 } from "../../../tests/fixtures/plans/builders";
import { envelopePlot, NEDT_TOP_FACTOR } from "./envelope-plot";

const frame = { width: 400, height: 100 };

/** The points of an SVG path made of M and L commands: runs of [x, y]. */
function runsOf(path: string): [number, number][][] {
  const runs: [number, number][][] = [];
  for (const m of path.matchAll(/([ML])(-?[\d.]+),(-?[\d.]+)/g)) {
    if (m[1] === "M") runs.push([]);
    runs.at(-1)!.push([Number(m[2]), Number(m[3])]);
  }
  return runs;
}

function curveOf(points: EnvelopeCurve["points"], overrides: Partial<EnvelopeCurve> = {}): EnvelopeCurve {
  return {
    channelId: "c",
    axis: "lo",
    unit: "MHz",
    envelope: [-10, 10],
    requiredNedtK: 2,
    modeResponseLimit: 0.5,
    requiredImageRejectionDB: 25,
    points,
    ...overrides,
  };
}

describe("envelopePlot", () => {
  it("example 1 against the LO shift: requirement line at 20 K, envelope at ±20 MHz, 81.123 K at its end (issue 11)", () => {
    // Known answer: issue 11 gives NEΔT 81.123 K at u = ±20 MHz for example 1 (computed independently from the model).
    const curve = envelopeCurves(example1(), "wv1", { axis: "lo", points: 81 });
    const plot = envelopePlot(curve, frame);
    expect(plot.unit).toBe("MHz");
    expect(plot.xDomain).toEqual([-40, 40]);
    expect(plot.envelopePx[0]).toBeCloseTo(100, 9);
    expect(plot.envelopePx[1]).toBeCloseTo(300, 9);
    // NEΔT keeps rising past the envelope, so the top is four times the 20 K requirement, plus 5 %.
    const top = NEDT_TOP_FACTOR * 20 * 1.05;
    expect(plot.nedt.domain).toEqual([0, top]);
    expect(plot.nedt.limit).toBe(20);
    expect(plot.nedt.limitY).toBeCloseTo(100 * (1 - 20 / top), 9);
    const [run] = runsOf(plot.nedt.path);
    const end = run!.find(([x]) => Math.abs(x - 300) < 0.01)!;
    expect(end[1]).toBeCloseTo(100 * (1 - 81.123 / top), 1);
    // the mode response is 1 at the middle and 0.1895 at the envelope's end (issue 11)
    const mode = runsOf(plot.mode.path)[0]!;
    expect(mode[40]).toEqual([200, 0]);
    expect(mode[60]![1]).toBeCloseTo(100 * (1 - 0.1895), 1);
    expect(plot.mode.limitY).toBe(50);
    expect(plot.nedt.clipped).toBeGreaterThan(0);
  });

  it("breaks the NEΔT line where a point has no value, and draws points above the top on the top edge", () => {
    const plot = envelopePlot(
      curveOf([
        { x: -10, nedtK: 1, modeResponse: 0.5, imageRejectionDB: null },
        { x: -5, nedtK: null, modeResponse: 1, imageRejectionDB: null },
        { x: 0, nedtK: 1, modeResponse: 1, imageRejectionDB: null },
        { x: 10, nedtK: 100, modeResponse: 0, imageRejectionDB: null },
      ]),
      frame,
    );
    // top: 4 × the 2 K requirement, + 5 % = 8.4 K
    expect(plot.nedt.domain).toEqual([0, 8.4]);
    const y1 = Math.round(100 * (1 - 1 / 8.4) * 100) / 100;
    expect(plot.nedt.path).toBe(`M0,${y1}M200,${y1}L400,0`);
    expect(plot.nedt.clipped).toBe(1);
    expect(plot.mode.path).toBe("M0,50L100,0L200,0L400,100");
    expect(plot.envelopePx).toEqual([0, 400]);
  });

  it("places every point where an independent linear scale (d3-scale) puts it, inside the frame", () => {
    const point = fc.record({
      nedtK: fc.option(fc.double({ min: 0, max: 1e4, noNaN: true }), { nil: null }),
      modeResponse: fc.double({ min: 0, max: 1, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.array(point, { minLength: 2, maxLength: 40 }),
        fc.double({ min: 0.1, max: 100, noNaN: true }),
        fc.option(fc.double({ min: 0.01, max: 100, noNaN: true }), { nil: null }),
        (pts, span, required) => {
          const n = pts.length;
          const curve = curveOf(
            pts.map((p, i) => ({ ...p, x: -span + (2 * span * i) / (n - 1), imageRejectionDB: null })),
            { requiredNedtK: required, envelope: [-span / 2, span / 2] },
          );
          const plot = envelopePlot(curve, frame);
          const x = scaleLinear().domain([-span, span]).range([0, frame.width]);
          const y = scaleLinear().domain(plot.nedt.domain).range([frame.height, 0]);
          const drawn = runsOf(plot.nedt.path).flat();
          const expected = curve.points
            .filter((p) => p.nedtK !== null)
            .map((p) => [x(p.x), y(Math.min(p.nedtK!, plot.nedt.domain[1]))]);
          expect(drawn).toHaveLength(expected.length);
          drawn.forEach(([dx, dy], i) => {
            expect(Math.abs(dx - expected[i]![0]!)).toBeLessThanOrEqual(0.006);
            expect(Math.abs(dy - expected[i]![1]!)).toBeLessThanOrEqual(0.006);
            expect(dx).toBeGreaterThanOrEqual(0);
            expect(dx).toBeLessThanOrEqual(frame.width);
            expect(dy).toBeGreaterThanOrEqual(0);
            expect(dy).toBeLessThanOrEqual(frame.height);
          });
          // one run per stretch of points with a value
          const runs = pts.reduce(
            (k, p, i) => k + (p.nedtK !== null && (i === 0 || pts[i - 1]!.nedtK === null) ? 1 : 0),
            0,
          );
          expect(runsOf(plot.nedt.path)).toHaveLength(runs);
          if (required !== null) expect(plot.nedt.domain[1]).toBeGreaterThanOrEqual(required);
          expect(plot.envelopePx[0]).toBeCloseTo(frame.width / 4, 9);
          expect(plot.envelopePx[1]).toBeCloseTo((3 * frame.width) / 4, 9);
        },
      ),
    );
  });
});
