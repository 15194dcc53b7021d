/**
 * Display formatting for the workspace screens. Numbers are shown with a
 * fixed number of decimals suited to each unit (planning values, not the
 * engine's full precision); missing values show an en dash.
 */

export const DASH = "–";

function fixed(x: number, decimals: number): string {
  // Avoid "-0.000" for tiny negatives produced by rounding.
  const s = x.toFixed(decimals);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

export function formatNumber(x: number | null | undefined, decimals: number): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return DASH;
  return fixed(x, decimals);
}

/** GHz with kHz resolution by default (the result documents are compared to 1 kHz). */
export const formatGHz = (x: number | null | undefined, decimals = 3) => formatNumber(x, decimals);
export const formatMHz = (x: number | null | undefined, decimals = 1) => formatNumber(x, decimals);
export const formatK = (x: number | null | undefined, decimals = 2) => formatNumber(x, decimals);
export const formatDB = (x: number | null | undefined, decimals = 1) => formatNumber(x, decimals);

export function formatInterval(iv: readonly [number, number] | null | undefined, unit = "GHz", decimals = 3): string {
  if (!iv) return DASH;
  return `${fixed(iv[0], decimals)}–${fixed(iv[1], decimals)} ${unit}`;
}

/** A loaded Q such as 1e7 as "1.0 × 10⁷"; small values plainly. */
export function formatQ(q: number | null | undefined): string {
  if (q === null || q === undefined || !Number.isFinite(q)) return DASH;
  if (q < 1e4) return fixed(q, 0);
  const exp = Math.floor(Math.log10(q));
  let mant = q / 10 ** exp;
  let e = exp;
  if (Number(mant.toFixed(1)) >= 10) {
    mant /= 10;
    e += 1;
  }
  const sup = String(e)
    .split("")
    .map((d) => "⁰¹²³⁴⁵⁶⁷⁸⁹"[Number(d)])
    .join("");
  return `${mant.toFixed(1)} × 10${sup}`;
}

/** "3 min ago", "2 h ago", "5 d ago", or the date for anything older than 30 days. */
export function formatAge(iso: string | null | undefined, now: Date = new Date()): string {
  if (!iso) return DASH;
  const t = Date.parse(iso);
  if (!Number.isFinite(t)) return DASH;
  const s = Math.max(0, (now.getTime() - t) / 1000);
  if (s < 60) return "just now";
  if (s < 3600) return `${Math.floor(s / 60)} min ago`;
  if (s < 86400) return `${Math.floor(s / 3600)} h ago`;
  if (s < 30 * 86400) return `${Math.floor(s / 86400)} d ago`;
  return new Date(t).toISOString().slice(0, 10);
}

/** NEΔT against its requirement: the margin (required − estimate) and whether it passes. */
export function nedtStatus(
  nedtK: number | null | undefined,
  requiredK: number | null | undefined,
): { state: "met" | "unmet" | "no-requirement" | "no-estimate"; marginK: number | null } {
  if (nedtK === null || nedtK === undefined || !Number.isFinite(nedtK)) return { state: "no-estimate", marginK: null };
  if (requiredK === null || requiredK === undefined) return { state: "no-requirement", marginK: null };
  const margin = requiredK - nedtK;
  // The engine's rule allows 1e-9 K in favour of passing (docs/plan-format.md §1.4 "The 1e-9 allowance").
  return { state: margin >= -1e-9 ? "met" : "unmet", marginK: margin };
}

export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}
