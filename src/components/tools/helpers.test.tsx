import { renderToString } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { DriftBudget } from "./drift-budget";
import { OpticalFrequency } from "./optical-frequency";
import { ReceiverNoise } from "./receiver-noise";
import { ResonatorSizing } from "./resonator-sizing";
import { WavelengthGrid } from "./wavelength-grid";
import { ChannelNotation } from "./channel-notation";

/** Text of the element carrying data-testid, tags stripped (server render, no DOM needed). */
function byTestId(html: string, id: string): string {
  const m = new RegExp(`data-testid="${id}"[^>]*>(.*?)</span></span>|data-testid="${id}"[^>]*>(.*?)</span>`).exec(html);
  const inner = m?.[1] ?? m?.[2];
  if (inner === undefined) throw new Error(`no element with data-testid=${id}`);
  return inner
    .replace(/<[^>]+>/g, "")
    .replace(/<!-- -->/g, "")
    .replace(/&#x27;/g, "'");
}

describe("helper components (first render, server-side)", () => {
  it("WavelengthGrid shows λ and the G.694.1 channels of the initial frequency", () => {
    const html = renderToString(<WavelengthGrid initialTHz={193.1} onApply={() => {}} />);
    // ITU-T G.694.1 anchor 193.1 THz ↔ 1552.524 nm
    expect(byTestId(html, "wg-nm")).toMatch(/^1552\.5244/);
    expect(html).toContain("N = 0");
    expect(html).toContain("flex 6.25 GHz");
    expect(html).toContain("Working");
    expect(html).toContain("ITU-T G.694.1");
    expect(html).toContain(">Apply<");
  });

  it("ResonatorSizing sizes a 183.31 GHz FSR disc and shows the thermal shifts", () => {
    const html = renderToString(
      <ResonatorSizing
        initialFsrGHz={183.31}
        initialCarrierTHz={193.4}
        initialTemperatureC={25}
        initialLoadedQ={1e8}
      />,
    );
    // derived (docs/helpers.md, Derived check values): R ≈ 119.3 µm for 183.31 GHz
    expect(Number(byTestId(html, "rs-radius").replace(/[^\d.]/g, ""))).toBeCloseTo(119.27, 1);
    // derived (same section): 1.934 MHz at Q 1e8, 193.4 THz
    expect(byTestId(html, "rs-linewidth")).toMatch(/^1\.934/);
    // derived (docs/helpers.md, Thermal tuning): −6.2 GHz/K and −6.4 MHz/K
    expect(byTestId(html, "rs-mode-shift")).toMatch(/^\u22126\.2/);
    expect(byTestId(html, "rs-fsr-shift")).toMatch(/^\u22126\.38/);
    expect(html).not.toContain(">Apply FSR and Q<"); // no onApply, no button
  });

  it("ResonatorSizing uses a measured group index when given", () => {
    const html = renderToString(
      <ResonatorSizing initialRadiusUm={1000} initialMeasuredGroupIndex={2.1824} onApply={() => {}} />,
    );
    // derived (docs/helpers.md, Derived check values): R = 1 mm, n_g = 2.1824 → 21.86 GHz
    expect(byTestId(html, "rs-fsr")).toMatch(/^21\.86/);
    expect(html).toContain(">Apply FSR and Q<");
  });

  it("DriftBudget adds the terms and rounds the applied value up", () => {
    const html = renderToString(
      <DriftBudget
        initialLaser2MHz={10}
        initialResonatorMilliK={1}
        initialLockOffsetMHz={0.5}
        initialStepMHz={10}
        initialModeShiftGHzPerK={-6.2}
        onApply={() => {}}
      />,
    );
    // worked by hand: 10 + 6.2 + 0.5 + 5 = 21.7 MHz
    expect(byTestId(html, "db-drift")).toMatch(/21\.700/);
    expect(html).toContain(">Apply drift<");
  });

  it("ReceiverNoise is marked as a design estimate and shows the quantum limit", () => {
    const html = renderToString(
      <ReceiverNoise
        initialRfGHz={183.31}
        initialPhotonEfficiency={0.01}
        initialOpticalEfficiency={0.5}
        initialFrontEnd={null}
      />,
    );
    expect(html).toContain("Design estimate");
    // exact SI constants: h·f/k = 8.797 K at 183.31 GHz
    expect(byTestId(html, "rn-quantum")).toMatch(/^8\.797/);
    // 8.7975 K / 0.005 = 1759.5 K
    expect(byTestId(html, "rn-receiver")).toMatch(/^1759\.5/);
  });

  it("ReceiverNoise names the field when the initial input is bad, and shows no result", () => {
    const html = renderToString(<ReceiverNoise initialRfGHz={-1} onApply={() => {}} />);
    expect(html).toContain("RF frequency must be greater than 0");
    expect(html).toContain('aria-invalid="true"');
    expect(byTestId(html, "rn-receiver")).toBe("—K");
    expect(html).toMatch(/<button[^>]*disabled=""[^>]*>Apply receiver noise</);
  });

  it("OpticalFrequency shows THz, nm and the nearest 50 GHz channel", () => {
    const html = renderToString(<OpticalFrequency thz={193.42} />).replace(/<!-- -->/g, "");
    expect(html).toContain("193.4200 THz");
    expect(html).toContain("1549.956 nm"); // 299792.458 / 193.42 = 1549.9558 nm
    expect(html).toContain("N = 6");
    expect(html).toContain("+20.0 GHz");
    expect(renderToString(<OpticalFrequency thz={Number.NaN} />)).toContain("—");
  });
});

describe("ChannelNotation (first render, server-side)", () => {
  it("expands the MHS channel 4 notation into its two passbands", () => {
    const html = renderToString(<ChannelNotation initialText="183.311 ± 3.00 GHz, 2 × 1000 MHz" onApply={() => {}} />);
    // MHS channel table: passbands [179.811, 180.811] and [185.811, 186.811] GHz
    expect(byTestId(html, "cn-passband-1")).toMatch(/^179\.8110 – 180\.8110/);
    expect(byTestId(html, "cn-passband-2")).toMatch(/^185\.8110 – 186\.8110/);
    expect(html).toContain(">Apply channel<");
  });

  it("names the part that did not parse", () => {
    const html = renderToString(<ChannelNotation initialText="57.290344 ± 0.3222 ± 0.048" />);
    expect(html).toContain("Notation: quadruple-sideband");
    const bw = renderToString(<ChannelNotation initialText="183.31 ± 7.0" initialBandwidth="wide" />);
    expect(bw).toContain("Bandwidth: “wide” is not a bandwidth");
  });
});

describe("carrier outside the LiNbO3 fits", () => {
  it("is refused at the field, naming it", () => {
    const html = renderToString(<ResonatorSizing initialCarrierTHz={1000} onApply={() => {}} />);
    expect(html).toContain("Carrier must be at most 749");
    expect(byTestId(html, "rs-fsr")).toBe("—GHz");
    const drift = renderToString(<DriftBudget initialCarrierTHz={10} />);
    expect(drift).toContain("Carrier must be at least 60");
  });
});
