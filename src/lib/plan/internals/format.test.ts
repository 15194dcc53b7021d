import { describe, expect, it } from "vitest";
import { fBand, fDB, fGHz, fK, fMHz, pair } from "./format";

describe("message number formats", () => {
  it("drop float dust and trailing zeros", () => {
    expect(fGHz(1.4750000000000045)).toBe("1.475");
    expect(fMHz(0.012000000000000011)).toBe("12");
    expect(fDB(49.48171342092203)).toBe("49.48");
    expect(fK(17.922685151149917)).toBe("17.923");
    expect(fK(0.000123456)).toBe("0.00012346");
    expect(fBand([1.4750000000000045, 1.5249999999999955])).toBe("1.475–1.525 GHz");
  });

  it("never print −0 and keep huge values readable", () => {
    expect(fGHz(-1e-12)).toBe("0");
    expect(fMHz(-0)).toBe("0");
    expect(pair([-0, 1])[0]).toBe(0);
    expect(Object.is(pair([-0, 1])[0], -0)).toBe(false);
    expect(fGHz(1e300)).toBe("1e+300");
  });
});
