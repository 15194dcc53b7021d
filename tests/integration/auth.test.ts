/**
 * Sign-up, e-mail confirmation, sign-in, teams, invitations and role checks,
 * over HTTP against the running app and its real PostgreSQL
 * (HETEROLANE_TEST_URL, DATABASE_URL).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  BASE_URL,
  TestClient,
  TEST_PASSWORD,
  acceptInvite,
  closeTestPool,
  createTeam,
  firstLink,
  invite,
  makeTeamWithRoles,
  newVerifiedUser,
  readMail,
  signIn,
  signUp,
  testPool,
  uniqueEmail,
  verifyFromMail,
  type TeamWithRoles,
} from "../setup/auth-helpers";

async function userCount(email: string): Promise<number> {
  const { rows } = await testPool().query<{ n: number }>(`select count(*)::int as n from "user" where email = $1`, [
    email,
  ]);
  return rows[0]!.n;
}

/**
 * Submits a page's form the way a browser without JavaScript does (a
 * multipart POST carrying React's hidden action fields) and returns the
 * re-rendered HTML. Exercises the real server action with conform + zod.
 */
async function submitPageForm(
  c: TestClient,
  path: string,
  fields: Record<string, string>,
): Promise<{ status: number; html: string; location: string | null }> {
  const page = await c.fetch(path);
  const html = await page.text();
  const form = new FormData();
  for (const m of html.matchAll(/<input type="hidden" name="(\$ACTION[^"]*)"(?: value="([^"]*)")?\/>/g)) {
    form.append(m[1]!, (m[2] ?? "").replace(/&quot;/g, '"').replace(/&amp;/g, "&"));
  }
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  const res = await c.fetch(path, { method: "POST", body: form });
  return { status: res.status, html: await res.text(), location: res.headers.get("location") };
}

afterAll(async () => {
  await closeTestPool();
});

describe("health", () => {
  it("answers 200", async () => {
    const res = await fetch(`${BASE_URL}/api/health`);
    expect(res.status).toBe(200);
  });
});

