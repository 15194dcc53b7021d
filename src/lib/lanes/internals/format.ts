/** Number formatting shared by the lane model's facts (helpers, not public). */

/** A frequency in GHz to at most `digits` decimals (default 6 = 1 kHz), trailing zeros removed. */
export function ghz(v: number, digits = 6): string {
  if (!Number.isFinite(v)) return String(v);
  const s = v.toFixed(digits);
  return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
}

export function ghzRange(lo: number, hi: number): string {
  return lo === hi ? `${ghz(lo)} GHz` : `${ghz(lo)} – ${ghz(hi)} GHz`;
}

export function mhz(vGHz: number, digits = 3): string {
  return `${ghz(vGHz * 1000, digits)} MHz`;
}

export function num(v: number | null | undefined, digits: number, unit: string): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return "—";
  return `${ghz(v, digits)} ${unit}`;
}
