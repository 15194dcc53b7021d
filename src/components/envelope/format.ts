/** A number to `digits` significant figures, with a true minus sign; "—" when not finite. */
export function fmtNumber(v: number, digits: number): string {
  if (!Number.isFinite(v)) return "—";
  const s = Number(v.toPrecision(digits)).toString();
  return s.startsWith("-") && Number(s) !== 0 ? `−${s.slice(1)}` : s === "-0" ? "0" : s;
}

/** Intervals of K as text, e.g. "−1.2 to 3.4 K"; "none" when empty. */
export function fmtWindow(intervals: readonly (readonly [number, number])[]): string {
  if (!intervals.length) return "none";
  return intervals.map(([a, b]) => `${fmtNumber(a, 4)} to ${fmtNumber(b, 4)} K`).join(", ");
}
