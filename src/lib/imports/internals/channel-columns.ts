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

/** The text columns; every other column holds a number. */
const TEXT = ["key", "name", "chain"] as const;
/** The columns whose blank cell means null (or the default 0 for gainStability); every other column is required. */
const BLANK = ["dsbOffsetGHz", "gainStability", "requiredNedtK"] as const;

type Column = (typeof CHANNEL_COLUMNS)[number];
/** The channel columns but `drop`, in export order. */
const columnsWithout = <E extends Column>(drop: readonly E[]) =>
  CHANNEL_COLUMNS.filter((c): c is Exclude<Column, E> => !(drop as readonly Column[]).includes(c));

export const REQUIRED_CHANNEL_COLUMNS = columnsWithout(BLANK);
export const NUMERIC_CHANNEL_COLUMNS = columnsWithout(TEXT);

/**
 * Optional text columns in the notation of sounder channel tables:
 * `notation` ("183.31 ± 7.0", "183.311 ± 3.00 GHz, 2 × 1000 MHz") gives the
 * centre, DSB offset and (when written) the bandwidth; `bandwidth`
 * ("2 × 500 MHz", "500 MHz") gives the width of each passband.
 */
export const NOTATION_CHANNEL_COLUMNS = ["notation", "bandwidth"] as const;

/** Columns whose blank cell means null (or the default 0 for gainStability). */
export const BLANK_ALLOWED = new Set<string>([...BLANK, ...ENVELOPE_CHANNEL_COLUMNS]);

/** Text columns of the channel CSV. */
export const TEXT_CHANNEL_COLUMNS = new Set<string>(TEXT);

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
