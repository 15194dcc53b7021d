import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { unwaivedErrors } from "./unwaived-errors";
import { findingKey } from "./finding-key";
import type { FindingLike } from "./types";

const f = (code: string, severity: FindingLike["severity"], channel: string | null = "wv1"): FindingLike => ({
  code,
  severity,
  chain: "A",
  channel,
  message: "m",
});

describe("unwaivedErrors", () => {
  it("warnings and infos never block; a waiver covers its rule on its chain and channel", () => {
    const list = [f("image-in-mode", "error"), f("image-in-mode", "error", "o2"), f("replica-share", "warning")];
    expect(findingKey(list[0]!)).toBe("image-in-mode|A|wv1");
    expect(findingKey(f("lo-in-band", "error", null))).toBe("lo-in-band|A|");
    expect(unwaivedErrors(list, ["image-in-mode|A|wv1"])).toEqual([list[1]]);
    expect(unwaivedErrors(list, [])).toEqual(list.slice(0, 2));
  });
  it("property: waiving every error key leaves nothing; waiving nothing leaves every error", () => {
    const finding = fc.record({
      code: fc.constantFrom("a", "b"),
      severity: fc.constantFrom<FindingLike["severity"]>("error", "warning", "info"),
      chain: fc.constantFrom("A", "B"),
      channel: fc.constantFrom<string | null>(null, "x"),
      message: fc.string(),
    });
    fc.assert(
      fc.property(fc.array(finding), (list) => {
        expect(unwaivedErrors(list, list.map(findingKey))).toEqual([]);
        expect(unwaivedErrors(list, [])).toEqual(list.filter((x) => x.severity === "error"));
      }),
    );
  });
});
