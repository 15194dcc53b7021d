/** Request bodies of the workspace entities (invented demo values) for the integration tests. */
import { demoChain, demoLaser } from "../fixtures/demo-values";

let n = 0;
export const uniqueKey = (prefix: string) => `${prefix}${Date.now().toString(36)}${(n++).toString(36)}`;

export const laserBody = (key = uniqueKey("L")) => ({
  key,
  ...demoLaser(),
  driftMHz: 20,
});

export const resonatorBody = (key = uniqueKey("R")) => ({ key, fsrGHz: 183.31, loadedQ: 1e7 });

export const detectorBody = (key = uniqueKey("D")) => ({
  key,
  minGHz: 0.05,
  maxGHz: 6,
  maxInputMW: 5,
  sampleRateGHz: null,
});

export const chainBody = (ids: { laserId: string; resonatorId: string; detectorId: string }, key = uniqueKey("C")) => ({
  key,
  ...ids,
  ...demoChain(),
});

export const channelBody = (chainId: string, key = uniqueKey("ch")) => ({
  key,
  name: `channel ${key}`,
  chainId,
  centerGHz: 183.31,
  bandwidthMHz: 10,
  integrationMs: 10,
  antennaK: 250,
  receiverK: 5000,
  requiredNedtK: 20,
});

export const TUNING_CSV = "setpointMA,offsetGHz\n1,150\n2,150.01\n3,150.02\n4,170\n5,170.01\n";
export const DETECTOR_CSV = "frequencyGHz,responseDB\n0.01,-9\n0.05,-2\n1,0\n5,-1.5\n6,-2.8\n7,-7\n";
export const CHANNELS_CSV_HEADER =
  "key,name,chain,centerGHz,bandwidthMHz,dsbOffsetGHz,integrationMs,antennaK,receiverK,gainStability,requiredNedtK";
