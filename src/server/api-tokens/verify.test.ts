import fc from "fast-check";
import { describe, expect, it, vi } from "vitest";

// Only the header parsing is tested here (no database): what reaches the
// plugin's check, and what is refused before it.
vi.mock("@/server/auth/auth", () => ({ auth: { api: {} } }));
vi.mock("@db/client", () => ({ db: {} }));
vi.mock("@/server/core/db", () => ({ inTransaction: vi.fn() }));
const { bearerToken } = await import("./verify");

const letters = fc.string({
  unit: fc.constantFrom(..."abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ"),
  minLength: 64,
  maxLength: 64,
});

describe("bearerToken", () => {
  it("reads `Bearer <token>` (scheme in any case)", () => {
    const t = `hl_${"Q".repeat(64)}`;
    expect(bearerToken(`Bearer ${t}`)).toBe(t);
    expect(bearerToken(`bearer ${t}`)).toBe(t);
  });

  it("refuses everything else with 401 invalid-token, never echoing the header", () => {
    const t = `hl_${"Q".repeat(64)}`;
    for (const h of [
      "",
      "Bearer",
      `Basic ${t}`,
      `Bearer ${t.slice(0, -1)}`,
      `Bearer ${t}x`,
      `Bearer ${t} extra`,
      `Token ${t}`,
      `Bearer hl_${"1".repeat(64)}`,
    ]) {
      try {
        bearerToken(h);
        expect.unreachable(`accepted ${h}`);
      } catch (e) {
        expect(e).toMatchObject({ status: 401, code: "invalid-token" });
        expect((e as Error).message).not.toContain(t.slice(3, 20));
      }
    }
  });

  it("property: any well-formed token is read back unchanged; any other character makes it malformed", () => {
    fc.assert(
      fc.property(letters, fc.nat(63), fc.constantFrom("0", "-", "_", "é", " ", "."), (body, at, bad) => {
        const good = `hl_${body}`;
        expect(bearerToken(`Bearer ${good}`)).toBe(good);
        const broken = `hl_${body.slice(0, at)}${bad}${body.slice(at + 1)}`;
        expect(() => bearerToken(`Bearer ${broken}`)).toThrow();
      }),
    );
  });
});
