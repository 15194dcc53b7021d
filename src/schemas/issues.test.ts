import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { formatPath, zodIssues } from "./issues";

describe("formatPath", () => {
  it("writes keys with dots and indices in brackets, quoting keys that are not plain names", () => {
    expect(formatPath([])).toBe("");
    expect(formatPath(["reach", 0, "maxGHz"])).toBe("reach[0].maxGHz");
    expect(formatPath([3, "id"])).toBe("[3].id");
    expect(formatPath(["settings", "a b"])).toBe('settings["a b"]');
    expect(formatPath(["x-y"])).toBe('["x-y"]');
  });

  it("agrees with a plain join for paths of plain names and indices", () => {
    // A simpler implementation: names joined by dots, indices as [i].
    const simple = (path: (string | number)[]) =>
      path.reduce<string>((s, seg) => (typeof seg === "number" ? `${s}[${seg}]` : s ? `${s}.${seg}` : seg), "");
    const name = fc.stringMatching(/^[A-Za-z_][A-Za-z0-9_]{0,8}$/);
    const seg = fc.oneof(name, fc.nat({ max: 999 }));
    fc.assert(fc.property(fc.array(seg, { maxLength: 6 }), (path) => formatPath(path) === simple(path)));
  });
});

describe("zodIssues", () => {
  const schema = z
    .object({
      email: z.email("not an e-mail address"),
      reach: z.array(z.object({ maxGHz: z.number("must be a number") })),
    })
    .strict();

  it("reports every issue with its formatted path, in zod's order", () => {
    const r = schema.safeParse({ email: "nope", reach: [{ maxGHz: 1 }, { maxGHz: "x" }] });
    expect(r.success).toBe(false);
    if (r.success) return;
    expect(zodIssues(r.error)).toEqual([
      { path: "email", message: "not an e-mail address" },
      { path: "reach[1].maxGHz", message: "must be a number" },
    ]);
  });

  it("names unknown keys in the message, at the object's path", () => {
    const r = schema.safeParse({ email: "a@b.org", reach: [], surprise: 1, extra: 2 });
    expect(r.success).toBe(false);
    if (r.success) return;
    expect(zodIssues(r.error)).toEqual([{ path: "", message: "unknown field surprise, extra" }]);
  });
});
