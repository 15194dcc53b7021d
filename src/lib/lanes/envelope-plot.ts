import type { EnvelopeCurve } from "@/lib/plan";
import { linearMap, pathOf } from "./internals/plot-geometry";

/** The inner drawing area of a plot panel, in pixels (the axes sit outside it). */
export interface PlotFrame {
  readonly width: number;
  readonly height: number;
}

/** One panel of an envelope plot: a quantity against the curve's x. */
export interface EnvelopePanel {
  /** The y range drawn (bottom, top) in the quantity's unit. */
  readonly domain: readonly [number, number];
  /** SVG path of the curve in panel pixels; a point without a value breaks the line. */
  readonly path: string;
  /** The limit (the NEΔT requirement or the mode-response limit) and its pixel row, or null. */
  readonly limit: number | null;
  readonly limitY: number | null;
  /** How many points lie above the top of the domain (drawn on the top edge). */
  readonly clipped: number;
}

export interface EnvelopePlot {
  readonly unit: "MHz" | "K";
  /** The x range drawn (the curve's span). */
  readonly xDomain: readonly [number, number];
  /** The envelope's ends in panel pixels (left, right). */
  readonly envelopePx: readonly [number, number];
  readonly nedt: EnvelopePanel;
  readonly mode: EnvelopePanel;
}

/**
 * NEΔT is drawn up to this many times its reference (the requirement, or
 * the NEΔT at the curve's middle without one): far off the mode NEΔT grows
 * without bound, and a linear axis up to that would flatten the region that
 * matters. Points above are drawn on the top edge and counted.
 */
export const NEDT_TOP_FACTOR = 4;

/**
 * The geometry of a channel's envelope plot (docs/decisions/029): the x
 * range of the curve, the envelope's ends, and for each of the two panels
 * (NEΔT in K from 0, mode response from 0 to 1) the y range, the curve as an
 * SVG path and the limit line, all in the pixels of `frame` (y grows
 * downwards). Pure: the components only draw what this returns.
 */
export function envelopePlot(curve: EnvelopeCurve, frame: PlotFrame): EnvelopePlot {
  const xs = curve.points.map((p) => p.x);
  const xDomain: [number, number] = xs.length ? [xs[0]!, xs.at(-1)!] : [curve.envelope[0], curve.envelope[1]];
  if (xDomain[1] <= xDomain[0]) xDomain[1] = xDomain[0] + 1;
  const px = linearMap(xDomain, [0, frame.width]);

  const finite = curve.points.map((p) => p.nedtK).filter((v): v is number => v !== null && Number.isFinite(v));
  const middle = curve.points[Math.floor(curve.points.length / 2)]?.nedtK ?? null;
  const reference = curve.requiredNedtK ?? middle ?? (finite.length ? Math.min(...finite) : null);
  const highest = finite.length ? Math.max(...finite) : 1;
  let top = reference !== null && reference > 0 ? Math.min(highest, NEDT_TOP_FACTOR * reference) : highest;
  if (curve.requiredNedtK !== null) top = Math.max(top, curve.requiredNedtK);
  top = top > 1e-9 ? top * 1.05 : 1;
  const nedtY = linearMap([0, top], [frame.height, 0]);
  let clipped = 0;
  const nedtPath = pathOf(
    curve.points.map((p) => {
      if (p.nedtK === null || !Number.isFinite(p.nedtK)) return null;
      if (p.nedtK > top) clipped++;
      return [px(p.x), nedtY(Math.min(p.nedtK, top))] as const;
    }),
  );
  const modeY = linearMap([0, 1], [frame.height, 0]);
  const modePath = pathOf(curve.points.map((p) => [px(p.x), modeY(p.modeResponse)] as const));
  const lo = Math.max(xDomain[0], curve.envelope[0]);
  const hi = Math.min(xDomain[1], curve.envelope[1]);
  return {
    unit: curve.unit,
    xDomain,
    envelopePx: [px(lo), px(Math.max(lo, hi))],
    nedt: {
      domain: [0, top],
      path: nedtPath,
      limit: curve.requiredNedtK,
      limitY: curve.requiredNedtK === null ? null : nedtY(curve.requiredNedtK),
      clipped,
    },
    mode: {
      domain: [0, 1],
      path: modePath,
      limit: curve.modeResponseLimit,
      limitY: modeY(curve.modeResponseLimit),
      clipped: 0,
    },
  };
}
