export { checkPlan, type CheckOptions } from "./check-plan";
export { checkChainAtOffset } from "./check-chain-at-offset";
export { feasibilityMap, type FeasibilityMap } from "./feasibility-map";
export { placeLo, type Placement } from "./place-lo";
export { prepareChain, type PreparedChain } from "./prepare-chain";
export { evaluateAtOffset, type ChainAtOffset } from "./evaluate-at-offset";
export { mapDiagnostics, type MapDiagnostics } from "./map-diagnostics";
export type { WorkCounter } from "./internals/work-counter";
// The engine's enumeration limits (docs/decisions/017 and 018), for the tests that bound its work.
export { MAX_LOCK_ORDER_ENUMERATED } from "./internals/spurs";
export { MAX_ZONE_CROSSINGS } from "./internals/map-fold";
export { MAX_GRID_POINTS } from "./internals/map-image-edges";
export * from "./types";
