import type { GHzPair, LaneItem, LaneReferenceInput } from "../types";
import { ghz, ghzRange } from "./format";
import { item } from "./item";
import { RF_ROWS } from "./rows";

/** Reference lines and bands are kept within this distance of the plan's own items (GHz). */
const REFERENCE_MARGIN_GHz = 20;

/** Hull of the RF lane's items; 0–400 GHz when there are none. */
export function rfHull(items: readonly LaneItem[]): GHzPair {
  let lo = Infinity;
  let hi = -Infinity;
  for (const it of items) {
    if (it.lane !== "rf") continue;
    lo = Math.min(lo, it.lo);
    hi = Math.max(hi, it.hi);
  }
  if (!Number.isFinite(lo)) [lo, hi] = [0, 400];
  return [lo, hi];
}

/**
 * The reference table's protected passive bands, then its line centres, on
 * the RF lane's reference row: those within `REFERENCE_MARGIN_GHz` of
 * `near` (the hull of the plan's RF items).
 */
export function referenceItems(reference: LaneReferenceInput, near: GHzPair): LaneItem[] {
  const refLo = near[0] - REFERENCE_MARGIN_GHz;
  const refHi = near[1] + REFERENCE_MARGIN_GHz;
  const refItems: LaneItem[] = [];
  reference.protectedBands.forEach((b, k) => {
    if (b.maxGHz < refLo || b.minGHz > refHi) return;
    refItems.push(
      item({
        id: `rf:protected:${k}`,
        lane: "rf",
        kind: "protected-band",
        row: RF_ROWS.reference,
        lo: b.minGHz,
        hi: b.maxGHz,
        label: `protected passive band ${ghz(b.minGHz)}–${ghz(b.maxGHz)} GHz`,
        facts: () => [
          ["band", ghzRange(b.minGHz, b.maxGHz)],
          ["source", b.source],
        ],
      }),
    );
  });
  reference.lines.forEach((l, k) => {
    if (l.centreGHz < refLo || l.centreGHz > refHi) return;
    refItems.push(
      item({
        id: `rf:line:${k}`,
        lane: "rf",
        kind: "line-centre",
        row: RF_ROWS.reference,
        lo: l.centreGHz,
        hi: l.centreGHz,
        label: `${l.label} line`,
        facts: () => [
          ["centre", `${ghz(l.centreGHz)} GHz`],
          ["source", l.source],
        ],
      }),
    );
  });
  return refItems;
}
