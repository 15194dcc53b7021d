import { doublePrecision, text } from "drizzle-orm/pg-core";

/**
 * The columns of the noise-budget fields of plan format version 2
 * (docs/plan-format.md §14.1), per table, named as the plan's fields. Each
 * table spreads a fresh set; nullable where the field may be null, with the
 * field's default otherwise, so existing rows read as "not given".
 */

export const laserNoiseColumns = () => ({
  carrierRinDBcPerHz: doublePrecision("carrier_rin_dbc_per_hz"),
  loRinDBcPerHz: doublePrecision("lo_rin_dbc_per_hz"),
  carrierFloorDBcPerHz: doublePrecision("carrier_floor_dbc_per_hz"),
  loFloorDBcPerHz: doublePrecision("lo_floor_dbc_per_hz"),
  carrierPreFilterDB: doublePrecision("carrier_pre_filter_db").notNull().default(0),
  loPreFilterDB: doublePrecision("lo_pre_filter_db").notNull().default(0),
});

export const resonatorNoiseColumns = () => ({
  intrinsicQ: doublePrecision("intrinsic_q"),
  conversionEfficiency: doublePrecision("conversion_efficiency"),
  g0Hz: doublePrecision("g0_hz"),
  mmWaveQ: doublePrecision("mm_wave_q"),
  mmWaveCouplingRatio: doublePrecision("mm_wave_coupling_ratio"),
});

export const detectorNoiseColumns = () => ({
  responsivityAPerW: doublePrecision("responsivity_a_per_w"),
  quantumEfficiency: doublePrecision("quantum_efficiency"),
  noiseCurrentPAPerRtHz: doublePrecision("noise_current_pa_per_rt_hz"),
  cmrrDB: doublePrecision("cmrr_db"),
});

export const chainNoiseColumns = () => ({
  frontEndLossDB: doublePrecision("front_end_loss_db").notNull().default(0),
  frontEndTemperatureK: doublePrecision("front_end_temperature_k").notNull().default(290),
});

export const channelNoiseColumns = () => ({
  receiverKSource: text("receiver_k_source", { enum: ["entered", "computed"] })
    .notNull()
    .default("entered"),
});
