import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parseTuningMap } from "./parse-tuning-map";
import { parseDetectorResponse } from "./parse-detector-response";
import { parseChannelCsv } from "./parse-channel-csv";
import { CHAINS, readChannelLines } from "./channel-csv.test-util";
import { channelsToCsv, type ChannelCsvSource } from "./channels-to-csv";
import { decodeUtf8 } from "./decode-utf8";
import { CHANNEL_COLUMNS } from "./internals/channel-columns";

describe("decodeUtf8", () => {
  it("accepts UTF-8 (with a byte-order mark) and refuses Latin-1, UTF-16 and binary", () => {
    expect(decodeUtf8(new TextEncoder().encode("\uFEFFoffsetGHz\n150 µ"))).toEqual({
      ok: true,
      text: "offsetGHz\n150 µ",
    });
    expect(decodeUtf8(Uint8Array.from([0x6f, 0x66, 0xb5, 0x0a])).ok).toBe(false); // Latin-1 µ
    expect(decodeUtf8(Uint8Array.from([0xff, 0xfe, 0x6f, 0x00])).ok).toBe(false); // UTF-16LE
    expect(decodeUtf8(Uint8Array.from([0x6f, 0x00, 0x66]))).toMatchObject({
      ok: false,
      message: expect.stringContaining("NUL"),
    });
  });
});

