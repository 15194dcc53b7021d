import { readCsv, readNumber, type FileIssue } from "./internals/csv";
import { usableBand, type ResponsePoint, type UsableBand } from "./usable-band";

export type DetectorResponseParse = ({ ok: true; points: number } & UsableBand) | { ok: false; issues: FileIssue[] };

/**
 * Reads a measured detector response CSV (`frequencyGHz,responseDB`, one
 * sample per row, frequencies ≥ 0 and distinct) and returns the usable band
 * where the response is within `dropDB` of its peak (see usableBand).
 */
export function parseDetectorResponse(text: string, dropDB: number): DetectorResponseParse {
  const table = readCsv(text, ["frequencyGHz", "responseDB"]);
  if (!table.ok) return table;
  const issues: FileIssue[] = [];
  const points: ResponsePoint[] = [];
  const rowOf = new Map<number, number>();
  for (const rec of table.records) {
    const f = readNumber(rec.cells.frequencyGHz ?? "", table.decimalComma);
    const r = readNumber(rec.cells.responseDB ?? "", table.decimalComma);
    if (!f.ok) issues.push({ row: rec.row, column: "frequencyGHz", message: f.message });
    else if (f.value < 0) issues.push({ row: rec.row, column: "frequencyGHz", message: "must be 0 or more" });
    else if (rowOf.has(f.value))
      issues.push({
        row: rec.row,
        column: "frequencyGHz",
        message: `repeats the frequency of row ${rowOf.get(f.value)}`,
      });
    if (!r.ok) issues.push({ row: rec.row, column: "responseDB", message: r.message });
    if (f.ok && f.value >= 0 && !rowOf.has(f.value)) {
      rowOf.set(f.value, rec.row);
      if (r.ok) points.push({ frequencyGHz: f.value, responseDB: r.value });
    }
  }
  if (issues.length > 0) return { ok: false, issues };
  const band = usableBand(points, dropDB);
  if (!band)
    return {
      ok: false,
      issues: [
        {
          row: null,
          column: "responseDB",
          message: `fewer than two samples lie within ${dropDB} dB of the peak: the usable band has no width`,
        },
      ],
    };
  return { ok: true, points: points.length, ...band };
}
