import type { Domain } from "./types";

export interface Tick {
  readonly value: number;
  readonly label: string;
}

export interface TickSet {
  readonly ticks: Tick[];
  /** Unit of the tick labels. */
  readonly unit: "GHz" | "MHz";
  /** With MHz labels, the frequency (GHz) the offsets are counted from, and its label. */
  readonly anchor: number | null;
  readonly anchorLabel: string | null;
}

/** Spans below this (GHz) are labelled as MHz offsets from an anchor. */
const OFFSET_BELOW_GHz = 0.05;

function niceStep(raw: number): number {
  const p = Math.pow(10, Math.floor(Math.log10(raw)));
  const m = raw / p;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * p;
}

function decimalsFor(step: number): number {
  return Math.max(0, Math.ceil(-Math.log10(step) - 1e-9));
}

function fixed(v: number, decimals: number): string {
  const s = v.toFixed(decimals);
  return s === `-${(0).toFixed(decimals)}` ? (0).toFixed(decimals) : s.replace("-", "−");
}

/**
 * Ticks for a frequency axis that stay readable from about 300 GHz down to a
 * few MHz: steps of 1, 2 or 5 × 10ⁿ, GHz labels with just enough decimals for
 * the step, and, when the view is narrower than 50 MHz, MHz offsets from a
 * round anchor frequency (shown once) instead of long GHz numbers.
 */
export function formatTicks(domain: Domain, approxCount: number): TickSet {
  const [a, b] = domain;
  const span = b - a;
  if (!(span > 0) || !Number.isFinite(span)) return { ticks: [], unit: "GHz", anchor: null, anchorLabel: null };
  const step = niceStep(span / Math.max(1, approxCount));
  const i0 = Math.ceil(a / step - 1e-9);
  const i1 = Math.floor(b / step + 1e-9);
  const values: number[] = [];
  for (let i = i0; i <= i1; i++) values.push(i * step);
  if (span >= OFFSET_BELOW_GHz) {
    const d = decimalsFor(step);
    return {
      ticks: values.map((v) => ({ value: v, label: fixed(v, d) })),
      unit: "GHz",
      anchor: null,
      anchorLabel: null,
    };
  }
  const unitA = Math.pow(10, Math.ceil(Math.log10(span)));
  const anchor = Math.floor(a / unitA + 1e-9) * unitA;
  const stepMHz = step * 1000;
  const d = decimalsFor(stepMHz);
  const anchorDecimals = decimalsFor(unitA);
  return {
    ticks: values.map((v) => {
      const off = (v - anchor) * 1000;
      const label = fixed(off, d);
      return { value: v, label: off > 0 && label !== fixed(0, d) ? `+${label}` : label };
    }),
    unit: "MHz",
    anchor,
    anchorLabel: `${fixed(anchor, anchorDecimals)} GHz`,
  };
}
