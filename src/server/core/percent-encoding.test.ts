import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { escapeNonUtf8, notUtf8Issues } from "./percent-encoding";

describe("escapeNonUtf8", () => {
  it.each([
    ["/api/v1/missions/abc?chain=A", "/api/v1/missions/abc?chain=A", []],
    ["/caf%C3%A9?q=%E2%9C%93", "/caf%C3%A9?q=%E2%9C%93", []],
    ["/api/team/members/%FF", "/api/team/members/%25FF", ["path"]],
    ["/x?chain=%FF%FE&ok=1", "/x?chain=%25FF%25FE&ok=1", ["query:chain"]],
    ["/x?%FF=1", "/x?%25FF=1", ["query:%25FF"]],
    ["/%C3?a=%C3%A9", "/%25C3?a=%C3%A9", ["path"]],
    ["/x?a=100%", "/x?a=100%", []],
  ])("%s", (input, target, places) => {
    expect(escapeNonUtf8(input)).toEqual({ target, places });
  });

  it("the escaped target always decodes, and a target that decoded is left alone (property)", () => {
    const bytes = fc.array(fc.integer({ min: 0, max: 255 }), { maxLength: 6 });
    const enc = (b: number[]) => b.map((x) => `%${x.toString(16).padStart(2, "0").toUpperCase()}`).join("");
    fc.assert(
      fc.property(bytes, bytes, (p, q) => {
        const input = `/a/${enc(p)}?k=${enc(q)}`;
        const { target, places } = escapeNonUtf8(input);
        expect(() => decodeURIComponent(target)).not.toThrow();
        const fine = (() => {
          try {
            decodeURIComponent(input);
            return true;
          } catch {
            return false;
          }
        })();
        if (fine) expect({ target, places }).toEqual({ target: input, places: [] });
        else expect(places.length).toBeGreaterThan(0);
      }),
    );
  });

  it("names the places as issues", () => {
    expect(notUtf8Issues("path,query:chain")).toEqual([
      { path: "", message: "the address is not valid UTF-8 (percent-encoding)" },
      { path: "chain", message: "is not valid UTF-8 (percent-encoding)" },
    ]);
    expect(notUtf8Issues(null)).toEqual([]);
  });
});
