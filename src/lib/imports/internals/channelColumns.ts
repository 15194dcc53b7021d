/** The columns of a channel list CSV, in export order (the plan-document channel fields; `chain` is the chain key). */
export const CHANNEL_COLUMNS = [
  "key",
  "name",
  "chain",
  "centerGHz",
  "bandwidthMHz",
  "dsbOffsetGHz",
  "integrationMs",
  "antennaK",
  "receiverK",
  "gainStability",
  "requiredNedtK",
] as const;

export const REQUIRED_CHANNEL_COLUMNS = [
  "key",
  "name",
  "chain",
  "centerGHz",
  "bandwidthMHz",
  "integrationMs",
  "antennaK",
  "receiverK",
] as const;

export const NUMERIC_CHANNEL_COLUMNS = [
  "centerGHz",
  "bandwidthMHz",
  "dsbOffsetGHz",
  "integrationMs",
  "antennaK",
  "receiverK",
  "gainStability",
  "requiredNedtK",
] as const;

/** Columns whose blank cell means null (or the default 0 for gainStability). */
export const BLANK_ALLOWED = new Set<string>(["dsbOffsetGHz", "gainStability", "requiredNedtK"]);
