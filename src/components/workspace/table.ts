/**
 * Sorting and filtering of the workspace tables. Pure: rows in, rows out.
 * Missing values (null/undefined/NaN) always sort last, whichever the direction.
 */

export type SortDir = "asc" | "desc";
export type Cell = string | number | boolean | null | undefined;
export interface SortState<K extends string> {
  key: K;
  dir: SortDir;
}

function missing(v: Cell): boolean {
  return v === null || v === undefined || (typeof v === "number" && Number.isNaN(v)) || v === "";
}

/** Compares two cells ascending: numbers numerically, strings naturally ("wv2" < "wv10"), missing last. */
export function compareCells(a: Cell, b: Cell): number {
  const ma = missing(a);
  const mb = missing(b);
  if (ma || mb) return ma === mb ? 0 : ma ? 1 : -1;
  if (typeof a === "number" && typeof b === "number") return a - b;
  if (typeof a === "boolean" && typeof b === "boolean") return Number(a) - Number(b);
  return String(a).localeCompare(String(b), "en", { numeric: true, sensitivity: "base" });
}

/** A stable sort by one column; missing values stay at the end in both directions. */
export function sortRows<R, K extends string>(
  rows: readonly R[],
  sort: SortState<K>,
  get: (row: R, key: K) => Cell,
): R[] {
  const sign = sort.dir === "asc" ? 1 : -1;
  return rows
    .map((row, index) => ({ row, index, v: get(row, sort.key) }))
    .sort((x, y) => {
      const mx = missing(x.v);
      const my = missing(y.v);
      if (mx || my) return mx === my ? x.index - y.index : mx ? 1 : -1;
      return sign * compareCells(x.v, y.v) || x.index - y.index;
    })
    .map((e) => e.row);
}

/** The next sort state after a click on a column header: new column ascending, same column toggles. */
export function nextSort<K extends string>(current: SortState<K>, key: K): SortState<K> {
  if (current.key !== key) return { key, dir: "asc" };
  return { key, dir: current.dir === "asc" ? "desc" : "asc" };
}

/**
 * Keeps the rows whose text contains every whitespace-separated word of the
 * query (case-insensitive), searching the given fields.
 */
export function filterByText<R>(rows: readonly R[], query: string, text: (row: R) => readonly Cell[]): R[] {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0) return [...rows];
  return rows.filter((row) => {
    const hay = text(row)
      .filter((c) => !missing(c))
      .map((c) => String(c).toLowerCase())
      .join(" ");
    return words.every((w) => hay.includes(w));
  });
}

/** Keeps rows whose field equals the chosen value; an empty choice keeps all. */
export function filterByValue<R>(rows: readonly R[], value: string, get: (row: R) => Cell): R[] {
  if (!value) return [...rows];
  return rows.filter((r) => String(get(r) ?? "") === value);
}
