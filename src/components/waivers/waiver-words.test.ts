import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { errorCountText, waivedErrorCount, waiverOf, waiverText } from "./waiver-words";

const w = { waivedBy: "Erin Engineer", reason: "accepted for the breadboard", waivedAt: "2026-12-03T14:05:09.000Z" };

describe("errorCountText", () => {
  it("reads as the issue asks", () => {
    expect(errorCountText(4, 4)).toBe("4 errors, all waived");
    expect(errorCountText(4, 1)).toBe("4 errors, 1 waived");
    expect(errorCountText(4, 0)).toBe("4 errors");
    expect(errorCountText(1, 1)).toBe("1 error, waived");
    expect(errorCountText(1, 0)).toBe("1 error");
    expect(errorCountText(0, 0)).toBe("0 errors");
  });

  it("never claims more waived than there are errors", () => {
    fc.assert(
      fc.property(fc.nat(50), fc.nat(80), (errors, waived) => {
        const text = errorCountText(errors, waived);
        expect(text.startsWith(`${errors} error`)).toBe(true);
        const m = /, (\d+) waived$/.exec(text);
        if (m) expect(Number(m[1])).toBeLessThan(errors);
        if (text.endsWith("all waived")) expect(waived).toBeGreaterThanOrEqual(errors);
      }),
    );
  });
});

describe("waivers of findings", () => {
  const waivers = new Map([["slot-overlap|A|ch1", w]]);
  it("finds the waiver of an error by its key, and none for warnings or other channels", () => {
    expect(waiverOf({ code: "slot-overlap", severity: "error", chain: "A", channel: "ch1" }, waivers)).toBe(w);
    expect(waiverOf({ code: "slot-overlap", severity: "warning", chain: "A", channel: "ch1" }, waivers)).toBeNull();
    expect(waiverOf({ code: "slot-overlap", severity: "error", chain: "A", channel: "ch2" }, waivers)).toBeNull();
    expect(waiverOf({ code: "slot-overlap", severity: "error", chain: "A", channel: "ch1" }, undefined)).toBeNull();
  });

  it("counts the waived errors", () => {
    const f = (channel: string, severity = "error") => ({ code: "slot-overlap", severity, chain: "A", channel });
    expect(waivedErrorCount([f("ch1"), f("ch2"), f("ch1", "warning")], waivers)).toBe(1);
  });

  it("says who, when and why", () => {
    expect(waiverText(w)).toBe("Waived by Erin Engineer on 2026-12-03 14:05 UTC: “accepted for the breadboard”");
  });
});
