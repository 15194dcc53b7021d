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

/**
 * Optional columns of the fields plan format 2 adds to a channel
 * (docs/plan-format.md §12.1): `ifFilter` ("slot" or "occupied", blank for
 * "slot") and `centreToleranceMHz` (blank for none). The export writes them
 * only when some channel differs from the default; a file without one of
 * them leaves that field of an updated channel as stored.
 */
export const ENVELOPE_CHANNEL_COLUMNS = ["ifFilter", "centreToleranceMHz"] as const;
export type EnvelopeChannelColumn = (typeof ENVELOPE_CHANNEL_COLUMNS)[number];

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

/**
 * Optional text columns in the notation of sounder channel tables:
 * `notation` ("183.31 ± 7.0", "183.311 ± 3.00 GHz, 2 × 1000 MHz") gives the
 * centre, DSB offset and (when written) the bandwidth; `bandwidth`
 * ("2 × 500 MHz", "500 MHz") gives the width of each passband.
 */
export const NOTATION_CHANNEL_COLUMNS = ["notation", "bandwidth"] as const;

/** Columns whose blank cell means null (or the default 0 for gainStability). */
export const BLANK_ALLOWED = new Set<string>([
  "dsbOffsetGHz",
  "gainStability",
  "requiredNedtK",
  "ifFilter",
  "centreToleranceMHz",
]);

/** Text columns of the channel CSV. */
export const TEXT_CHANNEL_COLUMNS = new Set<string>(["key", "name", "chain"]);

/**
 * Spreadsheet formula guard (OWASP, "CSV Injection"): a text cell starting
 * with = + - @ or a tab/carriage return (after any apostrophes) is written
 * with one more leading apostrophe, which spreadsheets show as text; the
 * reader removes exactly that apostrophe, so the pair is a bijection.
 */
const GUARDED = /^'*[=+\-@\t\r]/;
export function guardText(cell: string): string {
  return GUARDED.test(cell) ? `'${cell}` : cell;
}
export function unguardText(cell: string): string {
  return cell.startsWith("'") && GUARDED.test(cell.slice(1)) ? cell.slice(1) : cell;
}
