import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { INT4_MAX, formRules, documentRules, paramTextSchema, textProblem, withTextRule } from "./fields";

/** The rule written out plainly, code point by code point (an independent implementation). */
function simpleProblem(s: string, multiLine: boolean): boolean {
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    const allowed = multiLine && (c === 9 || c === 10 || c === 13);
    if (!allowed && (c < 0x20 || (c >= 0x7f && c <= 0x9f))) return true;
    if (c >= 0xd800 && c <= 0xdbff) {
      const n = s.charCodeAt(i + 1);
      if (!(n >= 0xdc00 && n <= 0xdfff)) return true;
      i++;
    } else if (c >= 0xdc00 && c <= 0xdfff) return true;
  }
  return false;
}

describe("the shared text rule", () => {
  it.each([
    ["plain text", "Aurora sounder, 183 GHz", false, null],
    ["non-ASCII letters and symbols", "Straße ± µ 🚀", false, null],
    ["NUL", "a\u0000b", false, "must not contain control characters (found U+0000)"],
    ["tab in a single line", "a\tb", false, "must not contain control characters (found U+0009)"],
    ["newline in a single line", "a\nb", false, "must not contain control characters (found U+000A)"],
    ["tab and CR LF in multi-line text", "a\tb\r\nc", true, null],
    [
      "NUL in multi-line text",
      "a\n\u0000",
      true,
      "must not contain control characters (found U+0000; tabs and line breaks are fine)",
    ],
    ["escape", "\u001b[31m", true, "must not contain control characters (found U+001B; tabs and line breaks are fine)"],
    ["DEL", "a\u007f", false, "must not contain control characters (found U+007F)"],
    ["C1 control", "a\u0085", false, "must not contain control characters (found U+0085)"],
    ["lone high surrogate", "a\ud800b", false, "is not valid Unicode text (a lone surrogate U+D800)"],
    ["lone low surrogate", "\udc00", false, "is not valid Unicode text (a lone surrogate U+DC00)"],
  ])("%s", (_name, value, multiLine, want) => {
    expect(textProblem(value, { multiLine })).toBe(want);
  });

  it("agrees with a plain loop over the code units (property)", () => {
    const chars = fc.oneof(
      fc.string({ unit: "binary", maxLength: 12 }),
      fc.string({ unit: fc.integer({ min: 0, max: 0xffff }).map((c) => String.fromCharCode(c)), maxLength: 8 }),
    );
    fc.assert(
      fc.property(chars, fc.boolean(), (s, multiLine) => {
        expect(textProblem(s, { multiLine }) !== null).toBe(simpleProblem(s, multiLine));
      }),
      { numRuns: 500 },
    );
  });

  it("a schema with the rule reports the field error at the field's path", () => {
    const schema = z.object({ name: withTextRule(z.string().trim().max(10)) });
    const r = schema.safeParse({ name: "x\u0000" });
    expect(r.success).toBe(false);
    if (!r.success)
      expect(r.error.issues).toMatchObject([{ path: ["name"], message: expect.stringContaining("U+0000") }]);
    expect(schema.parse({ name: " ok " })).toEqual({ name: "ok" });
    expect(paramTextSchema(5).safeParse("abcdef").success).toBe(false);
    expect(paramTextSchema().safeParse("%00").success).toBe(true);
  });
});

describe("whole numbers of the forms fit an integer column", () => {
  it("the form dialect refuses 2³¹ and above, the plan document does not", () => {
    expect(formRules.count(1).safeParse(INT4_MAX).success).toBe(true);
    expect(formRules.count(1).safeParse(INT4_MAX + 1).success).toBe(false);
    expect(formRules.count(1).safeParse(2 ** 53).success).toBe(false);
    // The plan format takes any whole number (the import path checks what it stores).
    expect(documentRules.count(1).safeParse(1e12).success).toBe(true);
    expect(INT4_MAX).toBe(2 ** 31 - 1);
  });
});
