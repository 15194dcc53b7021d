import type { LaneItem } from "@/lib/lanes";
import { FAMILY_LOOK, SEVERITY_COLOUR } from "../../vocabulary";

/** A spur family's colour and band pattern (grey diagonal hatching when the family is unknown). */
export function spurFamilyLook(family: LaneItem["family"]): { colour: string; pattern: string } {
  const fam = family ? FAMILY_LOOK[family] : null;
  return { colour: fam?.colour ?? "#666", pattern: fam?.pattern ?? "hl-pat-diag" };
}

/** A spur marker's paint: filled when it hits a slot (error) or is info, outlined in red for an error. */
export function spurMarkerPaint(severity: LaneItem["severity"], colour: string) {
  return {
    fill: severity === "error" || severity === "info" ? colour : "#fff",
    stroke: severity === "error" ? SEVERITY_COLOUR.error : colour,
    strokeWidth: severity === "error" ? 1.8 : 1,
  };
}
