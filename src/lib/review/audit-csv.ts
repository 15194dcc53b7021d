export interface AuditCsvRow {
  at: Date | string;
  actorName: string;
  actorId: string;
  missionName: string | null;
  missionId: string | null;
  action: string;
  entity: string;
  summary: string;
  revisionBefore: number | null;
  revisionAfter: number | null;
}

export const AUDIT_CSV_HEADER = [
  "at_utc",
  "person",
  "person_id",
  "mission",
  "mission_id",
  "action",
  "entity",
  "summary",
  "revision_before",
  "revision_after",
] as const;

/**
 * One CSV field (RFC 4180: quoted when it holds a comma, quote or line
 * break; quotes doubled). A text starting with = + - @ or a tab is prefixed
 * with an apostrophe so that spreadsheets do not run it as a formula
 * (OWASP, "CSV Injection"); a text that already starts with an apostrophe
 * gets one too, so that removing one leading apostrophe always restores it.
 */
function field(v: string | number | null): string {
  if (v === null) return "";
  let s = String(v);
  if (typeof v === "string" && /^[=+\-@\t\r']/.test(s)) s = `'${s}`;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** The audit trail as CSV text (header line, one line per row, CRLF line ends, times in ISO 8601 UTC). */
export function auditCsv(rows: readonly AuditCsvRow[]): string {
  const lines = [AUDIT_CSV_HEADER.join(",")];
  for (const r of rows) {
    const at = typeof r.at === "string" ? r.at : r.at.toISOString();
    lines.push(
      [
        at,
        r.actorName,
        r.actorId,
        r.missionName,
        r.missionId,
        r.action,
        r.entity,
        r.summary,
        r.revisionBefore,
        r.revisionAfter,
      ]
        .map(field)
        .join(","),
    );
  }
  return lines.join("\r\n") + "\r\n";
}
