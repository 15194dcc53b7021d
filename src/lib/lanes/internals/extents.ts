import type { GHzPair, Lane, LaneItem, LaneModel } from "../types";

/** What the opening view of the GHz axis frames: the plan's own bands and offsets, not the carrier or far references. */
const FOCUS_KINDS = new Set<LaneItem["kind"]>(["rf-input", "channel-band", "image-band", "reach", "lo", "sideband"]);

function laneAxis(lanes: readonly Lane[], id: string): "ghz" | "if" {
  return id.startsWith("if:") ? "if" : (lanes.find((l) => l.id === id)?.axis ?? "ghz");
}

/**
 * The model's extents: on the shared GHz axis the hull of `start` and of
 * every item drawn on it; on the IF axis the hull of every IF item and 0
 * (0–1 GHz without any); the focus is the hull of the plan's own bands and
 * offsets among `own` (`FOCUS_KINDS`), the GHz extent without any.
 */
export function extents(
  lanes: readonly Lane[],
  all: readonly LaneItem[],
  own: readonly LaneItem[],
  start: GHzPair,
): Pick<LaneModel, "extentGHz" | "focusGHz" | "extentIF"> {
  let [lo, hi] = start;
  let ilo = Infinity;
  let ihi = -Infinity;
  for (const it of all) {
    if (laneAxis(lanes, it.lane) === "ghz") {
      lo = Math.min(lo, it.lo);
      hi = Math.max(hi, it.hi);
    } else {
      ilo = Math.min(ilo, it.lo);
      ihi = Math.max(ihi, it.hi);
    }
  }
  if (!Number.isFinite(ilo)) [ilo, ihi] = [0, 1];
  let flo = Infinity;
  let fhi = -Infinity;
  for (const it of own) {
    if (!FOCUS_KINDS.has(it.kind)) continue;
    flo = Math.min(flo, it.lo);
    fhi = Math.max(fhi, it.hi);
  }
  if (!Number.isFinite(flo)) [flo, fhi] = [lo, hi];
  return { extentGHz: [lo, hi], focusGHz: [flo, fhi], extentIF: [Math.min(0, ilo), ihi] };
}
