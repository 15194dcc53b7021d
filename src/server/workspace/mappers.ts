import "server-only";
import type { Chain, Channel, Detector, Laser, Mission, PlanSettingsRow, Resonator } from "@db/schema";
import type { ChainInput, ChannelInput, DetectorInput, LaserInput, ResonatorInput } from "@/schemas/workspace";
import { chainNoise, channelNoise, detectorNoise, laserNoise, resonatorNoise } from "./noise-fields";

/**
 * Row ↔ API entity mapping. API entities mirror the plan document fields
 * (docs/plan-format.md §2 "The plan document", §12.1 for the fields of
 * version 2) plus id, key, version and timestamps; chains name
 * hardware by row id and channels their chain by row id.
 */

const stamps = (r: { id: string; version: number; createdAt: Date; updatedAt: Date }) => ({
  id: r.id,
  version: r.version,
  createdAt: r.createdAt.toISOString(),
  updatedAt: r.updatedAt.toISOString(),
});

export const laserDto = (r: Laser) => ({
  ...stamps(r),
  key: r.key,
  carrierTHz: r.carrierTHz,
  carrierPowerMW: r.carrierPowerMW,
  loPowerMW: r.loPowerMW,
  reach: r.reach.map((i) => ({ minGHz: i.minGHz, maxGHz: i.maxGHz })),
  stepMHz: r.stepMHz,
  driftMHz: r.driftMHz,
  lock: { modulationMHz: r.lockModulationMHz, modulationIndex: r.lockModulationIndex, orders: r.lockOrders },
  ...laserNoise(r),
});
export const laserInputOf = (r: Laser): LaserInput => {
  const { id: _i, version: _v, createdAt: _c, updatedAt: _u, ...rest } = laserDto(r);
  return rest;
};
export const laserValues = (i: LaserInput) => ({
  key: i.key,
  carrierTHz: i.carrierTHz,
  carrierPowerMW: i.carrierPowerMW,
  loPowerMW: i.loPowerMW,
  reach: i.reach.map((x) => ({ minGHz: x.minGHz, maxGHz: x.maxGHz })),
  stepMHz: i.stepMHz,
  driftMHz: i.driftMHz,
  lockModulationMHz: i.lock.modulationMHz,
  lockModulationIndex: i.lock.modulationIndex,
  lockOrders: i.lock.orders,
  ...laserNoise(i),
});

export const resonatorDto = (r: Resonator) => ({
  ...stamps(r),
  key: r.key,
  fsrGHz: r.fsrGHz,
  loadedQ: r.loadedQ,
  fsrShiftMHzPerK: r.fsrShiftMHzPerK,
  ...resonatorNoise(r),
});
export const resonatorInputOf = (r: Resonator): ResonatorInput => ({
  key: r.key,
  fsrGHz: r.fsrGHz,
  loadedQ: r.loadedQ,
  fsrShiftMHzPerK: r.fsrShiftMHzPerK,
  ...resonatorNoise(r),
});
export const resonatorValues = (i: ResonatorInput) => ({
  key: i.key,
  fsrGHz: i.fsrGHz,
  loadedQ: i.loadedQ,
  fsrShiftMHzPerK: i.fsrShiftMHzPerK,
  ...resonatorNoise(i),
});

export const detectorDto = (r: Detector) => ({
  ...stamps(r),
  key: r.key,
  minGHz: r.minGHz,
  maxGHz: r.maxGHz,
  maxInputMW: r.maxInputMW,
  sampleRateGHz: r.sampleRateGHz,
  ...detectorNoise(r),
});
export const detectorInputOf = (r: Detector): DetectorInput => ({
  key: r.key,
  minGHz: r.minGHz,
  maxGHz: r.maxGHz,
  maxInputMW: r.maxInputMW,
  sampleRateGHz: r.sampleRateGHz,
  ...detectorNoise(r),
});
export const detectorValues = (i: DetectorInput) => ({ ...i });

