import type { SpanLimits } from "./internals/limits";
import type { Domain } from "./types";

/**
 * Hold a domain inside `bounds` and its span inside the limits: the span is
 * set first (about the domain's centre), then the domain is shifted (never
 * resized) to lie inside the bounds; when the bounds are narrower than the
 * span, the domain is centred on them.
 */
export function clampDomain(domain: Domain, bounds: Domain, limits: SpanLimits): Domain {
  let [lo, hi] = domain;
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || hi <= lo) {
    const c = (bounds[0] + bounds[1]) / 2;
    const half = Math.min(limits.maxSpan, Math.max(limits.minSpan, bounds[1] - bounds[0])) / 2;
    return [c - half, c + half];
  }
  const span = Math.min(limits.maxSpan, Math.max(limits.minSpan, hi - lo));
  const c = (lo + hi) / 2;
  lo = c - span / 2;
  hi = c + span / 2;
  const [blo, bhi] = bounds;
  if (bhi - blo <= span) {
    const bc = (blo + bhi) / 2;
    return [bc - span / 2, bc + span / 2];
  }
  if (lo < blo) return [blo, blo + span];
  if (hi > bhi) return [bhi - span, bhi];
  return [lo, hi];
}
