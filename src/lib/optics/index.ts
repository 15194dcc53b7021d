/**
 * Optics and radiometry helpers: λ ↔ f, ITU-T G.694.1 grids, LiNbO3 indices,
 * resonator FSR and thermal tuning, Q ↔ linewidth, drift budget, receiver
 * noise estimate, Planck radiation temperature and the channel notation of
 * sounder tables. Formulas and sources: docs/helpers.md.
 */
export { OpticsInputError } from "./internals/errors";
export { SPEED_OF_LIGHT_M_PER_S, PLANCK_J_S, BOLTZMANN_J_PER_K, GRID_ANCHOR_GHZ } from "./internals/constants";
export { wavelengthNmFromTHz } from "./wavelength-nm-from-thz";
export { frequencyTHzFromNm } from "./frequency-thz-from-nm";
export { nearestGridChannel, GRID_SPACINGS_GHZ, type GridChannel, type GridSpacingGHz } from "./nearest-grid-channel";
export { flexGridSlot, type FlexGridSlot } from "./flex-grid-slot";
export { lnIndexZelmon, type LnAxis } from "./ln-index-zelmon";
export { lnExtraordinaryIndexJundt } from "./ln-extraordinary-index-jundt";
export { groupIndex, type IndexModel, type GroupIndexResult } from "./group-index";
export { freeSpectralRange } from "./free-spectral-range";
export { radiusForFsr } from "./radius-for-fsr";
export { lnThermalExpansion, LN_EXPANSION_A } from "./ln-thermal-expansion";
export { modeShiftPerKelvin, type ModeShiftResult } from "./mode-shift-per-kelvin";
export { fsrShiftPerKelvin, type FsrShiftResult } from "./fsr-shift-per-kelvin";
export { linewidthFromQ } from "./linewidth-from-q";
export { loadedQFromLinewidth } from "./loaded-q-from-linewidth";
export {
  driftBudget,
  type DriftBudgetInput,
  type DriftBudgetResult,
  type DriftCombination,
  type DriftTerm,
} from "./drift-budget";
export { quantumLimitK } from "./quantum-limit-k";
export { receiverNoise, type ReceiverNoiseInput, type ReceiverNoiseResult } from "./receiver-noise";
export { planckRadiationTemperature } from "./planck-radiation-temperature";
export { physicalTemperatureFromRadiation } from "./physical-temperature-from-radiation";
export {
  parseChannelNotation,
  type ParseChannelOptions,
  type ChannelParseResult,
  type ChannelParseError,
  type ChannelPart,
  type ChannelSpec,
} from "./parse-channel-notation";
export { formatChannelNotation } from "./format-channel-notation";
export { channelPassbands, type Passband } from "./channel-passbands";
