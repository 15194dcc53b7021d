import { describe, expect, it } from "vitest";
import fc from "fast-check";
import Papa from "papaparse";
import { parseChannelCsv } from "./parse-channel-csv";
import { channelsToCsv, type ChannelCsvSource } from "./channels-to-csv";
import { CHANNEL_COLUMNS, ENVELOPE_CHANNEL_COLUMNS } from "./internals/channel-columns";

const CHAINS = [
  { id: "11111111-1111-4111-8111-111111111111", key: "A" },
  { id: "22222222-2222-4222-8222-222222222222", key: "B" },
];

const channelArb = fc.record({
  key: fc.stringMatching(/^[A-Za-z0-9][A-Za-z0-9._-]{0,8}$/),
  name: fc.stringMatching(/^[A-Za-z][A-Za-z0-9 ]{0,10}[A-Za-z0-9]$/),
  chain: fc.constantFrom("A", "B"),
  centerGHz: fc.double({ min: 1, max: 400, noNaN: true }),
  bandwidthMHz: fc.double({ min: 0.1, max: 500, noNaN: true }),
  dsbOffsetGHz: fc.constant(null),
  integrationMs: fc.double({ min: 0.1, max: 1000, noNaN: true }),
  antennaK: fc.double({ min: 0, max: 400, noNaN: true }),
  receiverK: fc.double({ min: 0, max: 1e4, noNaN: true }),
  gainStability: fc.double({ min: 0, max: 0.01, noNaN: true }),
  requiredNedtK: fc.option(fc.double({ min: 0, max: 10, noNaN: true }), { nil: null }),
  ifFilter: fc.constantFrom("slot" as const, "occupied" as const),
  centreToleranceMHz: fc.option(fc.double({ min: 1e-3, max: 100, noNaN: true }), { nil: null }),
});

const base: ChannelCsvSource = {
  key: "c1",
  name: "one",
  chain: "A",
  centerGHz: 183.31,
  bandwidthMHz: 10,
  dsbOffsetGHz: null,
  integrationMs: 10,
  antennaK: 250,
  receiverK: 5000,
  gainStability: 0,
  requiredNedtK: null,
};

describe("channel CSV: the envelope columns of plan format 2", () => {
  it("round-trips ifFilter and centreToleranceMHz with the other fields (property)", () => {
    fc.assert(
      fc.property(fc.uniqueArray(channelArb, { selector: (c) => c.key, minLength: 1, maxLength: 10 }), (chs) => {
        const r = parseChannelCsv(channelsToCsv(chs), CHAINS);
        expect(r.ok).toBe(true);
        if (!r.ok) return;
        expect(r.valid).toBe(true);
        const cols = [...CHANNEL_COLUMNS, ...ENVELOPE_CHANNEL_COLUMNS];
        const back = r.rows.map((row) => Object.fromEntries(cols.map((c) => [c, row.channel![c]])));
        expect(back).toEqual(chs);
        // Written only when some channel needs them; a file without them says so.
        const needed = chs.some((c) => c.ifFilter === "occupied" || c.centreToleranceMHz !== null);
        expect(r.keptColumns).toEqual(needed ? [] : ["ifFilter", "centreToleranceMHz"]);
      }),
      { numRuns: 60 },
    );
  });

  it("writes the version 1 file, unchanged, when no channel uses the envelope fields", () => {
    const v1 = channelsToCsv([base]);
    expect(channelsToCsv([{ ...base, ifFilter: "slot", centreToleranceMHz: null }])).toBe(v1);
    // The header as papaparse reads it: exactly the version 1 columns.
    expect(Papa.parse<string[]>(v1.trim()).data[0]).toEqual([...CHANNEL_COLUMNS]);
    const v2 = channelsToCsv([base, { ...base, key: "c2", centreToleranceMHz: 2.5 }]);
    expect(v2.split("\r\n")).toEqual([
      [...CHANNEL_COLUMNS, ...ENVELOPE_CHANNEL_COLUMNS].join(","),
      "c1,one,A,183.31,10,,10,250,5000,0,,,",
      "c2,one,A,183.31,10,,10,250,5000,0,,,2.5",
      "",
    ]);
  });

  it("reads blank cells as the defaults, names bad cells by column, and lists the columns a file leaves out", () => {
    const head = `${CHANNEL_COLUMNS.join(",")},ifFilter`;
    const r = parseChannelCsv(
      [
        head,
        "a,one,A,183.31,10,,10,250,5000,0,,",
        "b,two,A,183.31,10,,10,250,5000,0,, occupied ",
        "c,three,A,183.31,10,,10,250,5000,0,,Occupied",
      ].join("\n"),
      CHAINS,
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.keptColumns).toEqual(["centreToleranceMHz"]);
    expect(r.rows[0]?.channel).toMatchObject({ ifFilter: "slot", centreToleranceMHz: null });
    expect(r.rows[1]?.channel).toMatchObject({ ifFilter: "occupied" });
    expect(r.rows[2]).toEqual({ row: 4, errors: [{ column: "ifFilter", message: "must be slot or occupied" }] });

    const tol = parseChannelCsv(
      `${CHANNEL_COLUMNS.join(",")},centreToleranceMHz\nd,four,A,183.31,10,,10,250,5000,0,,0\ne,five,A,183.31,10,,10,250,5000,0,,x\n`,
      CHAINS,
    );
    expect(tol.ok && tol.rows.map((row) => row.errors)).toEqual([
      [{ column: "centreToleranceMHz", message: "must be greater than 0" }],
      [{ column: "centreToleranceMHz", message: '"x" is not a number' }],
    ]);
  });

  it("reads a semicolon file's decimal comma in centreToleranceMHz", () => {
    const r = parseChannelCsv(
      `${[...CHANNEL_COLUMNS, ...ENVELOPE_CHANNEL_COLUMNS].join(";")}\nf;six;A;183,31;10;;10;250;5000;0;;occupied;2,5\n`,
      CHAINS,
    );
    expect(r.ok && r.rows[0]?.channel).toMatchObject({
      centerGHz: 183.31,
      ifFilter: "occupied",
      centreToleranceMHz: 2.5,
    });
  });
});
