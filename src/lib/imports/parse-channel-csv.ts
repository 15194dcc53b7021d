import { parseChannelNotation } from "@/lib/optics";
import { channelSchema, type ChannelInput } from "@/schemas/workspace";
import { readCsv, readCsvHeader, readNumber, type FileIssue } from "./internals/csv";
import {
  BLANK_ALLOWED,
  CHANNEL_COLUMNS,
  ENVELOPE_CHANNEL_COLUMNS,
  type EnvelopeChannelColumn,
  NOTATION_CHANNEL_COLUMNS,
  NUMERIC_CHANNEL_COLUMNS,
  REQUIRED_CHANNEL_COLUMNS,
  unguardText,
} from "./internals/channel-columns";

export interface ChannelCsvRow {
  row: number;
  /** The channel as the create form takes it, with `chain` (the chain key) beside `chainId`; absent when the row has errors. */
  channel?: ChannelInput & { chain: string };
  errors: { column: string; message: string }[];
}

export type ChannelCsvParse =
  | {
      ok: true;
      rows: ChannelCsvRow[];
      valid: boolean;
      /**
       * The optional columns of plan format 2 the file does not have: each
       * row carries their default, and an update keeps the stored value.
       */
      keptColumns: EnvelopeChannelColumn[];
    }
  | { ok: false; issues: FileIssue[] };

/**
 * Reads a channel list CSV whose header names the channel fields
 * (CHANNEL_COLUMNS; `chain` holds the chain key; matched as readCsv does,
 * so `Center (GHz)` or `center_GHz` name centerGHz, and a semicolon file's
 * decimal commas are read) and validates every row on
 * its own: numbers, the channel form's rules, a known chain and keys that
 * do not repeat within the file. File-level problems (empty, not CSV,
 * missing or unknown columns, too many rows) refuse the whole file; row
 * problems are listed per row and column, and `valid` is true only when no
 * row has one.
 *
 * Optional `notation` and `bandwidth` text columns take a channel as sounder
 * tables write it (NOTATION_CHANNEL_COLUMNS): with `notation`, the centerGHz
 * and bandwidthMHz columns may be left out, with `bandwidth` the
 * bandwidthMHz column. A row gives each quantity one way only; errors of
 * these cells name the text column.
 *
 * Optional `ifFilter` ("slot" or "occupied") and `centreToleranceMHz`
 * columns give the channel fields of plan format 2 (blank: the default);
 * `keptColumns` lists those the file leaves out.
 */
export function parseChannelCsv(text: string, chains: readonly { id: string; key: string }[]): ChannelCsvParse {
  const head = new Set(readCsvHeader(text, COLUMN_ORDER).header);
  const hasNotation = head.has("notation");
  const hasBandwidth = head.has("bandwidth");
  const required = REQUIRED_CHANNEL_COLUMNS.filter(
    (c) => !(c === "centerGHz" && hasNotation) && !(c === "bandwidthMHz" && (hasNotation || hasBandwidth)),
  );
  const table = readCsv(text, required, { allowed: COLUMN_ORDER });
  if (!table.ok) return table;
  const chainByKey = new Map(chains.map((c) => [c.key, c.id]));
  const firstRowOfKey = new Map<string, number>();
  const rows: ChannelCsvRow[] = table.records.map((rec) => {
    const errors: ChannelCsvRow["errors"] = [];
    const input: Record<string, unknown> = {
      key: unguardText(rec.cells.key ?? ""),
      name: unguardText(rec.cells.name ?? ""),
    };
    // A semicolon file writes decimal commas in the text columns too ("183,31 ± 7,0").
    const decimal = (cell: string | undefined) =>
      table.decimalComma ? (cell ?? "").replace(/(\d),(\d)/g, "$1.$2") : (cell ?? "");
    const cells = { ...rec.cells, notation: decimal(rec.cells.notation), bandwidth: decimal(rec.cells.bandwidth) };
    const notation = cells.notation;
    const bwText = cells.bandwidth;
    /** Which text column a numeric field came from (to name it in errors). */
    const source = new Map<string, string>();
    if (notation !== "") {
      source.set("centerGHz", "notation").set("dsbOffsetGHz", "notation").set("bandwidthMHz", "notation");
    }
    if (bwText !== "") source.set("bandwidthMHz", "bandwidth");
    for (const col of NUMERIC_CHANNEL_COLUMNS) {
      const cell = rec.cells[col] ?? "";
      if (cell === "" && (BLANK_ALLOWED.has(col) || source.has(col))) continue;
      const n = readNumber(cell, table.decimalComma);
      if (n.ok) input[col] = n.value;
      else errors.push({ column: col, message: n.message });
    }
    const tolerance = rec.cells.centreToleranceMHz ?? "";
    if (tolerance !== "") {
      const n = readNumber(tolerance, table.decimalComma);
      if (n.ok) input.centreToleranceMHz = n.value;
      else errors.push({ column: "centreToleranceMHz", message: n.message });
    }
    const filter = (rec.cells.ifFilter ?? "").trim();
    if (filter !== "") input.ifFilter = filter;
    errors.push(...readNotationCells(cells, input));
    const chainKey = unguardText(rec.cells.chain ?? "");
    const chainId = chainByKey.get(chainKey);
    if (chainKey === "") errors.push({ column: "chain", message: "is empty (a chain key is required)" });
    else if (!chainId) errors.push({ column: "chain", message: `no chain has the key "${chainKey.slice(0, 64)}"` });
    input.chainId = chainId ?? "00000000-0000-4000-8000-000000000000";
    const parsed = channelSchema.safeParse(input);
    if (!parsed.success) {
      for (const iss of parsed.error.issues) {
        const field = String(iss.path[0] ?? "");
        if (field === "chainId") continue;
        const col = source.get(field) ?? field;
        if (errors.some((e) => e.column === col)) continue;
        // A field the text cells failed to give has its error on that cell already.
        if (source.has(field) && errors.some((e) => e.column === "notation" || e.column === "bandwidth")) continue;
        errors.push({ column: col, message: col === field ? iss.message : `${field} ${iss.message}` });
      }
    }
    const key = String(input.key).trim();
    const earlier = firstRowOfKey.get(key);
    if (key !== "" && earlier !== undefined)
      errors.push({ column: "key", message: `repeats the key of row ${earlier}` });
    else if (key !== "") firstRowOfKey.set(key, rec.row);
    errors.sort((a, b) => COLUMN_ORDER.indexOf(a.column) - COLUMN_ORDER.indexOf(b.column));
    if (errors.length > 0 || !parsed.success) return { row: rec.row, errors };
    return { row: rec.row, channel: { ...parsed.data, chain: chainKey }, errors };
  });
  const keptColumns = ENVELOPE_CHANNEL_COLUMNS.filter((c) => !head.has(c));
  return { ok: true, rows, valid: rows.every((r) => r.errors.length === 0), keptColumns };
}

