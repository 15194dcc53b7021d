import { describe, expect, it } from "vitest";
import { RULE_ORDER } from "@/lib/plan/types";
import { explainCode } from "./explain-code";

describe("explainCode", () => {
  it("has its own sentence for every rule code of docs/plan-format.md §4.1", () => {
    for (const code of RULE_ORDER) expect(explainCode(code)).not.toBe(`Rule ${code}.`);
    const texts = RULE_ORDER.map(explainCode);
    expect(new Set(texts).size).toBe(texts.length);
  });
  it("names an unknown code rather than failing", () => {
    expect(explainCode("no-such-rule")).toBe("Rule no-such-rule.");
  });
});
