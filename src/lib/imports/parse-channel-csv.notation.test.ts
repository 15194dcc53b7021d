import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parseChannelCsv } from "./parse-channel-csv";
import { CHAINS, readChannelLines } from "./channel-csv.test-util";

describe("channel CSV: notation and bandwidth text columns", () => {
  it("reads sounder-table notation into centre, DSB offset and bandwidth", () => {
    // Channel values in the notation of the MHS channel table (EUMETSAT MHS product description: 183.311 ± 7.0 GHz, 2 × 2000 MHz).
    const r = readChannelLines([
      "key,name,chain,notation,bandwidth,integrationMs,antennaK,receiverK",
      "h5,wing,A,183.31 ± 7.0,2 × 500 MHz,10,250,5000",
      'h3,"line, near",A,"183.311 ± 3.00 GHz, 2 × 1000 MHz",,10,250,5000',
      "w89,window,B,89.0 GHz,2800 MHz,10,250,5000",
    ]);
    expect(r.valid).toBe(true);
    expect(
      r.rows.map((x) => x.channel && [x.channel.centerGHz, x.channel.dsbOffsetGHz, x.channel.bandwidthMHz]),
    ).toEqual([
      [183.31, 7, 500],
      [183.311, 3, 1000],
      [89, null, 2800],
    ]);
  });

  it("a bandwidth text column beside numeric centre and offset columns", () => {
    const csv = [
      "key,name,chain,centerGHz,dsbOffsetGHz,bandwidth,integrationMs,antennaK,receiverK",
      "h7,wing,A,183.31,7,2 x 500 MHz,10,250,5000",
    ].join("\n");
    const r = parseChannelCsv(csv, CHAINS);
    expect(r.ok && r.rows[0]?.channel).toMatchObject({ centerGHz: 183.31, dsbOffsetGHz: 7, bandwidthMHz: 500 });
  });

  it("names the row and the text column of a bad cell", () => {
    const r = readChannelLines([
      "key,name,chain,notation,bandwidth,bandwidthMHz,integrationMs,antennaK,receiverK",
      "ok,fine,A,183.31 ± 7.0,,500,10,250,5000",
      "b1,bad notation,A,183.31 ± seven,,500,10,250,5000",
      "b2,bad bandwidth,A,183.31 ± 7.0,3 × 500 MHz,,10,250,5000",
      "b3,both,A,183.31 ± 7.0,2 × 500 MHz,500,10,250,5000",
      "b4,no bandwidth,A,183.31 ± 7.0,,,10,250,5000",
    ]);
    expect(r.valid).toBe(false);
    expect(r.rows[0]).toMatchObject({
      row: 2,
      errors: [],
      channel: { centerGHz: 183.31, dsbOffsetGHz: 7, bandwidthMHz: 500 },
    });
    expect(r.rows[1]!.row).toBe(3);
    expect(r.rows[1]!.errors.map((e) => e.column)).toEqual(["notation"]);
    expect(r.rows[2]!.errors).toEqual([{ column: "bandwidth", message: expect.stringContaining("2 × b") }]);
    expect(r.rows[3]!.errors).toEqual([
      { column: "bandwidth", message: "and bandwidthMHz are both filled in; give it in one column only" },
    ]);
    expect(r.rows[4]!.errors.length).toBeGreaterThan(0);
    expect(r.rows[4]!.errors.every((e) => e.column === "notation" || e.column === "bandwidthMHz")).toBe(true);
  });

  it("refuses notation together with centerGHz in one row", () => {
    const csv = [
      "key,name,chain,notation,centerGHz,bandwidthMHz,integrationMs,antennaK,receiverK",
      "x,y,A,183.31 ± 7.0,183.31,500,10,250,5000",
    ].join("\n");
    const r = parseChannelCsv(csv, CHAINS);
    expect(r.ok && r.rows[0]?.errors).toEqual([
      { column: "notation", message: "and centerGHz are both filled in; give it in one column only" },
    ]);
  });

  it("still requires centerGHz and bandwidthMHz when there is no notation column", () => {
    const r = parseChannelCsv("key,name,chain,integrationMs,antennaK,receiverK\nx,y,A,10,250,5000\n", CHAINS);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.map((i) => i.column)).toEqual(["centerGHz", "bandwidthMHz"]);
  });

  it("notation and the numeric columns give the same channel (property)", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 20_000, max: 300_000 }),
        fc.integer({ min: 1_000, max: 15_000 }),
        fc.integer({ min: 1, max: 1_500 }),
        (cMHz, dMHz, bwMHz) => {
          const c = cMHz / 1000;
          const d = dMHz / 1000;
          const a = parseChannelCsv(
            `key,name,chain,notation,bandwidth,integrationMs,antennaK,receiverK\nk,n,A,${c} ± ${d},2 × ${bwMHz} MHz,10,250,5000\n`,
            CHAINS,
          );
          const b = parseChannelCsv(
            `key,name,chain,centerGHz,dsbOffsetGHz,bandwidthMHz,integrationMs,antennaK,receiverK\nk,n,A,${c},${d},${bwMHz},10,250,5000\n`,
            CHAINS,
          );
          expect(a.ok && b.ok).toBe(true);
          if (a.ok && b.ok) expect(a.rows[0]?.channel).toEqual(b.rows[0]?.channel);
        },
      ),
      { numRuns: 200 },
    );
  });
});
