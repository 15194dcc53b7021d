import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import { mustParse, fixtureInput } from "../fixtures/plans/builders";

/**
 * Issue 11's known answer for worked example 1 over its operating envelope
 * (tests/fixtures/plans/ex1-single-channel.envelope.expected.json: the
 * figures of the issue, computed independently from the model the issue
 * states and reproduced by a separate script before the engine was
 * written). The plan is the version 1 document as it is: its own ±20 MHz
 * LO drift is its envelope, the IF filter defaults to "slot", no
 * temperature excursion.
 */
interface EnvelopeExpected {
  source: string;
  tolerances: { K: number; dB: number; modeResponse: number; MHz: number };
  channels: {
    id: string;
    worstNedtK: number;
    worstNedtAtLoShiftMHz: number[];
    worstModeResponse: number;
    worstImageRejectionDB: number;
    worstImageRejectionAtLoShiftMHz: number;
    centreErrorMHz: number;
  }[];
  chains: { id: string; temperatureWindowK: [number, number][] }[];
  errors: { code: string; chain: string; channel: string | null }[];
}

const expected = JSON.parse(
  readFileSync(join(__dirname, "../fixtures/plans/ex1-single-channel.envelope.expected.json"), "utf8"),
) as EnvelopeExpected;

describe("worked example 1 over its ±20 MHz LO drift (issue 11's known answer)", () => {
  const result = checkPlan(mustParse(fixtureInput("ex1-single-channel")));
  const tol = expected.tolerances;

  it("names its source", () => {
    expect(expected.source).toMatch(/Issue 11/);
  });

  for (const e of expected.channels) {
    it(`${e.id}: worst NEΔT, mode response, image rejection and centre error, and where they occur`, () => {
      const c = result.channels.find((x) => x.id === e.id)!;
      const env = c.envelope;
      // 81.123 K with the band half a linewidth off the mode (the nominal 17.92 K is unchanged)
      expect(Math.abs(env.worstNedtK! - e.worstNedtK)).toBeLessThanOrEqual(tol.K);
      expect(e.worstNedtAtLoShiftMHz).toContain(env.worstNedtAt!.loShiftMHz);
      expect(env.worstNedtAt!.temperatureOffsetK).toBe(0);
      expect(Math.abs(env.worstModeResponse - e.worstModeResponse)).toBeLessThanOrEqual(tol.modeResponse);
      expect(Math.abs(env.worstImageRejectionDB! - e.worstImageRejectionDB)).toBeLessThanOrEqual(tol.dB);
      expect(env.worstImageRejectionAt!.loShiftMHz).toBe(e.worstImageRejectionAtLoShiftMHz);
      expect(Math.abs(env.centreErrorMHz! - e.centreErrorMHz)).toBeLessThanOrEqual(tol.MHz);
      // the nominal figures stay those of version 1 (tests/fixtures/plans/ex1-single-channel.expected.json)
      expect(c.nedtK).toBeCloseTo(17.922685151149917, 9);
      expect(c.imageRejectionDB).toBeCloseTo(49.48171342092203, 9);
    });
  }

  it("errors: mode-detuned and nedt-unmet, and an empty temperature window", () => {
    const key = (f: { code: string; chain: string; channel: string | null }) => `${f.chain}|${f.channel}|${f.code}`;
    const got = result.findings.filter((f) => f.severity === "error").map(key);
    expect(got.sort()).toEqual(expected.errors.map(key).sort());
    for (const e of expected.chains) {
      const c = result.chains.find((x) => x.id === e.id)!;
      expect(c.temperatureWindowK).toEqual(e.temperatureWindowK);
      expect(c.temperatureMarginK).toBeNull();
    }
  });
});