describe("parseTuningMap", () => {
  it("merges offsets, ignores setpoint columns and lists blank offsets as rejected rows", () => {
    const csv = "setpointMA,offsetGHz\n10,150.00\n11,150.01\n12,\n13,150.02\n20,155\n21,155.005\n";
    const r = parseTuningMap(csv, 15);
    expect(r).toEqual({
      ok: true,
      intervals: [
        { minGHz: 150, maxGHz: 150.02 },
        { minGHz: 155, maxGHz: 155.005 },
      ],
      points: 5,
      isolatedGHz: [],
      rejectedRows: [{ row: 4, message: "no measured offset" }],
    });
  });

  it("names row and column of every non-number and refuses the file", () => {
    const r = parseTuningMap("offsetGHz\n150\nabc\n0x10\n1e999\n", 10);
    expect(r).toEqual({
      ok: false,
      issues: [
        { row: 3, column: "offsetGHz", message: '"abc" is not a number' },
        { row: 4, column: "offsetGHz", message: '"0x10" is not a number' },
        { row: 5, column: "offsetGHz", message: '"1e999" is too large' },
      ],
    });
  });

  it("refuses empty files, a missing column, header-only files and ragged rows", () => {
    expect(parseTuningMap("", 10)).toMatchObject({ ok: false, issues: [{ message: "the file is empty" }] });
    expect(parseTuningMap("  \n\n", 10)).toMatchObject({ ok: false, issues: [{ message: "the file is empty" }] });
    expect(parseTuningMap("offset\n150\n", 10)).toMatchObject({ ok: false, issues: [{ row: 1, column: "offsetGHz" }] });
    expect(parseTuningMap("offsetGHz\n", 10)).toMatchObject({ ok: false, issues: [{ row: null }] });
    expect(parseTuningMap("offsetGHz,sp\n150,1\n151\n", 10)).toMatchObject({
      ok: false,
      issues: [{ row: 3, column: null }],
    });
  });

  it("counts rows as a spreadsheet does, blank lines included", () => {
    const r = parseTuningMap("offsetGHz\n150\n\nx\n", 10);
    expect(r).toMatchObject({ ok: false, issues: [{ row: 4, column: "offsetGHz" }] });
  });

  it("every measured point lies in one interval or is isolated (property)", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -300, max: 300, noNaN: true }), { minLength: 1, maxLength: 50 }), (pts) => {
        const r = parseTuningMap("offsetGHz\n" + pts.map(String).join("\n"), 20);
        expect(r.ok).toBe(true);
        if (!r.ok) return;
        expect(r.points).toBe(pts.length);
        for (const p of pts) {
          const n =
            r.intervals.filter((iv) => p >= iv.minGHz && p <= iv.maxGHz).length + (r.isolatedGHz.includes(p) ? 1 : 0);
          expect(n).toBe(1);
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe("parseDetectorResponse", () => {
  it("reads the usable band and names bad rows and columns", () => {
    const ok = parseDetectorResponse("frequencyGHz,responseDB\n0.05,-6\n0.1,-2.5\n1,0\n5,-1\n6,-2.9\n7,-8\n", 3);
    expect(ok).toEqual({ ok: true, points: 6, minGHz: 0.1, maxGHz: 6, peakDB: 0, peakGHz: 1 });
    const bad = parseDetectorResponse("frequencyGHz,responseDB\n1,x\n-1,0\n1,2\n", 3);
    expect(bad).toEqual({
      ok: false,
      issues: [
        { row: 2, column: "responseDB", message: '"x" is not a number' },
        { row: 3, column: "frequencyGHz", message: "must be 0 or more" },
        { row: 4, column: "frequencyGHz", message: "repeats the frequency of row 2" },
      ],
    });
    expect(parseDetectorResponse("frequencyGHz\n1\n", 3)).toMatchObject({
      ok: false,
      issues: [{ row: 1, column: "responseDB" }],
    });
    expect(parseDetectorResponse("frequencyGHz,responseDB\n1,0\n2,-10\n", 3)).toMatchObject({
      ok: false,
      issues: [{ column: "responseDB" }],
    });
  });
});

const channelArb = fc.record({
  key: fc.stringMatching(/^[A-Za-z0-9][A-Za-z0-9._-]{0,8}$/),
  name: fc
    .tuple(fc.constantFrom("", "=", "+", "-", "@", "'", "'="), fc.string({ minLength: 1, maxLength: 20 }))
    .map(([head, tail]) => head + tail)
    .filter((s) => s.trim() === s && s.length > 0),
  chain: fc.constantFrom("A", "B"),
  centerGHz: fc.double({ min: 1, max: 400, noNaN: true }),
  bandwidthMHz: fc.double({ min: 0.1, max: 500, noNaN: true }),
  dsbOffsetGHz: fc.option(fc.double({ min: 1, max: 5, noNaN: true }), { nil: null }),
  integrationMs: fc.double({ min: 0.1, max: 1000, noNaN: true }),
  antennaK: fc.double({ min: 0, max: 400, noNaN: true }),
  receiverK: fc.double({ min: 0, max: 1e4, noNaN: true }),
  gainStability: fc.double({ min: 0, max: 0.01, noNaN: true }),
  requiredNedtK: fc.option(fc.double({ min: 0, max: 10, noNaN: true }), { nil: null }),
});

describe("channel CSV", () => {
  it("round-trips: parsing an export gives back the same channels (property)", () => {
    fc.assert(
      fc.property(fc.uniqueArray(channelArb, { selector: (c) => c.key, minLength: 1, maxLength: 12 }), (chs) => {
        const csv = channelsToCsv(chs as ChannelCsvSource[]);
        const r = parseChannelCsv(csv, CHAINS);
        expect(r.ok).toBe(true);
        if (!r.ok) return;
        expect(r.valid).toBe(true);
        const back = r.rows.map((row) => {
          const c = row.channel!;
          return Object.fromEntries(CHANNEL_COLUMNS.map((col) => [col, c[col as keyof typeof c]]));
        });
        expect(back).toEqual(chs.map((c) => ({ ...c, name: c.name.trim() })));
        const ids = r.rows.map((row) => row.channel!.chainId);
        expect(ids).toEqual(chs.map((c) => CHAINS.find((x) => x.key === c.chain)!.id));
      }),
      { numRuns: 60 },
    );
  });

  it("guards text a spreadsheet would run as a formula and reads it back unchanged", () => {
    const src = {
      key: "f1",
      name: '=HYPERLINK("x")',
      chain: "A",
      centerGHz: 1,
      bandwidthMHz: 1,
      dsbOffsetGHz: null,
      integrationMs: 1,
      antennaK: 1,
      receiverK: 1,
      gainStability: 0,
      requiredNedtK: null,
    };
    const csv = channelsToCsv([src]);
    expect(csv.split("\r\n")[1]).toBe('f1,"\'=HYPERLINK(""x"")",A,1,1,,1,1,1,0,');
    const back = parseChannelCsv(csv, CHAINS);
    expect(back.ok && back.rows[0]?.channel?.name).toBe(src.name);
  });

  it("lists every bad cell by row and column and is valid only when no row has errors", () => {
    const r = readChannelLines([
      "key,name,chain,centerGHz,bandwidthMHz,dsbOffsetGHz,integrationMs,antennaK,receiverK,gainStability,requiredNedtK",
      "wv1,line centre,A,183.31,10,,10,250,5000,0,20",
      'wv2,"wing, far",Z,abc,10,0.001,10,250,5000,,',
      "wv1,dup,B,183,-1,,10,250,5000,,",
    ]);
    expect(r.valid).toBe(false);
    expect(r.rows[0]).toMatchObject({
      row: 2,
      errors: [],
      channel: { key: "wv1", chain: "A", dsbOffsetGHz: null, requiredNedtK: 20 },
    });
    expect(r.rows[1]).toEqual({
      row: 3,
      errors: [
        { column: "chain", message: 'no chain has the key "Z"' },
        { column: "centerGHz", message: '"abc" is not a number' },
      ],
    });
    expect(r.rows[2]).toEqual({
      row: 4,
      errors: [
        { column: "key", message: "repeats the key of row 2" },
        { column: "bandwidthMHz", message: "must be greater than 0" },
      ],
    });
  });

  it("refuses unknown and missing columns for the whole file", () => {
    expect(
      parseChannelCsv("key,name,chain,centerGHz,bandwidthMHz,integrationMs,antennaK,receiverK,colour\n", CHAINS),
    ).toMatchObject({
      ok: false,
      issues: [{ row: 1, column: "colour" }],
    });
    const missing = parseChannelCsv("key,name\nx,y\n", CHAINS);
    expect(missing.ok).toBe(false);
    if (!missing.ok)
      expect(missing.issues.map((i) => i.column)).toEqual([
        "chain",
        "centerGHz",
        "bandwidthMHz",
        "integrationMs",
        "antennaK",
        "receiverK",
      ]);
  });

  it("refuses a file above the row limit", () => {
    const csv = "offsetGHz\n" + "1\n".repeat(11);
    expect(parseTuningMap(csv, 1).ok).toBe(true);
    const big =
      "key,name,chain,centerGHz,bandwidthMHz,integrationMs,antennaK,receiverK\n" + "a,b,A,1,1,1,1,1\n".repeat(100_001);
    const r = parseChannelCsv(big, CHAINS);
    expect(r).toMatchObject({
      ok: false,
      issues: [{ row: 100_002, message: "the file has more than 100000 data rows" }],
    });
  });
});
