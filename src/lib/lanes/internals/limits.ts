/** Zoom limits of the lane view's axes (GHz). */
export interface SpanLimits {
  readonly minSpan: number;
  readonly maxSpan: number;
}

/** The shared GHz axis: a few MHz at the closest, about 300 GHz (carrier to the top of the band) at the widest. */
export const GHZ_LIMITS: SpanLimits = { minSpan: 0.002, maxSpan: 360 };
/** The IF axis: a few MHz to 100 GHz. */
export const IF_LIMITS: SpanLimits = { minSpan: 0.002, maxSpan: 100 };
