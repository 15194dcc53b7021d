export { checkPlan } from "./check-plan";
export { checkChainAtOffset } from "./check-chain-at-offset";
export { feasibilityMap } from "./feasibility-map";
export { placeLo } from "./place-lo";
export * from "./types";
