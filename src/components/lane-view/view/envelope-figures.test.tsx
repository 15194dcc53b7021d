import { renderToString } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import { example1 } from "../../../../tests/fixtures/plans/builders";
import { EnvelopeFigures } from "./envelope-figures";

const text = (html: string) =>
  html
    .replace(/<!-- -->/g, "")
    .replace(/<[^>]+>/g, " ")
    .replace(/\s+/g, " ");

describe("EnvelopeFigures (details panel)", () => {
  it("example 1: NEΔT 17.92 K nominal beside 81.12 K worst at u = ±20 MHz; mode response 1 beside 0.1895 (issue 11)", () => {
    const plan = example1();
    const t = text(renderToString(<EnvelopeFigures channelId="wv1" plan={plan} result={checkPlan(plan)} />));
    // Known answers: issue 11 (computed independently from the model): 81.123 K and 0.1895 at u = ±20 MHz.
    expect(t).toMatch(/NEΔT 17\.92 K 81\.12 K u −?20 MHz, t 0 K/);
    expect(t).toMatch(/Mode response 1 0\.1895 u −?20 MHz, t 0 K/);
    expect(t).toMatch(/Centre error — 19\.3[23] MHz/);
  });
  it("renders nothing for a channel the plan does not have", () => {
    const plan = example1();
    expect(renderToString(<EnvelopeFigures channelId="nope" plan={plan} result={checkPlan(plan)} />)).toBe("");
  });
});
