/**
 * Optics and radiometry helpers: λ ↔ f, ITU-T G.694.1 grids, LiNbO3 indices,
 * resonator FSR and thermal tuning, Q ↔ linewidth, drift budget, receiver
 * noise estimate, Planck radiation temperature and the channel notation of
 * sounder tables. Formulas and sources: docs/helpers.md.
 */
export { OpticsInputError } from "./internals/errors";
export { SPEED_OF_LIGHT_M_PER_S, PLANCK_J_S, BOLTZMANN_J_PER_K, GRID_ANCHOR_GHZ } from "./internals/constants";
export { wavelengthNmFromTHz } from "./wavelengthNmFromTHz";
export { frequencyTHzFromNm } from "./frequencyTHzFromNm";
export { nearestGridChannel, GRID_SPACINGS_GHZ, type GridChannel, type GridSpacingGHz } from "./nearestGridChannel";
export { flexGridSlot, type FlexGridSlot } from "./flexGridSlot";
export { lnIndexZelmon, type LnAxis } from "./lnIndexZelmon";
export { lnExtraordinaryIndexJundt } from "./lnExtraordinaryIndexJundt";
export { groupIndex, type IndexModel, type GroupIndexResult } from "./groupIndex";
export { freeSpectralRange } from "./freeSpectralRange";
export { radiusForFsr } from "./radiusForFsr";
export { lnThermalExpansion, LN_EXPANSION_A } from "./lnThermalExpansion";
export { modeShiftPerKelvin, type ModeShiftResult } from "./modeShiftPerKelvin";
export { fsrShiftPerKelvin, type FsrShiftResult } from "./fsrShiftPerKelvin";
export { linewidthFromQ } from "./linewidthFromQ";
export { loadedQFromLinewidth } from "./loadedQFromLinewidth";
export {
  driftBudget,
  type DriftBudgetInput,
  type DriftBudgetResult,
  type DriftCombination,
  type DriftTerm,
} from "./driftBudget";
export { quantumLimitK } from "./quantumLimitK";
export { receiverNoise, type ReceiverNoiseInput, type ReceiverNoiseResult } from "./receiverNoise";
export { planckRadiationTemperature } from "./planckRadiationTemperature";
export { physicalTemperatureFromRadiation } from "./physicalTemperatureFromRadiation";
export {
  parseChannelNotation,
  type ParseChannelOptions,
  type ChannelParseResult,
  type ChannelParseError,
  type ChannelPart,
  type ChannelSpec,
} from "./parseChannelNotation";
export { formatChannelNotation } from "./formatChannelNotation";
export { channelPassbands, type Passband } from "./channelPassbands";
