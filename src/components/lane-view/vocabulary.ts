import type { ItemKind } from "@/lib/lanes";
import type { Severity, SpurFamily } from "@/lib/plan";

/**
 * The lane view's own visual vocabulary: a colour and a fill pattern per
 * spur family, a marker shape per order, and one look per item kind. Calm
 * colours for context, saturated ones only for what the reader acts on.
 */

export const SEVERITY_COLOUR: Record<Severity, string> = {
  error: "#b3261e",
  warning: "#a15c00",
  info: "#3f5a73",
};

export interface FamilyLook {
  colour: string;
  /** id of the SVG pattern used for the family's bands. */
  pattern: string;
  name: string;
}

export const FAMILY_LOOK: Record<SpurFamily, FamilyLook> = {
  "carrier-beat": { colour: "#9b2c2c", pattern: "hl-pat-cross", name: "carrier × LO beat" },
  "lock-lo": { colour: "#7a4fa0", pattern: "hl-pat-diag", name: "lock sideband × LO" },
  "lock-self": { colour: "#2f6f9f", pattern: "hl-pat-vert", name: "lock tones (direct detection)" },
  harmonic: { colour: "#4d7c0f", pattern: "hl-pat-dots", name: "IF harmonic" },
  intermod: { colour: "#a16207", pattern: "hl-pat-horiz", name: "IF intermodulation" },
};

/** Marker shape per order: 1 circle, 2 square, 3 triangle, 4 diamond, 5+ cross. */
export type OrderShape = "circle" | "square" | "triangle" | "diamond" | "cross";
export function orderShape(order: number | null): OrderShape {
  switch (order) {
    case 1:
      return "circle";
    case 2:
      return "square";
    case 3:
      return "triangle";
    case 4:
      return "diamond";
    default:
      return "cross";
  }
}

/** SVG path of a marker of size r centred at (0, 0). */
export function markerPath(shape: OrderShape, r: number): string {
  switch (shape) {
    case "circle":
      return `M ${-r} 0 A ${r} ${r} 0 1 0 ${r} 0 A ${r} ${r} 0 1 0 ${-r} 0 Z`;
    case "square":
      return `M ${-r} ${-r} H ${r} V ${r} H ${-r} Z`;
    case "triangle":
      return `M 0 ${-r * 1.15} L ${r * 1.1} ${r * 0.85} L ${-r * 1.1} ${r * 0.85} Z`;
    case "diamond":
      return `M 0 ${-r * 1.2} L ${r * 1.2} 0 L 0 ${r * 1.2} L ${-r * 1.2} 0 Z`;
    default:
      return `M ${-r} ${-r} L ${r} ${r} M ${r} ${-r} L ${-r} ${r}`;
  }
}

export interface KindLook {
  fill: string;
  stroke: string;
  opacity: number;
  dash?: string;
  name: string;
}

export const KIND_LOOK: Record<ItemKind, KindLook> = {
  "protected-band": { fill: "url(#hl-pat-protected)", stroke: "#8aa3ad", opacity: 1, name: "protected passive band" },
  "line-centre": { fill: "none", stroke: "#12343b", opacity: 0.8, dash: "3 3", name: "atmospheric line centre" },
  "rf-input": { fill: "#e1ebe9", stroke: "#9fbcb8", opacity: 1, name: "RF input passband" },
  "mode-passband": { fill: "#d8c8ea", stroke: "#7a4fa0", opacity: 1, name: "resonator mode (centre ± δ/2)" },
  "mode-drift": {
    fill: "#d8c8ea",
    stroke: "#7a4fa0",
    opacity: 0.35,
    dash: "2 2",
    name: "wanted mode over the temperature control ±Te",
  },
  "envelope-band": {
    fill: "#2b6f77",
    stroke: "#2b6f77",
    opacity: 0.18,
    dash: "3 2",
    name: "channel received at the envelope's ends (LO shift ±D)",
  },
  "channel-band": { fill: "#2b6f77", stroke: "#1b4a50", opacity: 1, name: "channel passband" },
  "image-band": { fill: "#ffffff", stroke: "#2b6f77", opacity: 1, dash: "2 2", name: "image band" },
  reach: { fill: "#eef0f2", stroke: "#c3c9cf", opacity: 1, name: "laser-pair reach" },
  feasible: { fill: "#cfe8d2", stroke: "#2e7d32", opacity: 1, name: "feasible LO offsets" },
  blocked: { fill: "url(#hl-pat-blocked)", stroke: "#b3261e", opacity: 1, name: "blocked LO offsets" },
  carrier: { fill: "#12343b", stroke: "#12343b", opacity: 1, name: "carrier (laser 1) at 0" },
  "lock-sideband": { fill: "#2f6f9f", stroke: "#2f6f9f", opacity: 1, name: "lock sideband ±m·fm" },
  sideband: { fill: "#9a7cc0", stroke: "#5b3a80", opacity: 1, name: "wanted optical sideband" },
  lo: { fill: "#d97706", stroke: "#7c3f00", opacity: 1, name: "LO (laser 2), drag to move" },
  "detector-band": { fill: "#f3efe7", stroke: "#c9b99a", opacity: 1, name: "detector usable band" },
  "nyquist-edge": { fill: "none", stroke: "#6b7280", opacity: 1, dash: "1 3", name: "Nyquist edge k·fs/2" },
  guard: { fill: "none", stroke: "#b5651d", opacity: 0.9, dash: "3 2", name: "guard band" },
  occupied: { fill: "#f1d3b3", stroke: "none", opacity: 1, name: "occupied band (slot ± drift)" },
  "if-slot": { fill: "#b5651d", stroke: "#7a4012", opacity: 1, name: "IF slot" },
  spur: { fill: "#888", stroke: "#555", opacity: 1, name: "spur product" },
};

/** The same marker as `markerPath`, at an absolute position (for merged paths). */
export function markerPathAt(shape: OrderShape, cx: number, cy: number, r: number): string {
  const p = (dx: number, dy: number) => `${(cx + dx).toFixed(1)} ${(cy + dy).toFixed(1)}`;
  switch (shape) {
    case "circle":
      return `M ${p(-r, 0)} A ${r} ${r} 0 1 0 ${p(r, 0)} A ${r} ${r} 0 1 0 ${p(-r, 0)} Z`;
    case "square":
      return `M ${p(-r, -r)} L ${p(r, -r)} L ${p(r, r)} L ${p(-r, r)} Z`;
    case "triangle":
      return `M ${p(0, -r * 1.15)} L ${p(r * 1.1, r * 0.85)} L ${p(-r * 1.1, r * 0.85)} Z`;
    case "diamond":
      return `M ${p(0, -r * 1.2)} L ${p(r * 1.2, 0)} L ${p(0, r * 1.2)} L ${p(-r * 1.2, 0)} Z`;
    default:
      return `M ${p(-r, -r)} L ${p(r, r)} M ${p(r, -r)} L ${p(-r, r)}`;
  }
}
