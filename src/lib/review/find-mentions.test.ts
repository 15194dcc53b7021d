import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { findMentions, type Mentionable } from "./find-mentions";

const members: Mentionable[] = [
  { userId: "u1", email: "ada.lead@example.org", name: "Ada" },
  { userId: "u2", email: "ben@example.org", name: "Ben Okafor" },
  { userId: "u3", email: "ben.o@example.org", name: "Ben" },
];
const ids = (t: string) => findMentions(t, members).map((m) => m.userId);

describe("findMentions", () => {
  it("by e-mail address, case-insensitive, with trailing punctuation", () => {
    expect(ids("please look @ADA.lead@example.org.")).toEqual(["u1"]);
  });
  it("by name; the longest name wins; a name must end at a word boundary", () => {
    expect(ids("@Ben Okafor and @ben, not @Adam")).toEqual(["u2", "u3"]);
  });
  it("order of first mention, no duplicates, unknown people ignored", () => {
    expect(ids("@ben.o@example.org @Ada @ada @nobody@example.org")).toEqual(["u3", "u1"]);
  });
  it("no @ means no mention (property: text without @ never mentions)", () => {
    fc.assert(
      fc.property(
        fc.string().map((s) => s.replace(/@/g, "")),
        (t) => {
          expect(findMentions(t, members)).toEqual([]);
        },
      ),
    );
  });
  it("property: every member is found by @email anywhere in arbitrary text", () => {
    fc.assert(
      fc.property(
        fc.string().map((s) => s.replace(/[@A-Za-z0-9._%+-]/g, " ")),
        fc.constantFrom(...members),
        (pad, m) => {
          expect(findMentions(`${pad} @${m.email} ${pad}`, members).map((x) => x.userId)).toContain(m.userId);
        },
      ),
    );
  });
});
