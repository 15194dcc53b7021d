import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { safeNext } from "./errors";

describe("safeNext", () => {
  it.each([
    ["/missions/abc?tab=lanes#x", "/missions/abc?tab=lanes#x"],
    ["/invitations/a%20b", "/invitations/a%20b"],
    ["/team/../missions", "/missions"],
    ["/café", "/caf%C3%A9"],
  ])("keeps the same-origin path %s", (next, want) => {
    expect(safeNext(next)).toBe(want);
  });

  it.each([
    ["tab after the slash (issue 17: browsers drop it and open //evil.example)", "/\t/evil.example"],
    ["newline (issue 17: it broke the Location header with a 500)", "/missions\nSet-Cookie: x=1"],
    ["carriage return", "/\r/evil.example"],
    ["NUL", "/\u0000/evil.example"],
    ["scheme-relative", "//evil.example/"],
    ["backslash", "/\\evil.example"],
    ["backslash later", "/x\\..\\..\\\\evil.example"],
    ["absolute URL", "https://evil.example/"],
    ["javascript: URL", "javascript:alert(1)"],
    ["relative without slash", "missions"],
    ["empty", ""],
    ["C1 control", "/\u0085/evil.example"],
  ])("refuses %s", (_name, next) => {
    expect(safeNext(next)).toBe("/missions");
    expect(safeNext(next, "/teams/new")).toBe("/teams/new");
  });

  it("refuses what is not a string", () => {
    for (const v of [undefined, null, 1, ["/missions"], {}]) expect(safeNext(v)).toBe("/missions");
  });

  it("never gives a target off this origin, whatever the input (property)", () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string(),
          fc.string().map((s) => `/${s}`),
          fc.webUrl(),
        ),
        (next) => {
          const out = safeNext(next, "/fallback");
          // Resolved against a page of the app, the target stays on the app's origin …
          expect(new URL(out, "https://app.example/sign-in").origin).toBe("https://app.example");
          // … and holds nothing a browser would strip or turn into a slash.
          expect(out).not.toMatch(/[\u0000-\u001f\u007f-\u009f\\]/);
          expect(out.startsWith("//")).toBe(false);
        },
      ),
    );
  });
});
