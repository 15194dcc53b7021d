import { describe, expect, it } from "vitest";
import { REVIEW_STATES } from "./types";
import { reviewStateLabel } from "./review-state-label";

describe("reviewStateLabel", () => {
  it("says Returned for the state that is stored as changes-requested", () => {
    expect(reviewStateLabel("changes-requested")).toBe("Returned");
    expect(reviewStateLabel("changes-requested", { outcome: true })).toBe("returned for rework");
    expect(reviewStateLabel("withdrawn", { outcome: true })).toBe("withdrawn by an edit");
  });

  it("gives every state a label in words, never its code", () => {
    for (const s of REVIEW_STATES) {
      const label = reviewStateLabel(s);
      expect(label).not.toBe(s);
      expect(label).not.toMatch(/-|changes|request/i);
    }
  });

  it("shows an unknown code as it is", () => {
    expect(reviewStateLabel("archived")).toBe("archived");
  });
});
