import Papa from "papaparse";
import {
  CHANNEL_COLUMNS,
  ENVELOPE_CHANNEL_COLUMNS,
  TEXT_CHANNEL_COLUMNS,
  guardText,
} from "./internals/channel-columns";

export interface ChannelCsvSource {
  key: string;
  name: string;
  chain: string;
  centerGHz: number;
  bandwidthMHz: number;
  dsbOffsetGHz: number | null;
  integrationMs: number;
  antennaK: number;
  receiverK: number;
  gainStability: number;
  requiredNedtK: number | null;
  /** Plan format 2; "slot" when left out. */
  ifFilter?: "slot" | "occupied";
  /** Plan format 2; null (none) when left out. */
  centreToleranceMHz?: number | null;
}

/** A channel whose version 2 fields differ from their defaults (so the file needs their columns). */
const usesEnvelopeFields = (c: ChannelCsvSource) =>
  (c.ifFilter !== undefined && c.ifFilter !== "slot") ||
  (c.centreToleranceMHz !== undefined && c.centreToleranceMHz !== null);

/**
 * Writes channels as the CSV that parseChannelCsv reads back (same columns,
 * numbers in their shortest exact decimal form, null as a blank cell, text
 * that a spreadsheet would run as a formula guarded by an apostrophe), so an
 * export imported again gives the same channels. The columns of plan format
 * 2 (`ifFilter`, `centreToleranceMHz`) follow when any channel sets one of
 * them; a file without them is exactly the version 1 file.
 */
export function channelsToCsv(channels: readonly ChannelCsvSource[]): string {
  const columns = channels.some(usesEnvelopeFields)
    ? [...CHANNEL_COLUMNS, ...ENVELOPE_CHANNEL_COLUMNS]
    : [...CHANNEL_COLUMNS];
  const data = channels.map((c) =>
    columns.map((col) => {
      const v = c[col];
      if (v === null || v === undefined) return "";
      return TEXT_CHANNEL_COLUMNS.has(col) ? guardText(String(v)) : String(v);
    }),
  );
  return Papa.unparse({ fields: columns, data }, { newline: "\r\n", quotes: false }) + "\r\n";
}
