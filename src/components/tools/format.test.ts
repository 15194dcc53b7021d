import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ceilToStep, formatFixed, formatSignificant, formatSigned, parseNumberField } from "./format";

describe("formatFixed / formatSigned", () => {
  it("uses a true minus, never shows −0, and marks non-finite values", () => {
    expect(formatFixed(-6.235, 2)).toBe("\u22126.24");
    expect(formatFixed(-0.0001, 2)).toBe("0.00");
    expect(formatFixed(Number.NaN, 2)).toBe("—");
    expect(formatSigned(2.5, 3)).toBe("+2.500");
    expect(formatSigned(-0.125, 3)).toBe("\u22120.125");
    expect(formatSigned(0.0001, 2)).toBe("0.00");
  });
});

describe("formatSignificant", () => {
  it("switches to exponent form outside 1e-3 … 1e6", () => {
    expect(formatSignificant(1.934e8, 3)).toBe("1.93e8");
    expect(formatSignificant(3.75e-5, 3)).toBe("3.75e\u22125");
    expect(formatSignificant(295.6227, 5)).toBe("295.62");
    expect(formatSignificant(-6.2352, 3)).toBe("\u22126.24");
    expect(formatSignificant(0, 3)).toBe("0");
  });

  it("keeps the value to the digits shown", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e12, max: 1e12, noNaN: true }), (v) => {
        fc.pre(v !== 0 && Math.abs(v) > 1e-300);
        const shown = Number(formatSignificant(v, 6).replaceAll("\u2212", "-"));
        expect(Math.abs(shown - v)).toBeLessThanOrEqual(Math.abs(v) * 5e-6);
      }),
    );
  });
});

describe("ceilToStep", () => {
  it("rounds a budget up, not down", () => {
    expect(ceilToStep(21.7, 0.1)).toBe(21.7);
    expect(ceilToStep(21.7000001, 0.1)).toBe(21.8);
    expect(ceilToStep(12.3, 1)).toBe(13);
    expect(ceilToStep(0, 1)).toBe(0);
  });

  it("is never below the value and never more than one step above", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e6, noNaN: true }), fc.constantFrom(0.01, 0.1, 1, 10), (v, step) => {
        const r = ceilToStep(v, step);
        expect(r).toBeGreaterThanOrEqual(v * (1 - 1e-11));
        expect(r - v).toBeLessThanOrEqual(step * (1 + 1e-9));
      }),
    );
  });
});

describe("parseNumberField", () => {
  it("reads what people type", () => {
    expect(parseNumberField(" 193.4 ", "Carrier")).toEqual({ ok: true, value: 193.4 });
    expect(parseNumberField("1e8", "Q")).toEqual({ ok: true, value: 1e8 });
    expect(parseNumberField("2,5", "Loss")).toEqual({ ok: true, value: 2.5 });
    expect(parseNumberField("\u22126.2", "Shift")).toEqual({ ok: true, value: -6.2 });
  });

  it("names the field in every message", () => {
    expect(parseNumberField("", "Carrier")).toEqual({ ok: false, message: "Carrier is required" });
    expect(parseNumberField("abc", "Carrier")).toEqual({ ok: false, message: "Carrier must be a number" });
    expect(parseNumberField("1e999", "Q")).toEqual({ ok: false, message: "Q is too large" });
    expect(parseNumberField("0", "Q", { min: 0, exclusiveMin: true })).toEqual({
      ok: false,
      message: "Q must be greater than 0",
    });
    expect(parseNumberField("-1", "Loss", { min: 0 })).toEqual({ ok: false, message: "Loss must be at least 0" });
    expect(parseNumberField("101", "Efficiency", { max: 100 })).toEqual({
      ok: false,
      message: "Efficiency must be at most 100",
    });
    expect(parseNumberField("1.5", "N", { integer: true })).toEqual({ ok: false, message: "N must be a whole number" });
  });

  it("round-trips any finite number written by String()", () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (v) => {
        const r = parseNumberField(String(v), "x");
        expect(r).toEqual({ ok: true, value: v === 0 ? 0 : v });
      }),
    );
  });
});
