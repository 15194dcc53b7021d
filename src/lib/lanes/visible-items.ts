import type { Domain } from "./types";

export interface PlacedItem<T> {
  readonly item: T;
  /** Pixel extent, at least `minPx` wide (a line or a narrow band is widened about its centre). */
  readonly x0: number;
  readonly x1: number;
  /** The item is wider than the view and cut at an edge. */
  readonly clipped: boolean;
}

export interface Placement<T> {
  readonly drawn: PlacedItem<T>[];
  /** Items wholly left / right of the view (the chart shows their counts at the edges). */
  readonly offLeft: T[];
  readonly offRight: T[];
}

/**
 * Place items on a pixel axis of `widthPx` for the visible `domain`: every
 * item is either drawn (at least `minPx` wide, so nothing vanishes however
 * far out the view is zoomed) or counted as off to the left or right.
 */
export function visibleItems<T extends { readonly lo: number; readonly hi: number }>(
  items: readonly T[],
  domain: Domain,
  widthPx: number,
  minPx = 2,
): Placement<T> {
  const [d0, d1] = domain;
  const k = widthPx / (d1 - d0);
  const drawn: PlacedItem<T>[] = [];
  const offLeft: T[] = [];
  const offRight: T[] = [];
  for (const item of items) {
    if (item.hi < d0) offLeft.push(item);
    else if (item.lo > d1) offRight.push(item);
    else {
      let x0 = (Math.max(item.lo, d0) - d0) * k;
      let x1 = (Math.min(item.hi, d1) - d0) * k;
      if (x1 - x0 < minPx) {
        const c = (x0 + x1) / 2;
        x0 = c - minPx / 2;
        x1 = c + minPx / 2;
      }
      drawn.push({ item, x0, x1, clipped: item.lo < d0 || item.hi > d1 });
    }
  }
  return { drawn, offLeft, offRight };
}