const COLUMN_ORDER: readonly string[] = [...CHANNEL_COLUMNS, ...ENVELOPE_CHANNEL_COLUMNS, ...NOTATION_CHANNEL_COLUMNS];

const ONE_WAY = "give it in one column only";

/**
 * Reads the `notation` and `bandwidth` cells of one row into `input`
 * (centerGHz, dsbOffsetGHz, bandwidthMHz) with the optics parser, and
 * returns the errors, each naming its column.
 */
function readNotationCells(
  cells: Record<string, string>,
  input: Record<string, unknown>,
): { column: string; message: string }[] {
  const notation = cells.notation ?? "";
  const bwText = cells.bandwidth ?? "";
  const bwMHzCell = cells.bandwidthMHz ?? "";
  const errors: { column: string; message: string }[] = [];
  if (bwText !== "" && bwMHzCell !== "") {
    errors.push({ column: "bandwidth", message: `and bandwidthMHz are both filled in; ${ONE_WAY}` });
    return errors;
  }
  if (notation !== "") {
    for (const col of ["centerGHz", "dsbOffsetGHz"] as const) {
      if ((cells[col] ?? "") !== "")
        errors.push({ column: "notation", message: `and ${col} are both filled in; ${ONE_WAY}` });
    }
    if (errors.length > 0) return errors;
    const fallback = bwText !== "" ? bwText : typeof input.bandwidthMHz === "number" ? input.bandwidthMHz : null;
    const r = parseChannelNotation(notation, { bandwidth: fallback });
    if (!r.ok) {
      const column = r.error.part === "bandwidth" && bwText !== "" ? "bandwidth" : "notation";
      errors.push({ column, message: r.error.message });
      return errors;
    }
    input.centerGHz = r.value.centerGHz;
    input.dsbOffsetGHz = r.value.dsbOffsetGHz;
    input.bandwidthMHz = r.value.bandwidthMHz;
    return errors;
  }
  if (bwText !== "") {
    // The centre and offset come from their own columns; the parser reads the bandwidth against them.
    if (typeof input.centerGHz !== "number") return errors; // centerGHz already has its own error
    const written =
      input.dsbOffsetGHz === undefined
        ? String(input.centerGHz)
        : `${String(input.centerGHz)} ± ${String(input.dsbOffsetGHz)}`;
    const r = parseChannelNotation(written, { bandwidth: bwText });
    if (!r.ok) errors.push({ column: "bandwidth", message: r.error.message });
    else input.bandwidthMHz = r.value.bandwidthMHz;
  }
  return errors;
}
