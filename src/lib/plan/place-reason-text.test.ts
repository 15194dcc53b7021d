import { describe, expect, it } from "vitest";
import { placeReasonText } from "./place-reason-text";

describe("placeReasonText", () => {
  it("says each reason in words, without its code", () => {
    for (const r of ["no-feasible-interval", "no-grid-point"] as const) {
      const t = placeReasonText(r);
      expect(t).toMatch(/ /);
      expect(t).not.toContain("-");
    }
    expect(placeReasonText("no-grid-point")).toContain("tuning step");
  });

  it("is null when an LO was suggested", () => {
    expect(placeReasonText(null)).toBeNull();
    expect(placeReasonText(undefined)).toBeNull();
  });
});
