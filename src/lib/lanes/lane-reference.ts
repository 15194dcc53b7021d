import { LINE_CENTRES, PROTECTED_BANDS } from "@/lib/reference";
import type { LaneReferenceInput } from "./types";

/** The engine's reference table (line centres, protected passive bands) in the lane view's shape. */
export function laneReference(): LaneReferenceInput {
  return {
    lines: LINE_CENTRES.map((l) => ({
      label: `${l.species} ${l.centreGHz}`,
      centreGHz: l.centreGHz,
      source: l.source,
    })),
    protectedBands: PROTECTED_BANDS.map((b) => ({ minGHz: b.bandGHz[0], maxGHz: b.bandGHz[1], source: b.source })),
  };
}
