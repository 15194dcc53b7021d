import type { Interval } from "./intervals";

/** Numbers for messages: plain decimals, no trailing zeros, no float dust. */
const POW10 = [1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9];
function trim(v: number, digits: number): string {
  if (!Number.isFinite(v)) return String(v);
  const p = POW10[digits] ?? 10 ** digits;
  // an integer divided by a power of ten is the double nearest that decimal, so String() shows it exactly
  const r = Math.abs(v) < 1e15 / p ? Math.round(v * p) / p : v;
  return r === 0 ? "0" : String(r);
}

/** A frequency in GHz to 1 kHz. */
export const fGHz = (v: number) => trim(v, 6);
/** A frequency difference given in GHz, written in MHz to 1 kHz. */
export const fMHz = (vGHz: number) => trim(vGHz * 1000, 3);
/** A level in dB. */
export const fDB = (v: number) => trim(v, 2);
/** A temperature in K (5 significant digits). */
export const fK = (v: number) => (Number.isFinite(v) ? String(Number(v.toPrecision(5)) + 0) : String(v));
/** A power in mW. */
export const fMW = (v: number) => trim(v, 4);
/** An interval in GHz, "1.475–1.525 GHz". */
export const fBand = (iv: Interval) => `${fGHz(iv[0])}–${fGHz(iv[1])} GHz`;

/** An interval as a mutable JSON pair. */
export const pair = (iv: Interval): [number, number] => [iv[0] + 0, iv[1] + 0]; // + 0 turns −0 into 0
