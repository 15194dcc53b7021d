import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { findMentions, type Mentionable } from "./find-mentions";
import { resolveMentions } from "./resolve-mentions";
import { unresolvedMentionsMessage } from "./unresolved-mentions-message";

const members: Mentionable[] = [
  { userId: "u1", email: "erin.e@example.org", name: "Erin Engineer" },
  { userId: "u2", email: "lee@example.org", name: "Lee Lead" },
  { userId: "u3", email: "erin.o@example.org", name: "Erin Owner" },
  { userId: "u4", email: "vic@example.org", name: "Victor" },
];
const ids = (t: string) => resolveMentions(t, members).mentioned.map((m) => m.userId);
const unresolved = (t: string) => resolveMentions(t, members).unresolved.map((u) => u.written);

describe("resolveMentions", () => {
  it("the issue's three ways of naming Erin: by first name when it is unique, quoted full name, full name", () => {
    const solo = members.filter((m) => m.userId !== "u3");
    const solved = (t: string) => resolveMentions(t, solo).mentioned.map((m) => m.userId);
    expect(solved("@erin please look")).toEqual(["u1"]);
    expect(solved("@Erin, please look")).toEqual(["u1"]);
    expect(solved('@"Erin Engineer" please look')).toEqual(["u1"]);
    expect(solved("@Erin Engineer please look")).toEqual(["u1"]);
  });

  it("by e-mail address and by the part before its @", () => {
    expect(ids("@LEE@example.org and @vic.")).toEqual(["u2", "u4"]);
  });

  it("a first name two people share is unresolved and names both", () => {
    const r = resolveMentions("@erin?", members);
    expect(r.mentioned).toEqual([]);
    expect(r.unresolved).toEqual([{ written: "@erin", at: 0, candidates: ["Erin Engineer", "Erin Owner"] }]);
    expect(unresolvedMentionsMessage(r.unresolved)).toBe(
      "@erin fits Erin Engineer and Erin Owner: write the full name or the e-mail address",
    );
  });

  it("unknown names, quoted names and addresses are unresolved", () => {
    expect(unresolved('@nobody and @"No Body" and @x@example.org')).toEqual([
      "@nobody",
      '@"No Body"',
      "@x@example.org",
    ]);
    expect(unresolvedMentionsMessage(resolveMentions("@nobody", members).unresolved)).toBe(
      "no team member is called @nobody",
    );
  });

  it("an @ inside a word or an address, or alone, is no mention", () => {
    expect(resolveMentions("mail bob@example.org, or me @ home; 3@4", members)).toEqual({
      mentioned: [],
      unresolved: [],
    });
  });

  it("order of first mention, each member once", () => {
    expect(ids("@vic @Lee Lead @victor @lee")).toEqual(["u4", "u2"]);
  });

  it("property: text without @ mentions nobody and leaves nothing unresolved", () => {
    fc.assert(
      fc.property(
        fc.string().map((s) => s.replace(/@/g, "")),
        (t) => {
          expect(resolveMentions(t, members)).toEqual({ mentioned: [], unresolved: [] });
        },
      ),
    );
  });

  it("property: agrees with findMentions on every member it finds by e-mail or full name (the simpler reading)", () => {
    const sep = fc.constantFrom(" ", ", ", "; ", "\n", "! ");
    const token = fc.constantFrom(...members.flatMap((m) => [`@${m.email}`, `@${m.name}`]));
    fc.assert(
      fc.property(fc.array(fc.tuple(token, sep), { maxLength: 6 }), (parts) => {
        const text = parts.map(([t, s]) => t + s).join("");
        const r = resolveMentions(text, members);
        expect(r.unresolved).toEqual([]);
        expect(r.mentioned.map((m) => m.userId)).toEqual(findMentions(text, members).map((m) => m.userId));
      }),
    );
  });
});
