export { checkPlan, type CheckOptions } from "./check-plan";
export { checkChainAtOffset } from "./check-chain-at-offset";
export { feasibilityMap, type FeasibilityMap } from "./feasibility-map";
export { placeLo, type Placement } from "./place-lo";
export { prepareChain, type PreparedChain } from "./prepare-chain";
export { evaluateAtOffset, type ChainAtOffset } from "./evaluate-at-offset";
export { mapDiagnostics, type MapDiagnostics } from "./map-diagnostics";
export type { WorkCounter } from "./internals/work-counter";
export * from "./types";
