import { renderToString } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import { example1 } from "../../../tests/fixtures/plans/builders";
import { EnvelopeSection } from "./envelope-section";
import { fmtNumber, fmtWindow } from "./format";
import { TemperatureWindowLine } from "./temperature-window-line";

const text = (html: string) => html.replace(/<!-- -->/g, "").replace(/<[^>]+>/g, " ");

describe("envelope screens (first render, server-side)", () => {
  it("example 1: the chain map and both plots of its channel, with their axis titles, requirement and tables", () => {
    const plan = example1();
    const html = renderToString(<EnvelopeSection plan={plan} result={checkPlan(plan)} />);
    expect(html).toContain('data-testid="temperature-map-A"');
    expect(html).toContain('data-testid="envelope-plot-wv1-lo"');
    expect(html).toContain('data-testid="envelope-plot-wv1-temperature"');
    const t = text(html);
    for (const label of [
      "LO shift u (MHz)",
      "Resonator temperature offset t (K)",
      "NEΔT (K)",
      "Mode response",
      "required 20 K",
      "half power",
      "LO offset L (GHz)",
      "Temperature offset t (K)",
      "Table of the plotted values",
      "Table of the map",
    ])
      expect(t).toContain(label);
    // the plots take keyboard focus and describe themselves
    expect(html).toMatch(
      /role="img"[^>]*aria-label="wv1: against the LO shift: NEΔT and mode response[^"]*envelope ±20 MHz, requirement 20 K/,
    );
    expect(html).toContain('tabindex="0"');
  });

  it("the chain card line: window, control and margin, red when the control is too loose", () => {
    const ok = renderToString(<TemperatureWindowLine chainId="A" excursionK={1} windowK={[[-2.5, 3]]} marginK={1.5} />);
    expect(text(ok)).toContain("Temperature window −2.5 to 3 K · control ±1 K · margin 1.5 K");
    expect(ok).not.toContain("text-sev-error");
    const bad = renderToString(
      <TemperatureWindowLine chainId="A" excursionK={2} windowK={[[-0.5, 1]]} marginK={-1.5} />,
    );
    expect(text(bad)).toContain("the control must tighten by 1.5 K");
    expect(bad).toContain("text-sev-error");
    const none = renderToString(<TemperatureWindowLine chainId="A" excursionK={0} windowK={[]} marginK={null} />);
    expect(text(none)).toContain("Temperature window none · control ±0 K · no temperature passes at this LO");
  });

  it("formats numbers to significant figures with a true minus sign", () => {
    expect(fmtNumber(-3.99812, 4)).toBe("−3.998");
    expect(fmtNumber(-0, 3)).toBe("0");
    expect(fmtNumber(184.81, 7)).toBe("184.81");
    expect(fmtNumber(Number.NaN, 3)).toBe("—");
    expect(fmtWindow([])).toBe("none");
    expect(fmtWindow([[-1, 2]])).toBe("−1 to 2 K");
  });
});