export const chainDto = (r: Chain) => ({
  ...stamps(r),
  key: r.key,
  laserId: r.laserId,
  resonatorId: r.resonatorId,
  detectorId: r.detectorId,
  mode: r.mode,
  sideband: r.sideband,
  loOffsetGHz: r.loOffsetGHz,
  rfInput: { minGHz: r.rfInputMinGHz, maxGHz: r.rfInputMaxGHz },
  tapFraction: r.tapFraction,
  pathLossDB: r.pathLossDB,
  carrierRejectionDB: r.carrierRejectionDB,
  sharedIf: r.sharedIf,
  temperatureExcursionK: r.temperatureExcursionK,
  ...chainNoise(r),
});
export const chainInputOf = (r: Chain): ChainInput => {
  const { id: _i, version: _v, createdAt: _c, updatedAt: _u, ...rest } = chainDto(r);
  return rest;
};
export const chainValues = (i: ChainInput) => ({
  key: i.key,
  laserId: i.laserId,
  resonatorId: i.resonatorId,
  detectorId: i.detectorId,
  mode: i.mode,
  sideband: i.sideband,
  loOffsetGHz: i.loOffsetGHz,
  rfInputMinGHz: i.rfInput.minGHz,
  rfInputMaxGHz: i.rfInput.maxGHz,
  tapFraction: i.tapFraction,
  pathLossDB: i.pathLossDB,
  carrierRejectionDB: i.carrierRejectionDB,
  sharedIf: i.sharedIf,
  temperatureExcursionK: i.temperatureExcursionK,
  ...chainNoise(i),
});

/** The measured and required quantities of a channel, in plan-document order (shared by every row ↔ plan mapping). */
export const channelFigures = (
  c: Pick<
    Channel,
    | "centerGHz"
    | "bandwidthMHz"
    | "dsbOffsetGHz"
    | "integrationMs"
    | "antennaK"
    | "receiverK"
    | "gainStability"
    | "requiredNedtK"
    | "ifFilter"
    | "centreToleranceMHz"
  >,
) => ({
  centerGHz: c.centerGHz,
  bandwidthMHz: c.bandwidthMHz,
  dsbOffsetGHz: c.dsbOffsetGHz,
  integrationMs: c.integrationMs,
  antennaK: c.antennaK,
  receiverK: c.receiverK,
  gainStability: c.gainStability,
  requiredNedtK: c.requiredNedtK,
  ifFilter: c.ifFilter,
  centreToleranceMHz: c.centreToleranceMHz,
});

export const channelDto = (r: Channel) => ({
  ...stamps(r),
  key: r.key,
  name: r.name,
  chainId: r.chainId,
  centerGHz: r.centerGHz,
  bandwidthMHz: r.bandwidthMHz,
  dsbOffsetGHz: r.dsbOffsetGHz,
  integrationMs: r.integrationMs,
  antennaK: r.antennaK,
  receiverK: r.receiverK,
  gainStability: r.gainStability,
  requiredNedtK: r.requiredNedtK,
  ifFilter: r.ifFilter,
  centreToleranceMHz: r.centreToleranceMHz,
  ...channelNoise(r),
});
export const channelInputOf = (r: Channel): ChannelInput => {
  const { id: _i, version: _v, createdAt: _c, updatedAt: _u, ...rest } = channelDto(r);
  return rest;
};
export const channelValues = (i: ChannelInput) => ({ ...i });

export const settingsDto = (r: PlanSettingsRow) => ({
  guardMHz: r.guardMHz,
  imageRejectionDB: r.imageRejectionDB,
  spurMaxOrder: r.spurMaxOrder,
  replicaLimitDB: r.replicaLimitDB,
  version: r.version,
  updatedAt: r.updatedAt.toISOString(),
});

export const missionDto = (m: Mission, status: string) => ({
  id: m.id,
  name: m.name,
  description: m.description,
  status,
  version: m.version,
  createdAt: m.createdAt.toISOString(),
  updatedAt: m.updatedAt.toISOString(),
});
