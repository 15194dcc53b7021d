import type { SpanLimits } from "./internals/limits";
import type { Domain } from "./types";

/**
 * The domain that shows the interval `[lo, hi]` (a tone when lo = hi)
 * centred, with `padding` of its width on each side (e.g. 0.25), and never
 * narrower than the minimum span or wider than the maximum.
 */
export function zoomToItem(lo: number, hi: number, padding: number, limits: SpanLimits): Domain {
  const a = Math.min(lo, hi);
  const b = Math.max(lo, hi);
  const c = (a + b) / 2;
  const span = Math.min(limits.maxSpan, Math.max(limits.minSpan, (b - a) * (1 + 2 * Math.max(0, padding))));
  return [c - span / 2, c + span / 2];
}
