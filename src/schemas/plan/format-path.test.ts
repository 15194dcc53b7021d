import { describe, expect, it } from "vitest";
import { formatPath } from "../plan";

// JSON paths of the issues.

describe("paths", () => {
  it("formats keys and indices like JavaScript accessors", () => {
    expect(formatPath([])).toBe("");
    expect(formatPath(["channels", 2, "bandwidthMHz"])).toBe("channels[2].bandwidthMHz");
    expect(formatPath(["lasers", 0, "reach", 1, "maxGHz"])).toBe("lasers[0].reach[1].maxGHz");
    expect(formatPath(["chains", 0, "laser"])).toBe("chains[0].laser");
    expect(formatPath(["settings", "a b"])).toBe('settings["a b"]');
    expect(formatPath(["1x"])).toBe('["1x"]');
    expect(formatPath(["a", 'q"'])).toBe('a["q\\""]');
  });
});
