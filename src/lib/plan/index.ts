export { checkPlan } from "./check-plan";
export { checkChainAtOffset } from "./check-chain-at-offset";
export * from "./types";
