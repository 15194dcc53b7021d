export { WavelengthGrid, type WavelengthGridProps } from "./WavelengthGrid";
export { ResonatorSizing, type ResonatorSizingProps, type ResonatorApplyValue } from "./ResonatorSizing";
export { DriftBudget, type DriftBudgetProps } from "./DriftBudget";
export { ReceiverNoise, type ReceiverNoiseProps } from "./ReceiverNoise";
export { OpticalFrequency, type OpticalFrequencyProps } from "./OpticalFrequency";
export { ChannelNotation, type ChannelNotationProps } from "./ChannelNotation";
