/**
 * Issue 17: redirects after sign-in stay on the app (point 3), the
 * invitation page shows the invited address only to the invitee, and the
 * captured-mail page answers only clients on this machine. (The sign-up
 * form's same answer for known and new addresses is in auth.test.ts; the
 * rate limits behind and without a proxy in hardening-rate-limit.test.ts.)
 */
import { networkInterfaces } from "node:os";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  BASE_URL,
  TestClient,
  TEST_PASSWORD,
  closeTestPool,
  makeTeamWithRoles,
  newVerifiedUser,
  uniqueEmail,
  type TeamWithRoles,
} from "../setup/auth-helpers";
import { submitPageForm } from "../setup/page-forms";
import { requestFrom } from "../setup/raw-http";

let t: TeamWithRoles;

beforeAll(async () => {
  t = await makeTeamWithRoles();
}, 240_000);
afterAll(closeTestPool);

describe("the page after sign-in is always on this site", () => {
  async function signInWithNext(next: string) {
    const c = new TestClient();
    c.email = t.engineer.email;
    return submitPageForm(c, `/sign-in?next=${encodeURIComponent(next)}`, {
      email: t.engineer.email,
      password: TEST_PASSWORD,
      next,
    });
  }

  it.each([
    ["a tab after the slash (issue 17: browsers open http://evil.example/)", "/\t/evil.example"],
    ["a newline (issue 17: it gave a 500)", "/missions\r\nSet-Cookie: forged=1"],
    ["a scheme-relative address", "//evil.example/path"],
    ["a backslash", "/\\evil.example"],
    ["an absolute address", "https://evil.example/"],
  ])("%s: goes to the missions instead", async (_name, next) => {
    const r = await signInWithNext(next);
    expect(r.status).toBe(303);
    expect(r.location).toBe("/missions");
  });

  it("a path of this site is kept", async () => {
    const r = await signInWithNext("/team?tab=members");
    expect([r.status, r.location]).toEqual([303, "/team?tab=members"]);
  });

  it("the sign-in and confirmation pages with such a next render (no 500) and link only to this site", async () => {
    for (const path of ["/sign-in", "/sign-up", "/verify-email/result"]) {
      const res = await new TestClient().fetch(`${path}?next=${encodeURIComponent("/\n/evil.example")}`);
      expect([path, res.status]).toEqual([path, 200]);
      // The unsafe next is dropped, not carried into links or the form (the router state echoes the address itself).
      const html = await res.text();
      const carried = [...html.matchAll(/(?:href|value|action)="([^"]*)"/g)]
        .map((m) => m[1])
        .filter((v) => v!.includes("evil"));
      expect([path, carried]).toEqual([path, []]);
    }
  });
});

describe("the invitation page shows the invited address only to the invitee", () => {
  it("signed out, signed in as someone else, and as the invitee", async () => {
    const invitee = await newVerifiedUser("invitee");
    const sent = await t.owner.fetch("/api/team/invitations", {
      method: "POST",
      json: { email: invitee.email, role: "viewer" },
    });
    expect(sent.status).toBe(201);
    const { id } = await sent.json();
    const page = async (c: TestClient) => (await c.fetch(`/invitations/${id}`)).text();

    const signedOut = await page(new TestClient());
    expect(signedOut).toContain('data-invitation-state="signed-out"');
    expect(signedOut).not.toContain(invitee.email);
    expect(signedOut).not.toContain(encodeURIComponent(invitee.email));

    const other = await page(t.engineer);
    expect(other).toContain('data-invitation-state="other-account"');
    expect(other).not.toContain(invitee.email);

    const own = await page(invitee);
    expect(own).toContain('data-invitation-state="ready"');
    expect(own).toContain(invitee.email);
  });
});

describe("the captured-mail page answers only this machine", () => {
  const external = Object.values(networkInterfaces())
    .flat()
    .find((i) => i && i.family === "IPv4" && !i.internal)?.address;

  it("from a loopback address: served", async () => {
    const res = await requestFrom("127.0.0.1", `${BASE_URL.replace("localhost", "127.0.0.1")}/dev/mail`);
    expect(res.status).toBe(200);
    expect(res.text).toContain("Captured e-mail");
  });

  it.skipIf(!external)(
    "from this machine's network address (not loopback): 404, even with a forged client-address header",
    async () => {
      const port = new URL(BASE_URL).port || "80";
      const res = await requestFrom(external!, `http://${external}:${port}/dev/mail`, {
        headers: { "x-heterolane-client-address": "127.0.0.1" },
      });
      expect(res.status).toBe(404);
      expect(res.text).not.toContain("data-mail-to");
      expect(res.text).not.toContain("Development only: messages");
    },
  );
});

describe("sign-up through the form cannot tell registered addresses", () => {
  it("a registered and a new address get the same redirect", async () => {
    const registered = await submitPageForm(new TestClient(), "/sign-up", {
      name: "Probe",
      email: t.viewer.email,
      password: TEST_PASSWORD,
    });
    const fresh = uniqueEmail("probe");
    const unknown = await submitPageForm(new TestClient(), "/sign-up", {
      name: "Probe",
      email: fresh,
      password: TEST_PASSWORD,
    });
    expect(registered.status).toBe(unknown.status);
    expect(registered.location?.split("?")[0]).toBe(unknown.location?.split("?")[0]);
    expect(registered.html).not.toContain("already");
  });
});
