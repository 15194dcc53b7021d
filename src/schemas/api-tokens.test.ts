import { describe, expect, it } from "vitest";
import { zodIssues } from "./issues";
import { createTokenRequestSchema, createTokenSchema, TOKEN_LIMITS } from "./api-tokens";

const ok = { name: "ci", teamId: "t1", role: "viewer" };

describe("createTokenSchema", () => {
  it("fills the defaults: 90 days, 120 requests a minute", () => {
    expect(createTokenSchema.parse(ok)).toEqual({ ...ok, expiresInDays: 90, requestsPerMinute: 120 });
  });

  it("names every bad field", () => {
    const r = createTokenSchema.safeParse({
      name: " ",
      teamId: "",
      role: "admin",
      expiresInDays: 0,
      requestsPerMinute: 1.5,
    });
    expect(r.success).toBe(false);
    const issues = zodIssues(r.error!);
    expect(Object.fromEntries(issues.map((i) => [i.path, i.message]))).toEqual({
      name: "Give the token a name.",
      teamId: "Choose a team.",
      role: "Choose a role: owner, lead, engineer or viewer.",
      expiresInDays: "Days until expiry must be at least 1",
      requestsPerMinute: "Requests per minute must be a whole number",
    });
  });

  it("bounds: expiry 1–365 days, 1–600 requests a minute, names up to 60 characters", () => {
    const at = (patch: object) => createTokenSchema.safeParse({ ...ok, ...patch }).success;
    expect([at({ expiresInDays: 1 }), at({ expiresInDays: 365 }), at({ expiresInDays: 366 })]).toEqual([
      true,
      true,
      false,
    ]);
    expect([at({ requestsPerMinute: 1 }), at({ requestsPerMinute: 600 }), at({ requestsPerMinute: 601 })]).toEqual([
      true,
      true,
      false,
    ]);
    expect([
      at({ name: "x".repeat(TOKEN_LIMITS.nameMax) }),
      at({ name: "x".repeat(TOKEN_LIMITS.nameMax + 1) }),
    ]).toEqual([true, false]);
  });

  it("the form schema ignores extra fields (React sends its own); the JSON body refuses them", () => {
    expect(createTokenSchema.safeParse({ ...ok, $ACTION_KEY: "k" }).success).toBe(true);
    const r = createTokenRequestSchema.safeParse({ ...ok, colour: "red" });
    expect(r.success).toBe(false);
    expect(
      zodIssues(r.error!)
        .map((i) => i.message)
        .join(" "),
    ).toMatch(/colour/);
  });
});