describe("sign-up, confirmation, sign-in", () => {
  it("sends a confirmation mail, refuses sign-in before confirming, and signs in after", async () => {
    const c = await signUp();
    const mail = await readMail(c.email, /confirm your e-mail/i);
    expect(mail.subject).toBe("Confirm your e-mail address for Heterolane");
    expect(mail.text).toContain("/api/auth/verify-email?token=");
    expect(mail.html).toContain("<a href=");

    const early = await new TestClient().postJson("/api/auth/sign-in/email", {
      email: c.email,
      password: TEST_PASSWORD,
      callbackURL: "/verify-email/result",
    });
    expect(early.status).toBe(403);
    expect(early.body.code).toBe("EMAIL_NOT_VERIFIED");
    // Signing in unconfirmed sends a fresh confirmation link.
    let count = 0;
    for (let i = 0; i < 50 && count < 2; i++) {
      const { rows } = await testPool().query(`select 1 from captured_mail where $1 = any(recipients)`, [c.email]);
      count = rows.length;
      if (count < 2) await new Promise((r) => setTimeout(r, 100));
    }
    expect(count).toBe(2);

    const target = await verifyFromMail(c);
    expect(target).toContain("/verify-email/result");
    // Auto sign-in after confirmation: the session is there.
    const session = await c.fetch("/api/auth/get-session");
    const body = await session.json();
    expect(body.user.email).toBe(c.email);
    expect(body.user.emailVerified).toBe(true);

    const again = new TestClient();
    again.email = c.email;
    await signIn(again);
    expect(again.cookies.size).toBeGreaterThan(0);
    const wrong = await new TestClient().postJson("/api/auth/sign-in/email", {
      email: c.email,
      password: "not-the-password",
    });
    expect(wrong.status).toBe(401);
  });

  it("a reused confirmation link lands on a clear page, not an error", async () => {
    const c = await signUp();
    const link = firstLink(await readMail(c.email, /confirm your e-mail/i));
    await verifyFromMail(c);
    const stranger = new TestClient();
    const res = await stranger.fetch(link);
    expect([302, 307]).toContain(res.status);
    const page = await stranger.fetch(res.headers.get("location")!);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('data-verify-result="used"');
    expect(html).toContain("This confirmation link was already used");
  });

  it("a tampered confirmation link lands on a clear page with a resend form", async () => {
    const c = await signUp();
    const link = firstLink(await readMail(c.email, /confirm your e-mail/i));
    const res = await new TestClient().fetch(
      link.replace(/token=([^&]+)/, (_m, t: string) => `token=${t.slice(0, -4)}AAAA`),
    );
    expect([302, 307]).toContain(res.status);
    const location = res.headers.get("location")!;
    expect(location).toMatch(/error=/);
    const page = await new TestClient().fetch(location);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('data-verify-result="invalid"');
    expect(html).toContain("Send a new confirmation link");
  });

  it("the sign-up form refuses a malformed e-mail, naming the field, keeping the input, creating no account", async () => {
    const email = `not-an-address-${Date.now()}`;
    const r = await submitPageForm(new TestClient(), "/sign-up", {
      name: "Ada Tester",
      email,
      password: TEST_PASSWORD,
    });
    expect(r.status).toBe(200);
    expect(r.html).toContain("E-mail address is not valid");
    expect(r.html).toMatch(/id="sign-up-email"[^>]*aria-invalid="true"|aria-invalid="true"[^>]*id="sign-up-email"/);
    expect(r.html).toContain(`value="${email}"`);
    expect(r.html).toContain('value="Ada Tester"');
    expect(await userCount(email)).toBe(0);
  });

  it("the sign-up form refuses a short password, naming the field, creating no account", async () => {
    const email = uniqueEmail("short");
    const r = await submitPageForm(new TestClient(), "/sign-up", { name: "Ada Tester", email, password: "123456789" });
    expect(r.status).toBe(200);
    expect(r.html).toContain("Password must be at least 10 characters");
    expect(r.html).toMatch(
      /id="sign-up-password"[^>]*aria-invalid="true"|aria-invalid="true"[^>]*id="sign-up-password"/,
    );
    expect(r.html).toContain(`value="${email}"`);
    expect(await userCount(email)).toBe(0);
  });

  it("the auth API refuses the same input too (malformed e-mail, short password)", async () => {
    const bad = await new TestClient().postJson("/api/auth/sign-up/email", {
      name: "X",
      email: "nope",
      password: TEST_PASSWORD,
    });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/email/i);
    const email = uniqueEmail("api-short");
    const short = await new TestClient().postJson("/api/auth/sign-up/email", { name: "X", email, password: "short" });
    expect(short.status).toBe(400);
    expect(short.body.code).toBe("PASSWORD_TOO_SHORT");
    expect(await userCount(email)).toBe(0);
  });

  // Issue 17 reversed what this test used to assert (the form said "An account with this e-mail
  // address already exists", which let anyone find out who has an account): the form now answers a
  // registered address exactly as a new one, and the owner is told by mail, as through the API.
  it("the sign-up form answers a registered address as it answers a new one, and mails the owner", async () => {
    const first = await signUp();
    const known = await submitPageForm(new TestClient(), "/sign-up", {
      name: "Someone Else",
      email: first.email,
      password: TEST_PASSWORD,
    });
    const fresh = uniqueEmail("fresh");
    const unknown = await submitPageForm(new TestClient(), "/sign-up", {
      name: "Someone Else",
      email: fresh,
      password: TEST_PASSWORD,
    });
    expect(known.status).toBe(303);
    expect([known.status, known.location?.replace(encodeURIComponent(first.email), "ADDR")]).toEqual([
      unknown.status,
      unknown.location?.replace(encodeURIComponent(fresh), "ADDR"),
    ]);
    expect(known.html).not.toContain("already exists");
    expect(await userCount(first.email)).toBe(1);
    const notice = await readMail(first.email, /already have a heterolane account/i);
    expect(notice.text).toContain("/forgot-password");
  });

  it("a duplicate sign-up through the API creates nothing and tells the address owner by mail", async () => {
    const first = await signUp();
    const again = await new TestClient().postJson("/api/auth/sign-up/email", {
      name: "Someone Else",
      email: first.email,
      password: TEST_PASSWORD,
    });
    expect(again.status).toBe(200);
    expect(await userCount(first.email)).toBe(1);
    const notice = await readMail(first.email, /already have a heterolane account/i);
    expect(notice.text).toContain("/forgot-password");
  });

  it("a valid sign-up form creates the account and redirects to the check-your-inbox page", async () => {
    const email = uniqueEmail("form");
    const r = await submitPageForm(new TestClient(), "/sign-up", {
      name: "Form Person",
      email,
      password: TEST_PASSWORD,
    });
    expect(r.status).toBe(303);
    expect(r.location).toContain("/verify-email?email=");
    expect(await userCount(email)).toBe(1);
    await readMail(email, /confirm your e-mail/i);
  });
});

