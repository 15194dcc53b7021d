/**
 * Fourth-order central difference f'(x) ≈ [f(x−2h) − 8f(x−h) + 8f(x+h) − f(x+2h)] / 12h
 * (the standard five-point stencil, e.g. Abramowitz & Stegun, Handbook of
 * Mathematical Functions, 25.3.6). Truncation error O(h⁴).
 */
export function centralDifference(f: (x: number) => number, x: number, h: number): number {
  return (f(x - 2 * h) - 8 * f(x - h) + 8 * f(x + h) - f(x + 2 * h)) / (12 * h);
}
