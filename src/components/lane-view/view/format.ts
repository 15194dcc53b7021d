/** A number with `d` decimals and a true minus sign, for the lane view's text. */
export function fmt(v: number, d = 3): string {
  return v.toFixed(d).replace("-", "−");
}
