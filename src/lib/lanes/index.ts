export { buildLaneModel } from "./build-lane-model";
export { RF_ROWS, OPTICAL_ROWS, IF_ROWS } from "./internals/rows";
/** The engine's spur families (one definition, in `@/lib/plan`), re-exported for the lane view. */
export { SPUR_FAMILIES } from "@/lib/plan";
export { laneTableRows } from "./lane-table-rows";
export { zoomAbout } from "./zoom-about";
export { clampDomain } from "./clamp-domain";
export { zoomToItem } from "./zoom-to-item";
export { visibleItems, type Placement, type PlacedItem } from "./visible-items";
export { formatTicks, type Tick, type TickSet } from "./format-ticks";
export { explainCode } from "./explain-code";
export { GHZ_LIMITS, IF_LIMITS, type SpanLimits } from "./internals/limits";
export type * from "./types";
export { demoPlan } from "./demo-plan";
export { recheckAtOffset, type Recheck } from "./recheck-at-offset";
export { laneReference } from "./lane-reference";
export { laneModelByChain, type LaneModelParts } from "./lane-model-by-chain";
export { envelopePlot, NEDT_TOP_FACTOR, type EnvelopePlot, type EnvelopePanel, type PlotFrame } from "./envelope-plot";
export {
  temperatureMapCells,
  type TemperatureCell,
  type TemperatureCells,
  type TemperatureCellState,
} from "./temperature-map-cells";
