import { readCsv, readNumber, type FileIssue } from "./internals/csv";
import { mergeReach } from "./merge-reach";

export interface TuningMapPreview {
  intervals: { minGHz: number; maxGHz: number }[];
  /** Number of measured offsets used. */
  points: number;
  /** Offsets that no other lies within the gap of (not reachable intervals on their own). */
  isolatedGHz: number[];
  /** Rows left out because their offsetGHz cell is blank (no measurement at that setpoint). */
  rejectedRows: { row: number; message: string }[];
}

export type TuningMapParse = ({ ok: true } & TuningMapPreview) | { ok: false; issues: FileIssue[] };

/**
 * Reads a tuning map CSV: a header row with an `offsetGHz` column (the
 * measured laser-pair offset ν_LO − ν_c, one per row; other columns such as
 * setpoints are ignored) and merges the offsets closer than `gapMHz` into
 * reach intervals (the file as spreadsheets write it: see readCsv — a
 * semicolon file with decimal commas, `Offset (GHz)` for the column). A blank offset marks a setpoint with no measurement and
 * is listed in `rejectedRows`; anything else that is not a number is an issue
 * naming its row and column, and the whole file is refused.
 */
export function parseTuningMap(text: string, gapMHz: number): TuningMapParse {
  const table = readCsv(text, ["offsetGHz"]);
  if (!table.ok) return table;
  const issues: FileIssue[] = [];
  const rejectedRows: TuningMapPreview["rejectedRows"] = [];
  const points: number[] = [];
  for (const rec of table.records) {
    const cell = rec.cells.offsetGHz ?? "";
    if (cell === "") {
      rejectedRows.push({ row: rec.row, message: "no measured offset" });
      continue;
    }
    const n = readNumber(cell, table.decimalComma);
    if (!n.ok) issues.push({ row: rec.row, column: "offsetGHz", message: n.message });
    else points.push(n.value);
  }
  if (issues.length > 0) return { ok: false, issues };
  if (points.length === 0)
    return { ok: false, issues: [{ row: null, column: "offsetGHz", message: "no row holds a measured offset" }] };
  const merged = mergeReach(points, gapMHz / 1000);
  return {
    ok: true,
    intervals: merged.intervals,
    points: points.length,
    isolatedGHz: merged.isolatedGHz,
    rejectedRows,
  };
}
