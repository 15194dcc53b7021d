/** A linear map from `domain` onto `range` (an affine function; a zero-width domain maps to the range's start). */
export function linearMap(domain: readonly [number, number], range: readonly [number, number]): (v: number) => number {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const k = d1 === d0 ? 0 : (r1 - r0) / (d1 - d0);
  return (v) => r0 + (v - d0) * k;
}

/** Two decimals are finer than a pixel. */
const round = (v: number) => Math.round(v * 100) / 100 + 0;

/**
 * An SVG path through the points in order: `M` starts a run, `L` continues
 * it; a null point (no value) ends the run, so gaps are not bridged.
 */
export function pathOf(points: readonly (readonly [number, number] | null)[]): string {
  const parts: string[] = [];
  let open = false;
  for (const p of points) {
    if (p === null) {
      open = false;
      continue;
    }
    parts.push(`${open ? "L" : "M"}${round(p[0])},${round(p[1])}`);
    open = true;
  }
  return parts.join("");
}
