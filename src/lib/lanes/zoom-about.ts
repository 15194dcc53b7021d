import type { SpanLimits } from "./internals/limits";
import type { Domain } from "./types";

/**
 * Zoom a domain by `factor` (> 1 zooms in) about `pivot`: the pivot keeps its
 * relative position (and so its pixel), and the new span is held within the
 * limits (the factor is reduced, never the pivot moved).
 */
export function zoomAbout(domain: Domain, factor: number, pivot: number, limits: SpanLimits): Domain {
  const [lo, hi] = domain;
  const span = hi - lo;
  if (!(span > 0) || !(factor > 0) || !Number.isFinite(factor)) return domain;
  const next = Math.min(limits.maxSpan, Math.max(limits.minSpan, span / factor));
  const t = (pivot - lo) / span;
  const nlo = pivot - t * next;
  return [nlo, nlo + next];
}
