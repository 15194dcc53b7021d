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

/** The delimiters a file may use; semicolon files write decimal commas (as spreadsheets in many locales do). */
export type Delimiter = "," | ";" | "\t";

/** How the file was read: its delimiter and whether numbers use a decimal comma. */
export interface CsvDialect {
  delimiter: Delimiter;
  decimalComma: boolean;
}

export type CsvTable =
  ({ ok: true; header: string[]; records: CsvRecord[] } & CsvDialect) | { ok: false; issues: FileIssue[] };

/** The most data rows one file may hold. */
export const MAX_DATA_ROWS = 100_000;

const DELIMITER_NAMES: Record<Delimiter, string> = {
  ",": 'commas (",")',
  ";": 'semicolons (";", decimal commas)',
  "\t": "tabs",
};

/** How a message names the dialect: `read with semicolons (";", decimal commas) as the delimiter`. */
export function dialectWords(d: CsvDialect): string {
  return `read with ${DELIMITER_NAMES[d.delimiter]} as the delimiter`;
}

const stripBom = (text: string) => (text.startsWith("\uFEFF") ? text.slice(1) : text);

/** Counts of each candidate delimiter in one line, outside double quotes. */
function delimiterCounts(line: string): Record<Delimiter, number> {
  const counts: Record<Delimiter, number> = { ",": 0, ";": 0, "\t": 0 };
  let quoted = false;
  for (const ch of line) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === "," || ch === ";" || ch === "\t")) counts[ch]++;
  }
  return counts;
}

/**
 * Detects the delimiter from the header row: the candidate (comma,
 * semicolon, tab) it holds most often, comma on a tie. A header of one
 * column holds none; then a file whose other lines hold commas is taken to
 * be a one-column file written with decimal commas (read as semicolon
 * separated), any other as comma separated.
 */
export function detectDialect(text: string): CsvDialect {
  const lines = stripBom(text).split(/\r\n|\n|\r/);
  const headerAt = lines.findIndex((l) => l.trim() !== "");
  const header = headerAt < 0 ? "" : lines[headerAt]!;
  const counts = delimiterCounts(header);
  let best: Delimiter = ",";
  for (const d of [";", "\t"] as const) if (counts[d] > counts[best]) best = d;
  if (counts[best] === 0) {
    const sample = lines.slice(headerAt + 1, headerAt + 51);
    if (sample.some((l) => l.includes(","))) best = ";";
  }
  return { delimiter: best, decimalComma: best === ";" };
}

/**
 * A column name as written, reduced for matching: lower case, a unit in
 * brackets at the end kept as part of the name ("Offset (GHz)" → "offsetghz",
 * "offset [GHz]" too), spaces and underscores removed ("offset_GHz").
 */
export function columnKey(name: string): string {
  const unit = name.match(/^(.*?)\s*[([]\s*([^()[\]]*?)\s*[)\]]\s*$/);
  const joined = unit ? `${unit[1]}${unit[2]}` : name;
  return joined.toLowerCase().replace(/[\s_]+/g, "");
}

/** The header cells with every name that matches a known column (see columnKey) replaced by that column's name. */
function canonicalHeader(cells: string[], known: readonly string[]): string[] {
  const byKey = new Map(known.map((k) => [columnKey(k), k]));
  return cells.map((h) => {
    const t = h.trim();
    return byKey.get(columnKey(t)) ?? t;
  });
}

function parseRows(text: string, dialect: CsvDialect, preview?: number) {
  return Papa.parse<string[]>(stripBom(text), {
    header: false,
    skipEmptyLines: false,
    delimiter: dialect.delimiter,
    ...(preview ? { preview } : {}),
  });
}

/** The header row as readCsv sees it: the detected dialect and the column names matched to `known`. */
export function readCsvHeader(text: string, known: readonly string[]): CsvDialect & { header: string[] } {
  const dialect = detectDialect(text);
  const first = parseRows(text, dialect, 1).data[0] ?? [];
  return { ...dialect, header: canonicalHeader(first, known) };
}

/**
 * Splits CSV text into a header and records, as spreadsheet programs write
 * it: a UTF-8 byte-order mark is dropped, lines may end in CR LF, LF or CR,
 * the delimiter is detected (detectDialect) and column names are matched
 * ignoring case, spaces, underscores and a unit in brackets (columnKey).
 * Fields may be double-quoted (RFC 4180). Rows are numbered as a
 * spreadsheet shows them: the header is row 1; blank lines are skipped but
 * still counted. Checks the required (and, when given, the allowed)
 * columns, duplicate column names, ragged rows and the row limit; a message
 * about the columns names the delimiter it read and the header row it found.
 */
export function readCsv(
  text: string,
  required: readonly string[],
  options: { allowed?: readonly string[]; maxRows?: number } = {},
): CsvTable {
  const maxRows = options.maxRows ?? MAX_DATA_ROWS;
  if (stripBom(text).trim() === "")
    return { ok: false, issues: [{ row: null, column: null, message: "the file is empty" }] };
  const dialect = detectDialect(text);
  const parsed = parseRows(text, dialect);
  const issues: FileIssue[] = [];
  for (const e of parsed.errors) {
    if (e.type === "Quotes")
      issues.push({ row: (e.row ?? 0) + 1, column: null, message: `malformed quoting: ${e.message}` });
  }
  const rows = parsed.data;
  const headerRow = rows[0] ?? [];
  const header = canonicalHeader(headerRow, [...required, ...(options.allowed ?? [])]);
  if (header.every((h) => h === ""))
    return { ok: false, issues: [{ row: 1, column: null, message: "the first row must name the columns" }] };
  const found = `the file was ${dialectWords(dialect)}; its header row 1 names ${headerRow
    .map((h) => JSON.stringify(h.trim().slice(0, 40)))
    .join(", ")
    .slice(0, 300)}`;
  const seen = new Set<string>();
  for (const h of header) {
    if (h === "") issues.push({ row: 1, column: null, message: "a column has no name" });
    else if (seen.has(h)) issues.push({ row: 1, column: h, message: `column ${h} appears twice` });
    seen.add(h);
  }
  for (const r of required) {
    if (!seen.has(r)) issues.push({ row: 1, column: r, message: `missing column ${r} (${found})` });
  }
  if (options.allowed) {
    const allowed = new Set(options.allowed);
    for (const h of header)
      if (h !== "" && !allowed.has(h))
        issues.push({
          row: 1,
          column: h,
          message: `unknown column ${h} (the columns are ${options.allowed.join(", ")}; ${found})`,
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
        message: `has ${cellsRaw.length} cells but the header names ${header.length} columns (${dialectWords(dialect)})`,
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
  return { ok: true, header, records, ...dialect };
}

const DECIMAL = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/**
 * A decimal number cell: finite, no hex, no thousands separators. With
 * `decimalComma` (a semicolon file) the decimal mark may be a comma
 * ("150,01"); a point is read too, but not both in one cell.
 */
export function readNumber(
  cell: string,
  decimalComma = false,
): { ok: true; value: number } | { ok: false; message: string } {
  if (cell === "") return { ok: false, message: "is empty (a number is required)" };
  const written = decimalComma && !cell.includes(".") ? cell.replace(",", ".") : cell;
  if (!DECIMAL.test(written)) return { ok: false, message: `"${cell.slice(0, 40)}" is not a number` };
  const value = Number(written);
  if (!Number.isFinite(value)) return { ok: false, message: `"${cell.slice(0, 40)}" is too large` };
  return { ok: true, value };
}
