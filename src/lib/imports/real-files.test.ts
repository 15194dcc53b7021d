import fc from "fast-check";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { parseChannelCsv } from "./parse-channel-csv";
import { parseDetectorResponse } from "./parse-detector-response";
import { parseTuningMap } from "./parse-tuning-map";
import { columnKey, detectDialect } from "./internals/csv";

// Files as spreadsheet programs write them (issue 17, point 7): a byte-order
// mark, CR LF line ends, semicolons with decimal commas, tabs, and column
// names in another spelling or with a unit in brackets.

const CHAINS = [{ id: "11111111-1111-4111-8111-111111111111", key: "A" }];
const RESPONSE = "frequencyGHz,responseDB\n0.05,-6\n0.1,-2.5\n1,0\n5,-1\n6,-2.9\n7,-8\n";
const RESPONSE_ANSWER = { ok: true, points: 6, minGHz: 0.1, maxGHz: 6, peakDB: 0, peakGHz: 1 };

/** The same table with another delimiter (and decimal commas for semicolons), CR LF line ends and a BOM. */
function rewrite(csv: string, delimiter: ";" | "\t"): string {
  const rows = Papa.parse<string[]>(csv.trim(), { delimiter: "," }).data;
  const cells = rows.map((r) => r.map((c) => (delimiter === ";" ? c.replace(".", ",") : c)));
  return "\uFEFF" + Papa.unparse(cells, { delimiter, newline: "\r\n" });
}

describe("delimiters", () => {
  it("detects comma, semicolon (with decimal commas) and tab from the header row", () => {
    expect(detectDialect("a,b,c\n1,2,3")).toEqual({ delimiter: ",", decimalComma: false });
    expect(detectDialect("\uFEFFa;b;c\r\n1,5;2;3")).toEqual({ delimiter: ";", decimalComma: true });
    expect(detectDialect("a\tb\tc\n1\t2\t3")).toEqual({ delimiter: "\t", decimalComma: false });
    // Commas inside quotes do not count.
    expect(detectDialect('"a,b,c";d;e\n1;2;3')).toEqual({ delimiter: ";", decimalComma: true });
    // One column: decimal commas in the data mean a semicolon file.
    expect(detectDialect("offsetGHz\n150,01\n150,02")).toEqual({ delimiter: ";", decimalComma: true });
    expect(detectDialect("offsetGHz\n150.01\n")).toEqual({ delimiter: ",", decimalComma: false });
  });

  it("a detector response reads the same as a comma file, a semicolon file with decimal commas and a tab file", () => {
    expect(parseDetectorResponse(RESPONSE, 3)).toEqual(RESPONSE_ANSWER);
    expect(parseDetectorResponse(rewrite(RESPONSE, ";"), 3)).toEqual(RESPONSE_ANSWER);
    expect(parseDetectorResponse(rewrite(RESPONSE, "\t"), 3)).toEqual(RESPONSE_ANSWER);
    expect(parseDetectorResponse(RESPONSE.replace(/\n/g, "\r\n"), 3)).toEqual(RESPONSE_ANSWER);
  });

  it("a one-column tuning map with decimal commas", () => {
    const r = parseTuningMap("\uFEFFoffsetGHz\r\n150,00\r\n150,01\r\n150,02\r\n", 15);
    expect(r).toMatchObject({ ok: true, intervals: [{ minGHz: 150, maxGHz: 150.02 }], points: 3 });
  });

  it("a semicolon file refuses thousands separators and mixed marks rather than guess", () => {
    const r = parseTuningMap("offsetGHz;x\n1.234,5;1\n", 15);
    expect(r).toEqual({ ok: false, issues: [{ row: 2, column: "offsetGHz", message: '"1.234,5" is not a number' }] });
  });
});