describe("password reset", () => {
  it("mails a one-time link that sets a new password", async () => {
    const c = await newVerifiedUser("reset");
    const ask = await new TestClient().postJson("/api/auth/request-password-reset", {
      email: c.email,
      redirectTo: "/reset-password",
    });
    expect(ask.status).toBe(200);
    const link = firstLink(await readMail(c.email, /reset your heterolane password/i));
    const hop = await new TestClient().fetch(link);
    const location = hop.headers.get("location")!;
    const token = new URL(location, BASE_URL).searchParams.get("token");
    expect(token).toBeTruthy();
    const done = await new TestClient().postJson("/api/auth/reset-password", {
      token,
      newPassword: "a-brand-new-password-7",
    });
    expect(done.status).toBe(200);
    const again = await new TestClient().postJson("/api/auth/reset-password", {
      token,
      newPassword: "another-password-88",
    });
    expect(again.status).toBe(400);
    const fresh = new TestClient();
    fresh.email = c.email;
    await signIn(fresh, "a-brand-new-password-7");
    // The reused link lands on the reset page with an error, which shows a clear message.
    const reused = await new TestClient().fetch(link);
    const page = await new TestClient().fetch(reused.headers.get("location")!);
    expect(await page.text()).toContain("This reset link is not valid");
  });
});

