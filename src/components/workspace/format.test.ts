import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { DASH, formatAge, formatGHz, formatInterval, formatQ, nedtStatus, plural } from "./format";

describe("number formatting", () => {
  it("shows GHz to 1 kHz and a dash for missing values", () => {
    expect(formatGHz(183.31)).toBe("183.310");
    expect(formatGHz(null)).toBe(DASH);
    expect(formatGHz(Number.NaN)).toBe(DASH);
    expect(formatGHz(-0.0001)).toBe("0.000");
  });
  it("formats intervals with their unit", () => {
    expect(formatInterval([1.495, 1.505])).toBe("1.495–1.505 GHz");
    expect(formatInterval(null)).toBe(DASH);
  });
  it("writes a loaded Q in powers of ten", () => {
    expect(formatQ(1e7)).toBe("1.0 × 10⁷");
    expect(formatQ(2.5e6)).toBe("2.5 × 10⁶");
    expect(formatQ(9.99e6)).toBe("1.0 × 10⁷");
    expect(formatQ(500)).toBe("500");
  });
  it("round-trips any finite GHz value to within half the last digit", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), (x) => {
        expect(Math.abs(Number(formatGHz(x)) - x)).toBeLessThanOrEqual(0.0005 + 1e-9);
      }),
    );
  });
});

describe("formatAge", () => {
  const now = new Date("2026-12-02T12:00:00Z");
  it("uses minutes, hours and days, then the date", () => {
    expect(formatAge("2026-12-02T11:59:30Z", now)).toBe("just now");
    expect(formatAge("2026-12-02T11:55:00Z", now)).toBe("5 min ago");
    expect(formatAge("2026-12-02T09:00:00Z", now)).toBe("3 h ago");
    expect(formatAge("2026-11-29T12:00:00Z", now)).toBe("3 d ago");
    expect(formatAge("2026-01-01T00:00:00Z", now)).toBe("2026-01-01");
    expect(formatAge("not a date", now)).toBe(DASH);
  });
});

describe("nedtStatus", () => {
  it("compares the estimate with the requirement", () => {
    // Example channel of docs/plan-format.md §8.3 "Channel figures at L = 184.81": NEΔT 17.92 K against a 20 K requirement.
    expect(nedtStatus(17.92, 20)).toEqual({ state: "met", marginK: 20 - 17.92 });
    expect(nedtStatus(21, 20).state).toBe("unmet");
    expect(nedtStatus(20 + 1e-10, 20).state).toBe("met");
    expect(nedtStatus(5, null).state).toBe("no-requirement");
    expect(nedtStatus(null, 20).state).toBe("no-estimate");
  });
  it("is met exactly when the margin is not negative", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e3, noNaN: true }),
        fc.double({ min: 0, max: 1e3, noNaN: true }),
        (n, r) => {
          const s = nedtStatus(n, r);
          expect(s.state === "met").toBe(r - n >= -1e-9);
        },
      ),
    );
  });
});

describe("plural", () => {
  it("picks the singular for one", () => {
    expect(plural(1, "error")).toBe("1 error");
    expect(plural(0, "error")).toBe("0 errors");
    expect(plural(2, "chain")).toBe("2 chains");
  });
});
