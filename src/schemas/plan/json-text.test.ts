import { describe, expect, it } from "vitest";
import { jsonErrorOffset, parsePlanText } from "../plan";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";

// Plans given as JSON text: byte order mark, syntax errors and where they are.

describe("parsePlanText", () => {
  it("accepts valid JSON text, with or without a byte-order mark", () => {
    const text = JSON.stringify(validPlanInput(), null, 2);
    expect(parsePlanText(text).ok).toBe(true);
    expect(parsePlanText(`\ufeff${text}`).ok).toBe(true);
  });
  it("reports a syntax error as one issue with the empty path and the position", () => {
    expect(parsePlanText('{\n  "format": "heterolane.plan/1",\n  "name": ,\n}')).toEqual({
      ok: false,
      issues: [{ path: "", message: 'not valid JSON: unexpected "," at line 3, column 11' }],
    });
    expect(parsePlanText("")).toEqual({
      ok: false,
      issues: [{ path: "", message: "not valid JSON: unexpected end of input at line 1, column 1" }],
    });
    expect(parsePlanText('{"a": [1, 2')).toEqual({
      ok: false,
      issues: [{ path: "", message: "not valid JSON: unexpected end of input at line 1, column 12" }],
    });
  });
  it("locates the error where JSON.parse stops (agrees with the RFC 8259 grammar on small cases)", () => {
    const cases: [string, number][] = [
      ["[1,2,]", 5],
      ['{"a":1,}', 7],
      ['{"a":1} x', 8],
      ['"\\x"', 2],
      ["01", 1],
      ['{"a" 1}', 5],
      ["[1 2]", 3],
      ["-", 1],
      ["1.", 2],
      ["NaN", 0],
      ['{"a":Infinity}', 5],
      ["tru", 3],
      ['"a\nb"', 2],
    ];
    for (const [text, at] of cases) {
      expect(() => JSON.parse(text)).toThrow();
      expect(jsonErrorOffset(text), text).toBe(at);
    }
    // On valid text the scanner reaches the end.
    for (const text of ['{"a":[1,-2.5e3,true,false,null,"\\u00e9"]}', "[[[[]]]]", " 0 "]) {
      expect(() => JSON.parse(text)).not.toThrow();
      expect(jsonErrorOffset(text)).toBe(text.length);
    }
  });
  it("does not overflow the stack on deeply nested text", () => {
    const deep = "[".repeat(200_000);
    const r = parsePlanText(deep);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0]!.message).toMatch(/unexpected end of input/);
  });
});