describe("teams, invitations and roles", () => {
  let t: TeamWithRoles;
  beforeAll(async () => {
    t = await makeTeamWithRoles();
  });

  it("creating a team makes the creator owner of the active team", async () => {
    const res = await t.owner.fetch("/api/team");
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.role).toBe("owner");
    expect(body.team.id).toBe(t.teamId);
  });

  it("an invitation accepted by e-mail shows the invitee with the invited role", async () => {
    const body = await (await t.owner.fetch("/api/team")).json();
    const roleOf = (email: string) => body.members.find((m: { email: string }) => m.email === email)?.role;
    expect(roleOf(t.lead.email)).toBe("lead");
    expect(roleOf(t.engineer.email)).toBe("engineer");
    expect(roleOf(t.viewer.email)).toBe("viewer");
    expect(body.members).toHaveLength(4);
    const seenByViewer = await (await t.viewer.fetch("/api/team")).json();
    expect(seenByViewer.role).toBe("viewer");
  });

  it("the invitation mail links to the accept page, which names team and role", async () => {
    const person = await newVerifiedUser("page");
    const sent = await t.lead.fetch("/api/team/invitations", {
      method: "POST",
      json: { email: person.email, role: "engineer" },
    });
    expect(sent.status).toBe(201);
    const mail = await readMail(person.email, /invitation to join/i);
    const link = firstLink(mail);
    expect(link).toMatch(/\/invitations\/[^/]+$/);
    const page = await person.fetch(new URL(link).pathname);
    const html = await page.text();
    expect(page.status).toBe(200);
    expect(html).toContain('data-invitation-state="ready"');
    expect(html).toContain("engineer");
    const signedOut = await new TestClient().fetch(new URL(link).pathname);
    expect(await signedOut.text()).toContain('data-invitation-state="signed-out"');
    await acceptInvite(person);
    const reused = await person.fetch(new URL(link).pathname);
    expect(reused.status).toBe(200);
    expect(await reused.text()).toContain("This invitation was already accepted");
    const unknown = await person.fetch("/invitations/no-such-invitation");
    expect(unknown.status).toBe(200);
    expect(await unknown.text()).toContain("This invitation does not exist");
  }, 120_000);

  it("an invitation opened by another signed-in account says so and cannot be accepted by it", async () => {
    const invitee = uniqueEmail("invitee");
    const sent = await t.owner.fetch("/api/team/invitations", {
      method: "POST",
      json: { email: invitee, role: "viewer" },
    });
    expect(sent.status).toBe(201);
    const { id } = await sent.json();
    const page = await t.engineer.fetch(`/invitations/${id}`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('data-invitation-state="other-account"');
    const accept = await t.engineer.postJson("/api/auth/organization/accept-invitation", { invitationId: id });
    expect(accept.status).toBe(403);
  }, 120_000);

  it("nobody can make a team they do not belong to their active team", async () => {
    const outsider = await newVerifiedUser("outsider");
    const own = await createTeam(outsider, "Outsider team");
    const res = await outsider.postJson("/api/auth/organization/set-active", { organizationId: t.teamId });
    expect(res.status).toBe(403);
    // better-auth also clears the active team on such a refusal: the person
    // acts in no team (403 no-team) until they choose one of their own.
    const none = await outsider.fetch("/api/team");
    expect(none.status).toBe(403);
    expect((await none.json()).error.code).toBe("no-team");
    expect((await outsider.postJson("/api/auth/organization/set-active", { organizationId: own })).status).toBe(200);
    const team = await (await outsider.fetch("/api/team")).json();
    expect(team.team.id).toBe(own);
    expect(team.members).toHaveLength(1);
  });

  it("a viewer may not invite (403), nor an engineer", async () => {
    for (const who of [t.viewer, t.engineer]) {
      const res = await who.fetch("/api/team/invitations", {
        method: "POST",
        json: { email: uniqueEmail("x"), role: "viewer" },
      });
      expect(res.status).toBe(403);
      const body = await res.json();
      expect(body.error.code).toBe("forbidden");
      // better-auth's own endpoint refuses as well.
      const direct = await invite(who, t.teamId, uniqueEmail("y"), "viewer");
      expect(direct.status).toBe(403);
    }
  });

  it("a lead may invite, but not as owner", async () => {
    const ok = await t.lead.fetch("/api/team/invitations", {
      method: "POST",
      json: { email: uniqueEmail("by-lead"), role: "viewer" },
    });
    expect(ok.status).toBe(201);
    const owner = await t.lead.fetch("/api/team/invitations", {
      method: "POST",
      json: { email: uniqueEmail("as-owner"), role: "owner" },
    });
    expect(owner.status).toBe(403);
  });

  it("an invitation with a malformed e-mail or unknown role is refused with the field named", async () => {
    const res = await t.owner.fetch("/api/team/invitations", {
      method: "POST",
      json: { email: "nope", role: "admiral" },
    });
    expect(res.status).toBe(400);
    const body = await res.json();
    const paths = body.error.issues.map((i: { path: string }) => i.path).sort();
    expect(paths).toEqual(["email", "role"]);
  });

  it("an engineer may not remove a member (403) or change a role (403); the member stays", async () => {
    const team = await (await t.owner.fetch("/api/team")).json();
    const viewerMember = team.members.find((m: { email: string }) => m.email === t.viewer.email);
    const del = await t.engineer.fetch(`/api/team/members/${viewerMember.id}`, { method: "DELETE" });
    expect(del.status).toBe(403);
    const patch = await t.engineer.fetch(`/api/team/members/${viewerMember.id}`, {
      method: "PATCH",
      json: { role: "owner" },
    });
    expect(patch.status).toBe(403);
    const leadDel = await t.lead.fetch(`/api/team/members/${viewerMember.id}`, { method: "DELETE" });
    expect(leadDel.status).toBe(403);
    // better-auth's own endpoint refuses as well.
    const direct = await t.engineer.postJson("/api/auth/organization/remove-member", {
      memberIdOrEmail: viewerMember.id,
      organizationId: t.teamId,
    });
    expect(direct.status).toBeGreaterThanOrEqual(400);
    const after = await (await t.owner.fetch("/api/team")).json();
    expect(after.members.find((m: { email: string }) => m.email === t.viewer.email)?.role).toBe("viewer");
  });

  it("the owner may change a role and remove a member", async () => {
    const extra = await newVerifiedUser("extra");
    expect((await invite(t.owner, t.teamId, extra.email, "viewer")).status).toBe(200);
    await acceptInvite(extra);
    let team = await (await t.owner.fetch("/api/team")).json();
    const m = team.members.find((x: { email: string }) => x.email === extra.email);
    const patch = await t.owner.fetch(`/api/team/members/${m.id}`, { method: "PATCH", json: { role: "engineer" } });
    expect(patch.status).toBe(200);
    team = await (await t.owner.fetch("/api/team")).json();
    expect(team.members.find((x: { email: string }) => x.email === extra.email)?.role).toBe("engineer");
    const del = await t.owner.fetch(`/api/team/members/${m.id}`, { method: "DELETE" });
    expect(del.status).toBe(200);
    team = await (await t.owner.fetch("/api/team")).json();
    expect(team.members.some((x: { email: string }) => x.email === extra.email)).toBe(false);
    // The removed person no longer acts in the team.
    expect((await extra.fetch("/api/team")).status).toBe(403);
  });

  it("the last owner cannot leave, demote or remove themselves (409) and stays owner; other members can leave", async () => {
    const res = await t.owner.fetch("/api/team/leave", { method: "POST" });
    expect(res.status).toBe(409);
    const body = await res.json();
    expect(body.error.message).toMatch(/at least one owner/);
    const team = await (await t.owner.fetch("/api/team")).json();
    expect(team.role).toBe("owner");
    const direct = await t.owner.postJson("/api/auth/organization/leave", { organizationId: t.teamId });
    expect(direct.status).toBe(400);
    // Nor demote or remove themselves.
    const self = team.members.find((m: { email: string }) => m.email === t.owner.email);
    const demote = await t.owner.fetch(`/api/team/members/${self.id}`, { method: "PATCH", json: { role: "lead" } });
    expect(demote.status).toBe(409);
    const removeSelf = await t.owner.fetch(`/api/team/members/${self.id}`, { method: "DELETE" });
    expect(removeSelf.status).toBe(409);
    expect((await (await t.owner.fetch("/api/team")).json()).role).toBe("owner");

    const leaver = await newVerifiedUser("leaver");
    await invite(t.owner, t.teamId, leaver.email, "viewer");
    await acceptInvite(leaver);
    expect((await leaver.fetch("/api/team/leave", { method: "POST" })).status).toBe(200);
  });

  it("signed out: the team API answers 401 and signed-in pages redirect to /sign-in", async () => {
    const anon = new TestClient();
    expect((await anon.fetch("/api/team")).status).toBe(401);
    for (const path of ["/missions", "/team", "/teams/new"]) {
      const res = await anon.fetch(path);
      expect([302, 303, 307, 308]).toContain(res.status);
      expect(res.headers.get("location")).toContain("/sign-in");
    }
  });

  it("a signed-in person without a team is sent to /teams/new", async () => {
    const loner = await newVerifiedUser("loner");
    const res = await loner.fetch("/missions");
    expect([302, 303, 307]).toContain(res.status);
    expect(res.headers.get("location")).toContain("/teams/new");
    const page = await loner.fetch("/teams/new");
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Create your first team");
    const teamId = await createTeam(loner, "Loner team");
    const home = await loner.fetch("/missions");
    expect(home.status).toBe(200);
    expect(teamId).toBeTruthy();
  }, 120_000);
});
