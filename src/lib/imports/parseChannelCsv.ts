import { channelSchema, type ChannelInput } from "@/schemas/workspace";
import { readCsv, readNumber, type FileIssue } from "./internals/csv";
import {
  BLANK_ALLOWED,
  CHANNEL_COLUMNS,
  NUMERIC_CHANNEL_COLUMNS,
  REQUIRED_CHANNEL_COLUMNS,
  unguardText,
} from "./internals/channelColumns";

export interface ChannelCsvRow {
  row: number;
  /** The channel as the create form takes it, with `chain` (the chain key) beside `chainId`; absent when the row has errors. */
  channel?: ChannelInput & { chain: string };
  errors: { column: string; message: string }[];
}

export type ChannelCsvParse = { ok: true; rows: ChannelCsvRow[]; valid: boolean } | { ok: false; issues: FileIssue[] };

/**
 * Reads a channel list CSV whose header names the channel fields
 * (CHANNEL_COLUMNS; `chain` holds the chain key) and validates every row on
 * its own: numbers, the channel form's rules, a known chain and keys that
 * do not repeat within the file. File-level problems (empty, not CSV,
 * missing or unknown columns, too many rows) refuse the whole file; row
 * problems are listed per row and column, and `valid` is true only when no
 * row has one.
 */
export function parseChannelCsv(text: string, chains: readonly { id: string; key: string }[]): ChannelCsvParse {
  const table = readCsv(text, REQUIRED_CHANNEL_COLUMNS, { allowed: CHANNEL_COLUMNS });
  if (!table.ok) return table;
  const chainByKey = new Map(chains.map((c) => [c.key, c.id]));
  const firstRowOfKey = new Map<string, number>();
  const rows: ChannelCsvRow[] = table.records.map((rec) => {
    const errors: ChannelCsvRow["errors"] = [];
    const input: Record<string, unknown> = { key: unguardText(rec.cells.key ?? ""), name: unguardText(rec.cells.name ?? "") };
    for (const col of NUMERIC_CHANNEL_COLUMNS) {
      const cell = rec.cells[col] ?? "";
      if (cell === "" && BLANK_ALLOWED.has(col)) continue;
      const n = readNumber(cell);
      if (n.ok) input[col] = n.value;
      else errors.push({ column: col, message: n.message });
    }
    const chainKey = unguardText(rec.cells.chain ?? "");
    const chainId = chainByKey.get(chainKey);
    if (chainKey === "") errors.push({ column: "chain", message: "is empty (a chain key is required)" });
    else if (!chainId) errors.push({ column: "chain", message: `no chain has the key "${chainKey.slice(0, 64)}"` });
    input.chainId = chainId ?? "00000000-0000-4000-8000-000000000000";
    const parsed = channelSchema.safeParse(input);
    if (!parsed.success) {
      for (const iss of parsed.error.issues) {
        const col = String(iss.path[0] ?? "");
        if (col === "chainId") continue;
        if (errors.some((e) => e.column === col)) continue;
        errors.push({ column: col, message: iss.message });
      }
    }
    const key = String(input.key).trim();
    const earlier = firstRowOfKey.get(key);
    if (key !== "" && earlier !== undefined)
      errors.push({ column: "key", message: `repeats the key of row ${earlier}` });
    else if (key !== "") firstRowOfKey.set(key, rec.row);
    errors.sort((a, b) => CHANNEL_COLUMNS.indexOf(a.column as never) - CHANNEL_COLUMNS.indexOf(b.column as never));
    if (errors.length > 0 || !parsed.success) return { row: rec.row, errors };
    return { row: rec.row, channel: { ...parsed.data, chain: chainKey }, errors };
  });
  return { ok: true, rows, valid: rows.every((r) => r.errors.length === 0) };
}
