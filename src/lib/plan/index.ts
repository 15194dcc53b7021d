export { checkPlan, type CheckOptions } from "./check-plan";
export { checkChainAtOffset } from "./check-chain-at-offset";
export { feasibilityMap, type FeasibilityMap } from "./feasibility-map";
export { placeLo, type Placement } from "./place-lo";
export { placeReasonText } from "./place-reason-text";
export { prepareChain, type PreparedChain } from "./prepare-chain";
export { evaluateAtOffset, type ChainAtOffset } from "./evaluate-at-offset";
export { mapDiagnostics, type MapDiagnostics } from "./map-diagnostics";
export {
  envelopeCurves,
  type EnvelopeAxis,
  type EnvelopeCurve,
  type EnvelopeCurveOptions,
  type EnvelopeCurvePoint,
} from "./envelope-curves";
export {
  temperatureMap,
  type TemperatureMap,
  type TemperatureMapOptions,
  type TemperatureMapRow,
} from "./temperature-map";
export { temperatureWindow, type TemperatureWindow } from "./temperature-window";
export { noiseWhatIf, type NoiseWhatIf, type NoiseWhatIfChannel, type NoiseWhatIfInputs } from "./noise-what-if";
export type { WorkCounter } from "./internals/work-counter";
// The engine's enumeration limits (docs/decisions/017 and 018), for the tests that bound its work.
export { MAX_LOCK_ORDER_ENUMERATED } from "./internals/spurs";
export { MAX_ZONE_CROSSINGS } from "./internals/map-fold";
export { MAX_GRID_POINTS } from "./internals/map-image-edges";
export { MAX_SCAN_SAMPLES } from "./internals/extremum";
export { WINDOW_SPAN_K, TEMPERATURE_CODES } from "./internals/temperature-window";
export * from "./types";
export { bestSplit, type BestSplit, type SplitProblem, type SplitDwell, type SplitChannel } from "./best-split";
