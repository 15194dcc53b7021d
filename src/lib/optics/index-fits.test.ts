import fc from "fast-check";
import { derivative, evaluate } from "mathjs";
import { describe, expect, it } from "vitest";
import { groupIndex } from "./group-index";
import { centralDifference } from "./internals/finite-difference";
import { lnExtraordinaryIndexJundt } from "./ln-extraordinary-index-jundt";
import { lnIndexZelmon } from "./ln-index-zelmon";

// Independent implementations: the same published formulas typed out as
// strings and evaluated (and differentiated symbolically) by mathjs.
const ZELMON_E = "sqrt(1 + 2.9804 x^2/(x^2 - 0.02047) + 0.5981 x^2/(x^2 - 0.0666) + 8.9543 x^2/(x^2 - 416.08))";
const ZELMON_O = "sqrt(1 + 2.6734 x^2/(x^2 - 0.01764) + 1.2290 x^2/(x^2 - 0.05914) + 12.614 x^2/(x^2 - 474.60))";
const JUNDT =
  "sqrt(5.35583 + 4.629e-7 F + (0.100473 + 3.862e-8 F)/(x^2 - (0.20692 - 0.89e-8 F)^2)" +
  " + (100 + 2.657e-5 F)/(x^2 - 11.34927^2) - 1.5334e-2 x^2)";
const jundtAt = (t: number) => JUNDT.replaceAll("F", `((${t} - 24.5) * (${t} + 570.82))`);

const lambda = fc.double({ min: 0.45, max: 4.5, noNaN: true });
const temp = fc.double({ min: 20, max: 200, noNaN: true });

describe("LiNbO3 Sellmeier fits", () => {
  it("reproduces the published check values", () => {
    // Zelmon, Small & Jundt, JOSA B 14, 3319 (1997), 21 °C: n_e(1.55 µm) = 2.1376, n_e(1.064 µm) = 2.1555
    expect(Math.abs(lnIndexZelmon(1.55, "e") - 2.1376)).toBeLessThan(2e-4);
    expect(Math.abs(lnIndexZelmon(1.064, "e") - 2.1555)).toBeLessThan(2e-4);
    // same fit, ordinary ray: n_o(1.55 µm) = 2.2111
    expect(Math.abs(lnIndexZelmon(1.55, "o") - 2.2111)).toBeLessThan(2e-4);
    // Jundt, Opt. Lett. 22, 1553 (1997): n_e(1.55 µm, 24.5 °C) = 2.1379
    expect(Math.abs(lnExtraordinaryIndexJundt(1.55, 24.5) - 2.1379)).toBeLessThan(2e-4);
    // Cross-check, LiNbO3 property table of the acousto-optics group, Moscow State University: n_e(1.55 µm) = 2.1365, within 1e-3
    expect(Math.abs(lnIndexZelmon(1.55, "e") - 2.1365)).toBeLessThan(1.5e-3);
  });

  it("agrees with the formulas evaluated by mathjs", () => {
    fc.assert(
      fc.property(lambda, (x) => {
        expect(lnIndexZelmon(x, "e")).toBeCloseTo(evaluate(ZELMON_E, { x }) as number, 12);
        expect(lnIndexZelmon(x, "o")).toBeCloseTo(evaluate(ZELMON_O, { x }) as number, 12);
      }),
    );
    fc.assert(
      fc.property(lambda, temp, (x, t) => {
        expect(lnExtraordinaryIndexJundt(x, t)).toBeCloseTo(evaluate(jundtAt(t), { x }) as number, 12);
      }),
      { numRuns: 50 },
    );
  });

  it("the two fits agree near room temperature to the fits' own scatter (≤ 1e-3)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 3.5, noNaN: true }), (x) => {
        expect(Math.abs(lnIndexZelmon(x, "e") - lnExtraordinaryIndexJundt(x, 21))).toBeLessThan(1e-3);
      }),
    );
  });

  it("refuses wavelengths outside the fits and names the field", () => {
    expect(() => lnIndexZelmon(0.2, "e")).toThrow(/wavelengthUm/);
    expect(() => lnExtraordinaryIndexJundt(1.55, 400)).toThrow(/temperatureC/);
  });
});

describe("groupIndex", () => {
  it("gives n_g ≈ 2.18 at 1.55 µm", () => {
    // derived from the Jundt 1997 fit, n_g = n − λ·dn/dλ (docs/helpers.md, Derived check values): n_g(e, 1550 nm, 24.5 °C) = 2.1824
    expect(groupIndex(1.55, { fit: "jundt", temperatureC: 24.5 }).ng).toBeCloseTo(2.1824, 4);
    expect(groupIndex(1.55, { fit: "zelmon", axis: "e" }).ng).toBeCloseTo(2.18, 2);
  });

  it("analytic derivative agrees with a central difference", () => {
    fc.assert(
      fc.property(lambda, fc.constantFrom<"e" | "o">("e", "o"), (x, axis) => {
        const numeric = centralDifference((l) => lnIndexZelmon(l, axis), x, 1e-3);
        const { n, dnDlambdaPerUm, ng } = groupIndex(x, { fit: "zelmon", axis });
        expect(dnDlambdaPerUm).toBeCloseTo(numeric, 8);
        expect(ng).toBeCloseTo(n - x * numeric, 8);
      }),
    );
    fc.assert(
      fc.property(lambda, temp, (x, t) => {
        const numeric = centralDifference((l) => lnExtraordinaryIndexJundt(l, t), x, 1e-3);
        expect(groupIndex(x, { fit: "jundt", temperatureC: t }).dnDlambdaPerUm).toBeCloseTo(numeric, 8);
      }),
    );
  });

  it("analytic derivative agrees with mathjs symbolic differentiation", () => {
    const dE = derivative(ZELMON_E, "x");
    fc.assert(
      fc.property(lambda, (x) => {
        expect(groupIndex(x, { fit: "zelmon", axis: "e" }).dnDlambdaPerUm).toBeCloseTo(
          dE.evaluate({ x }) as number,
          12,
        );
      }),
    );
    const dJ = derivative(jundtAt(60), "x");
    fc.assert(
      fc.property(lambda, (x) => {
        expect(groupIndex(x, { fit: "jundt", temperatureC: 60 }).dnDlambdaPerUm).toBeCloseTo(
          dJ.evaluate({ x }) as number,
          12,
        );
      }),
    );
  });

  it("is above the phase index in the normal-dispersion range", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.45, max: 1.9, noNaN: true }), (x) => {
        const r = groupIndex(x, { fit: "zelmon", axis: "e" });
        expect(r.ng).toBeGreaterThan(r.n);
      }),
    );
  });
});
