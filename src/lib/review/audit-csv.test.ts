import { describe, expect, it } from "vitest";
import fc from "fast-check";
import Papa from "papaparse";
import { auditCsv, AUDIT_CSV_HEADER, type AuditCsvRow } from "./audit-csv";

const row = (over: Partial<AuditCsvRow> = {}): AuditCsvRow => ({
  at: new Date("2026-12-01T10:00:00.000Z"),
  actorName: "Ada",
  actorId: "u1",
  missionName: "Demo sounder",
  missionId: "m1",
  action: "review-submit",
  entity: "revision 3",
  summary: "Submitted revision 3 for review",
  revisionBefore: 3,
  revisionAfter: 3,
  ...over,
});

describe("auditCsv", () => {
  it("header and one quoted line (RFC 4180)", () => {
    expect(auditCsv([row({ summary: 'said "ok", then left' })])).toBe(
      `${AUDIT_CSV_HEADER.join(",")}\r\n2026-12-01T10:00:00.000Z,Ada,u1,Demo sounder,m1,review-submit,revision 3,"said ""ok"", then left",3,3\r\n`,
    );
  });
  it("formula-looking text is defused and nulls are empty", () => {
    const csv = auditCsv([
      row({ actorName: "=HYPERLINK(1)", missionName: null, missionId: null, revisionBefore: null }),
    ]);
    expect(csv.split("\r\n")[1]).toBe(
      "2026-12-01T10:00:00.000Z,'=HYPERLINK(1),u1,,,review-submit,revision 3,Submitted revision 3 for review,,3",
    );
  });
  it("property: an independent CSV parser (papaparse) reads back every field", () => {
    const text = fc.string({ maxLength: 20 });
    fc.assert(
      fc.property(fc.array(fc.record({ actorName: text, summary: text, entity: text }), { maxLength: 5 }), (parts) => {
        const rows = parts.map((p) => row(p));
        const parsed = Papa.parse<string[]>(auditCsv(rows), { delimiter: ",", newline: "\r\n", skipEmptyLines: false });
        const data = parsed.data.filter((r) => !(r.length === 1 && r[0] === ""));
        expect(data[0]).toEqual([...AUDIT_CSV_HEADER]);
        expect(data).toHaveLength(rows.length + 1);
        rows.forEach((r, i) => {
          const undo = (s: string) => (s.startsWith("'") ? s.slice(1) : s);
          expect(undo(data[i + 1]![1]!)).toBe(r.actorName);
          expect(undo(data[i + 1]![6]!)).toBe(r.entity);
          expect(undo(data[i + 1]![7]!)).toBe(r.summary);
        });
      }),
    );
  });
});
