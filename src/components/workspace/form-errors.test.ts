import { describe, expect, it } from "vitest";
import { normalisePath, splitIssues } from "./form-errors";

describe("normalisePath", () => {
  it("turns dotted indices into brackets", () => {
    expect(normalisePath("reach.0.minGHz")).toBe("reach[0].minGHz");
    expect(normalisePath("$.rfInput.maxGHz")).toBe("rfInput.maxGHz");
    expect(normalisePath("centerGHz")).toBe("centerGHz");
  });
});

describe("splitIssues", () => {
  const fields = ["centerGHz", "bandwidthMHz", "rfInput.maxGHz", "reach"];
  it("places issues on fields, with or without a prefix", () => {
    const out = splitIssues(
      [
        { path: "centerGHz", message: "must be greater than 0" },
        { path: "body.bandwidthMHz", message: "is required" },
        { path: "rfInput.maxGHz", message: "must be above minGHz" },
        { path: "reach.1.maxGHz", message: "must be above minGHz" },
      ],
      fields,
    );
    expect(out.fieldErrors).toEqual({
      centerGHz: ["must be greater than 0"],
      bandwidthMHz: ["is required"],
      "rfInput.maxGHz": ["must be above minGHz"],
      "reach[1].maxGHz": ["must be above minGHz"],
    });
    expect(out.formErrors).toEqual([]);
  });
  it("keeps unknown paths as form errors naming the path", () => {
    const out = splitIssues(
      [
        { path: "key", message: "is already used" },
        { path: "", message: "a laser serves one chain" },
      ],
      fields,
    );
    expect(out.formErrors).toEqual(["key: is already used", "a laser serves one chain"]);
  });
});
