import Papa from "papaparse";
import { CHANNEL_COLUMNS, TEXT_CHANNEL_COLUMNS, guardText } from "./internals/channel-columns";

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
}

/**
 * Writes channels as the CSV that parseChannelCsv reads back (same columns,
 * numbers in their shortest exact decimal form, null as a blank cell, text
 * that a spreadsheet would run as a formula guarded by an apostrophe), so an
 * export imported again gives the same channels.
 */
export function channelsToCsv(channels: readonly ChannelCsvSource[]): string {
  const data = channels.map((c) =>
    CHANNEL_COLUMNS.map((col) => {
      const v = c[col];
      if (v === null) return "";
      return TEXT_CHANNEL_COLUMNS.has(col) ? guardText(String(v)) : String(v);
    }),
  );
  return Papa.unparse({ fields: [...CHANNEL_COLUMNS], data }, { newline: "\r\n", quotes: false }) + "\r\n";
}
