import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { InviteSchema, ResetPasswordSchema, SignUpSchema, slugFromName } from "./auth";

describe("SignUpSchema", () => {
  it("accepts a normal sign-up and lower-cases the e-mail", () => {
    const r = SignUpSchema.parse({ name: " Ada ", email: " Ada@Example.ORG ", password: "0123456789" });
    expect(r).toEqual({ name: "Ada", email: "ada@example.org", password: "0123456789" });
  });

  it("names each bad field", () => {
    const r = SignUpSchema.safeParse({ name: "", email: "no-at-sign", password: "123456789" });
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path.join(".")).sort();
    expect(paths).toEqual(["email", "name", "password"]);
    expect(r.error!.issues.find((i) => i.path[0] === "password")!.message).toBe(
      "Password must be at least 10 characters.",
    );
  });

  it("password length boundary: 9 refused, 10 accepted, 128 accepted, 129 refused", () => {
    const at = (n: number) => SignUpSchema.safeParse({ name: "A", email: "a@b.org", password: "x".repeat(n) }).success;
    expect([at(9), at(10), at(128), at(129)]).toEqual([false, true, true, false]);
  });
});

describe("ResetPasswordSchema", () => {
  it("puts a mismatch on the confirm field", () => {
    const r = ResetPasswordSchema.safeParse({ token: "t", password: "0123456789", confirm: "0123456780" });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path.join("."))).toEqual(["confirm"]);
  });
});

describe("InviteSchema", () => {
  it("knows exactly the four roles", () => {
    for (const role of ["owner", "lead", "engineer", "viewer"])
      expect(InviteSchema.safeParse({ email: "a@b.org", role }).success).toBe(true);
    for (const role of ["admin", "member", "", "Owner"])
      expect(InviteSchema.safeParse({ email: "a@b.org", role }).success).toBe(false);
  });
});

describe("slugFromName", () => {
  it("turns a name into lower-case words joined by hyphens", () => {
    expect(slugFromName("Demo: Aurora sounder team", "ab12cd")).toBe("demo-aurora-sounder-team-ab12cd");
    expect(slugFromName("Équipe Ørsted 183 GHz", "x")).toBe("equipe-rsted-183-ghz-x");
    expect(slugFromName("!!!", "x")).toBe("team-x");
  });

  it("always yields a URL-safe slug ending in the suffix, at most 40 + suffix characters", () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 200 }), fc.stringMatching(/^[a-f0-9]{6}$/), (name, suffix) => {
        const s = slugFromName(name, suffix);
        expect(s).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
        expect(s.endsWith(`-${suffix}`) || s === suffix).toBe(true);
        expect(s.length).toBeLessThanOrEqual(41 + suffix.length);
      }),
    );
  });
});
