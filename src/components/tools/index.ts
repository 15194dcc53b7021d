export { WavelengthGrid, type WavelengthGridProps } from "./wavelength-grid";
export { ResonatorSizing, type ResonatorSizingProps, type ResonatorApplyValue } from "./resonator-sizing";
export { DriftBudget, type DriftBudgetProps } from "./drift-budget";
export { ReceiverNoise, type ReceiverNoiseProps } from "./receiver-noise";
export { OpticalFrequency, type OpticalFrequencyProps } from "./optical-frequency";
export { ChannelNotation, type ChannelNotationProps } from "./channel-notation";
