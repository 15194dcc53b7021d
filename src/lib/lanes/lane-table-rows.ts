import type { LaneModel, TableRow } from "./types";

/**
 * The table view: one row per item of the lane model, in the model's order,
 * with the same numbers the chart draws (nothing is recomputed here).
 */
export function laneTableRows(model: LaneModel): TableRow[] {
  return model.items.map((it) => ({
    id: it.id,
    lane: it.lane,
    kind: it.kind,
    label: it.label,
    fromGHz: it.lo,
    toGHz: it.hi,
    chain: it.chain ?? "",
    channel: it.channel ?? "",
    family: it.family ?? "",
    order: it.order === null ? "" : String(it.order),
    codes: it.codes.join(" "),
    severity: it.severity ?? "",
    facts: it.facts.map(([k, v]) => `${k}: ${v}`).join("; "),
  }));
}
