import { renderToString } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import type { Chain, Channel } from "@/queries/types";
import { example1 } from "../../../../tests/fixtures/plans/builders";
import { buildChannelRows } from "../channel-rows";
import { EnvelopePlotsSection } from "./envelope-plots-section";
import { atText, EnvelopeSection } from "./envelope-section";

const text = (html: string) =>
  html
    .replace(/<!-- -->/g, "")
    .replace(/<[^>]+>/g, " ")
    .replace(/\s+/g, " ");

const chain = { id: "uuid-a", key: "A" } as Chain;
const channel: Channel = {
  id: "id-wv1",
  version: 1,
  key: "wv1",
  name: "183.31 line centre",
  chainId: "uuid-a",
  centerGHz: 183.31,
  bandwidthMHz: 10,
  dsbOffsetGHz: null,
  integrationMs: 10,
  antennaK: 250,
  receiverK: 5000,
  gainStability: 0,
  requiredNedtK: 20,
  ifFilter: "slot",
  centreToleranceMHz: 5,
  receiverKSource: "entered",
};

describe("the report's envelope sections", () => {
  it("example 1: nominal 17.9 K beside the worst 81.12 K at u = ±20 MHz, mode response 0.1895, centre error over tolerance (issue 11)", () => {
    const plan = example1();
    const result = checkPlan(plan);
    const html = renderToString(<EnvelopeSection rows={buildChannelRows([channel], [chain], result)} />);
    const t = text(html);
    // Known answers from issue 11 (computed independently from the model): 81.123 K, 0.1895, 19.325 MHz.
    expect(t).toContain("17.92");
    expect(t).toContain("81.12");
    expect(t).toMatch(/u −?20\.000 MHz, t 0\.000 K/);
    expect(t).toContain("0.1895");
    expect(t).toContain("19.325 / 5.000");
    expect(html.match(/text-sev-error/g)).toHaveLength(3);
  });

  it("says where a worst value occurs with a true minus sign", () => {
    expect(atText({ loShiftMHz: -20, temperatureOffsetK: 1.5 })).toBe("u −20.000 MHz, t 1.500 K");
    expect(atText(null)).toBe("");
  });

  it("draws a chain chart and two plots per channel as static SVG, without focus or tables", () => {
    const plan = example1();
    const html = renderToString(<EnvelopePlotsSection plan={plan} result={checkPlan(plan)} />);
    expect(html.match(/role="img"/g)?.length).toBe(3);
    expect(html).not.toContain("tabindex");
    expect(html).not.toContain("<details");
  });
});
