import type { PlaceReason } from "./types";

/**
 * Why no LO can be suggested, in words (the result document keeps the
 * codes `no-feasible-interval` and `no-grid-point`; screens and the report
 * show this text). Null when an LO was suggested.
 */
export function placeReasonText(reason: PlaceReason | undefined): string | null {
  switch (reason) {
    case "no-feasible-interval":
      return "no LO offset satisfies every rule of this chain";
    case "no-grid-point":
      return "no feasible interval holds a setting on the laser's tuning step";
    default:
      return null;
  }
}