describe("column names", () => {
  it.each([["Offset (GHz)"], ["offset_GHz"], ["OFFSET GHZ"], ["offset [GHz]"], [" Offset ( GHz ) "], ["offsetGHz"]])(
    "%j names offsetGHz",
    (name) => {
      expect(columnKey(name)).toBe(columnKey("offsetGHz"));
      const r = parseTuningMap(`setpointMA,${name}\n1,150\n2,150.01\n`, 15);
      expect(r).toMatchObject({ ok: true, points: 2 });
    },
  );

  it("another unit or another word does not: the message names the delimiter and the header row found", () => {
    const r = parseTuningMap("Setpoint (mA);Offset (MHz)\n1;150000\n", 15);
    expect(r).toEqual({
      ok: false,
      issues: [
        {
          row: 1,
          column: "offsetGHz",
          message:
            'missing column offsetGHz (the file was read with semicolons (";", decimal commas) as the delimiter; its header row 1 names "Setpoint (mA)", "Offset (MHz)")',
        },
      ],
    });
    const beat = parseTuningMap("beat_GHz\n150\n", 15);
    expect(beat.ok === false && beat.issues[0]?.message).toMatch(
      /missing column offsetGHz .*commas \(","\).*"beat_GHz"/,
    );
  });

  it("two spellings of one column are refused as a repeated column", () => {
    const r = parseTuningMap("offsetGHz,Offset (GHz)\n1,2\n", 15);
    expect(r).toEqual({
      ok: false,
      issues: [{ row: 1, column: "offsetGHz", message: "column offsetGHz appears twice" }],
    });
  });
});

describe("channel lists from spreadsheets", () => {
  const COMMA = [
    "key,name,chain,centerGHz,bandwidthMHz,dsbOffsetGHz,integrationMs,antennaK,receiverK,gainStability,requiredNedtK",
    "wv1,line centre,A,183.31,10,,10,250,5000,0,20",
    "wv2,wing,A,183.31,500,7.5,10.5,250,5000,0.0001,",
  ].join("\n");

  it("a semicolon file with decimal commas, a BOM, CR LF and spelled-out headers gives the same channels", () => {
    const want = parseChannelCsv(COMMA, CHAINS);
    expect(want).toMatchObject({ ok: true, valid: true });
    const semicolon = rewrite(COMMA, ";")
      .replace("centerGHz", "Center (GHz)")
      .replace("bandwidthMHz", "bandwidth_MHz")
      .replace("integrationMs", "Integration (ms)");
    expect(parseChannelCsv(semicolon, CHAINS)).toEqual(want);
    expect(parseChannelCsv(rewrite(COMMA, "\t"), CHAINS)).toEqual(want);
  });

  it("reads the notation column with decimal commas in a semicolon file", () => {
    const csv =
      "key;name;chain;notation;bandwidth;integrationMs;antennaK;receiverK\r\nh5;wing;A;183,31 ± 7,0;2 × 500 MHz;10;250;5000\r\n";
    const r = parseChannelCsv(csv, CHAINS);
    expect(r.ok && r.rows[0]?.channel).toMatchObject({ centerGHz: 183.31, dsbOffsetGHz: 7, bandwidthMHz: 500 });
  });

  it("any channel table written with semicolons and decimal commas reads as its comma form (property)", () => {
    const num = fc.double({ min: 0.001, max: 400, noNaN: true }).map((x) => Number(x.toPrecision(6)));
    const row = fc.record({ key: fc.stringMatching(/^[a-z][a-z0-9]{0,5}$/), c: num, b: num, t: num });
    fc.assert(
      fc.property(fc.uniqueArray(row, { selector: (r) => r.key, minLength: 1, maxLength: 8 }), (rows) => {
        const comma = [
          "key,name,chain,centerGHz,bandwidthMHz,integrationMs,antennaK,receiverK",
          ...rows.map((r) => `${r.key},n ${r.key},A,${r.c},${r.b},${r.t},1,1`),
        ].join("\n");
        expect(parseChannelCsv(rewrite(comma, ";"), CHAINS)).toEqual(parseChannelCsv(comma, CHAINS));
      }),
      { numRuns: 60 },
    );
  });
});
