import Papa from "papaparse";

/** A problem in an uploaded file, located by row (1 = the header row) and column. */
export interface FileIssue {
  row: number | null;
  column: string | null;
  message: string;
}

/** One data record of a CSV file: its row number (the header is row 1) and its cells by column name. */
export interface CsvRecord {
  row: number;
  cells: Record<string, string>;
}

export type CsvTable = { ok: true; header: string[]; records: CsvRecord[] } | { ok: false; issues: FileIssue[] };

/** The most data rows one file may hold. */
export const MAX_DATA_ROWS = 100_000;

/**
 * Splits CSV text (RFC 4180: comma separated, double-quoted fields) into a
 * header and records. Rows are numbered as a spreadsheet shows them: the
 * header is row 1. Blank lines are skipped but still counted. Checks the
 * required (and, when given, the allowed) columns, duplicate column names, ragged rows and the row limit.
 */
export function readCsv(
  text: string,
  required: readonly string[],
  options: { allowed?: readonly string[]; maxRows?: number } = {},
): CsvTable {
  const maxRows = options.maxRows ?? MAX_DATA_ROWS;
  const body = text.startsWith("\uFEFF") ? text.slice(1) : text;
  if (body.trim() === "") return { ok: false, issues: [{ row: null, column: null, message: "the file is empty" }] };
  const parsed = Papa.parse<string[]>(body, { header: false, skipEmptyLines: false, delimiter: "," });
  const issues: FileIssue[] = [];
  for (const e of parsed.errors) {
    if (e.type === "Quotes")
      issues.push({ row: (e.row ?? 0) + 1, column: null, message: `malformed quoting: ${e.message}` });
  }
  const rows = parsed.data;
  const headerRow = rows[0] ?? [];
  const header = headerRow.map((h) => h.trim());
  if (header.every((h) => h === ""))
    return { ok: false, issues: [{ row: 1, column: null, message: "the first row must name the columns" }] };
  const seen = new Set<string>();
  for (const h of header) {
    if (h === "") issues.push({ row: 1, column: null, message: "a column has no name" });
    else if (seen.has(h)) issues.push({ row: 1, column: h, message: `column ${h} appears twice` });
    seen.add(h);
  }
  for (const r of required) {
    if (!seen.has(r)) issues.push({ row: 1, column: r, message: `missing column ${r}` });
  }
  if (options.allowed) {
    const allowed = new Set(options.allowed);
    for (const h of header)
      if (h !== "" && !allowed.has(h))
        issues.push({
          row: 1,
          column: h,
          message: `unknown column ${h} (the columns are ${options.allowed.join(", ")})`,
        });
  }
  if (issues.length > 0) return { ok: false, issues };
  const records: CsvRecord[] = [];
  for (let i = 1; i < rows.length; i++) {
    const cellsRaw = rows[i] ?? [];
    if (cellsRaw.every((c) => c.trim() === "")) continue;
    if (records.length >= maxRows) {
      return {
        ok: false,
        issues: [{ row: i + 1, column: null, message: `the file has more than ${maxRows} data rows` }],
      };
    }
    if (cellsRaw.length !== header.length) {
      issues.push({
        row: i + 1,
        column: null,
        message: `has ${cellsRaw.length} cells but the header names ${header.length} columns`,
      });
      continue;
    }
    const cells: Record<string, string> = {};
    header.forEach((h, j) => {
      cells[h] = (cellsRaw[j] ?? "").trim();
    });
    records.push({ row: i + 1, cells });
  }
  if (issues.length > 0) return { ok: false, issues };
  if (records.length === 0)
    return { ok: false, issues: [{ row: null, column: null, message: "the file has a header but no data rows" }] };
  return { ok: true, header, records };
}

const DECIMAL = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** A decimal number cell: finite, no hex, no thousands separators. */
export function readNumber(cell: string): { ok: true; value: number } | { ok: false; message: string } {
  if (cell === "") return { ok: false, message: "is empty (a number is required)" };
  if (!DECIMAL.test(cell)) return { ok: false, message: `"${cell.slice(0, 40)}" is not a number` };
  const value = Number(cell);
  if (!Number.isFinite(value)) return { ok: false, message: `"${cell.slice(0, 40)}" is too large` };
  return { ok: true, value };
}
