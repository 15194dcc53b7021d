/**
 * Helpers for integration and end-to-end tests: real HTTP against the running
 * app at HETEROLANE_TEST_URL (one cookie jar per simulated person) and real
 * mail read back from the `captured_mail` table at DATABASE_URL.
 *
 *   const { owner, lead, engineer, viewer, teamId } = await makeTeamWithRoles();
 *   const res = await viewer.fetch("/api/missions", { method: "POST", json: {...} });
 */
import { randomBytes } from "node:crypto";
import { Pool } from "pg";

export const BASE_URL = (process.env.HETEROLANE_TEST_URL ?? "http://localhost:3000").replace(/\/$/, "");
export const TEST_PASSWORD = "correct-horse-battery-9";

let pool: Pool | undefined;
/** A small pg pool on DATABASE_URL for reading captured mail (and for tests that inspect rows). */
export function testPool(): Pool {
  if (!pool) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set for the tests");
    pool = new Pool({ connectionString: url, max: 2 });
  }
  return pool;
}
export async function closeTestPool(): Promise<void> {
  await pool?.end();
  pool = undefined;
}

/** A unique address per call, so tests never collide across runs. */
export function uniqueEmail(label = "user"): string {
  return `${label}.${Date.now().toString(36)}${randomBytes(3).toString("hex")}@test.heterolane.local`;
}

export interface FetchInit extends Omit<RequestInit, "body"> {
  /** Sent as JSON with content-type application/json. */
  json?: unknown;
  body?: BodyInit | null;
}

/** One browser-like person: a cookie jar and a fetch that sends it. */
export class TestClient {
  readonly cookies = new Map<string, string>();
  email = "";
  name = "";
  userId = "";
  /** The Origin this person's browser sends (the app under test; another app process for some tests). */
  origin = BASE_URL;

  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  private store(res: Response): void {
    for (const line of res.headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(";");
      const eq = pair!.indexOf("=");
      const name = pair!.slice(0, eq).trim();
      const value = pair!.slice(eq + 1).trim();
      const expired = attrs.some((a) => /^\s*max-age=0\s*$/i.test(a)) || value === "";
      if (expired) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  /** fetch(BASE_URL + path) with this person's cookies, an Origin header and optional JSON. Redirects are not followed. */
  async fetch(path: string, init: FetchInit = {}): Promise<Response> {
    const headers = new Headers(init.headers);
    if (this.cookies.size) headers.set("cookie", this.cookieHeader());
    headers.set("origin", this.origin);
    let body = init.body;
    if (init.json !== undefined) {
      headers.set("content-type", "application/json");
      body = JSON.stringify(init.json);
    }
    const { json: _json, ...rest } = init;
    const url = path.startsWith("http") ? path : `${BASE_URL}${path}`;
    const res = await fetch(url, { redirect: "manual", ...rest, headers, body });
    this.store(res);
    return res;
  }

  /** POST JSON and return status + parsed body (null when the body is not JSON). */
  // The body is whatever the endpoint answers; tests read the fields they expect.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  async postJson(path: string, json: unknown): Promise<{ status: number; body: any }> {
    const res = await this.fetch(path, { method: "POST", json });
    return { status: res.status, body: jsonOrNull(await res.text()) };
  }
}

export interface CapturedMessage {
  id: string;
  recipients: string[];
  subject: string;
  text: string;
  html: string;
  receivedAt: Date;
}

/** Waits (up to `timeoutMs`) for the newest mail to `to` whose subject matches, from `captured_mail`. */
export async function readMail(
  to: string,
  subjectMatch: RegExp | string,
  timeoutMs = 10_000,
): Promise<CapturedMessage> {
  const deadline = Date.now() + timeoutMs;
  const re = typeof subjectMatch === "string" ? new RegExp(subjectMatch, "i") : subjectMatch;
  for (;;) {
    const { rows } = await testPool().query<CapturedMessage & { received_at: Date }>(
      `select id, recipients, subject, text, html, received_at from captured_mail
        where $1 = any(recipients) order by received_at desc`,
      [to.toLowerCase()],
    );
    const hit = rows.find((r) => re.test(r.subject));
    if (hit) return { ...hit, receivedAt: hit.received_at };
    if (Date.now() > deadline) throw new Error(`no mail to ${to} with subject ${re} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

/** The first http(s) link in a captured mail's text part. */
export function firstLink(mail: CapturedMessage): string {
  const m = mail.text.match(/https?:\/\/\S+/);
  if (!m) throw new Error(`mail "${mail.subject}" has no link`);
  return m[0];
}

/** Signs up (name, e-mail, password) over the auth API; returns the client (not yet verified, so not signed in). */
export async function signUp(opts: { email?: string; name?: string; password?: string } = {}): Promise<TestClient> {
  const c = new TestClient();
  c.email = (opts.email ?? uniqueEmail()).toLowerCase();
  c.name = opts.name ?? `Test ${c.email.split("@")[0]}`;
  const { status, body } = await c.postJson("/api/auth/sign-up/email", {
    name: c.name,
    email: c.email,
    password: opts.password ?? TEST_PASSWORD,
    callbackURL: "/verify-email/result",
  });
  if (status !== 200) throw new Error(`sign-up of ${c.email} answered ${status}: ${JSON.stringify(body)}`);
  c.userId = body?.user?.id ?? "";
  return c;
}

/** Opens the verification link from the captured mail; the client is signed in afterwards. Returns the redirect target. */
export async function verifyFromMail(c: TestClient): Promise<string> {
  const mail = await readMail(c.email, /confirm your e-mail/i);
  const res = await c.fetch(firstLink(mail));
  if (res.status !== 302 && res.status !== 307) throw new Error(`verification link answered ${res.status}`);
  return res.headers.get("location") ?? "";
}

/** Signs in with e-mail and password (the account must be verified). */
export async function signIn(c: TestClient, password = TEST_PASSWORD): Promise<TestClient> {
  const { status, body } = await c.postJson("/api/auth/sign-in/email", { email: c.email, password });
  if (status !== 200) throw new Error(`sign-in of ${c.email} answered ${status}: ${JSON.stringify(body)}`);
  c.userId = body?.user?.id ?? c.userId;
  return c;
}

/** Sign up, verify through the captured mail, sign in: a ready person. */
export async function newVerifiedUser(label = "user"): Promise<TestClient> {
  const c = await signUp({ email: uniqueEmail(label) });
  await verifyFromMail(c);
  return signIn(c);
}

/** Creates a team (the creator becomes owner) and makes it the active team. Returns its id. */
export async function createTeam(c: TestClient, name = `Test team ${randomBytes(2).toString("hex")}`): Promise<string> {
  const slug = `t-${Date.now().toString(36)}-${randomBytes(3).toString("hex")}`;
  const created = await c.postJson("/api/auth/organization/create", { name, slug });
  if (created.status !== 200)
    throw new Error(`team creation answered ${created.status}: ${JSON.stringify(created.body)}`);
  const teamId: string = created.body.id;
  await setActiveTeam(c, teamId);
  return teamId;
}

export async function setActiveTeam(c: TestClient, teamId: string): Promise<void> {
  const res = await c.postJson("/api/auth/organization/set-active", { organizationId: teamId });
  if (res.status !== 200) throw new Error(`set-active answered ${res.status}: ${JSON.stringify(res.body)}`);
}

/** Invites `email` with `role` to the team; returns the raw response (status + body). */
export async function invite(by: TestClient, teamId: string, email: string, role: string) {
  return by.postJson("/api/auth/organization/invite-member", { email, role, organizationId: teamId });
}

/** Reads the invitation link from the mail to `c.email`, accepts it and makes the team active. Returns the team id. */
export async function acceptInvite(c: TestClient): Promise<string> {
  const mail = await readMail(c.email, /invitation to join/i);
  const id = firstLink(mail).match(/\/invitations\/([^/?#\s]+)/)?.[1];
  if (!id) throw new Error("invitation mail has no /invitations/<id> link");
  const res = await c.postJson("/api/auth/organization/accept-invitation", { invitationId: id });
  if (res.status !== 200) throw new Error(`accept-invitation answered ${res.status}: ${JSON.stringify(res.body)}`);
  const teamId: string = res.body.invitation.organizationId;
  await setActiveTeam(c, teamId);
  return teamId;
}

export interface TeamWithRoles {
  teamId: string;
  owner: TestClient;
  lead: TestClient;
  engineer: TestClient;
  viewer: TestClient;
}

/** A fresh team with one signed-in person per role (owner, lead, engineer, viewer), each with the team active. */
export async function makeTeamWithRoles(): Promise<TeamWithRoles> {
  const owner = await newVerifiedUser("owner");
  const teamId = await createTeam(owner);
  const people = { lead: "", engineer: "", viewer: "" } as Record<"lead" | "engineer" | "viewer", unknown>;
  for (const role of ["lead", "engineer", "viewer"] as const) {
    const c = await newVerifiedUser(role);
    const sent = await invite(owner, teamId, c.email, role);
    if (sent.status !== 200) throw new Error(`inviting ${role} answered ${sent.status}: ${JSON.stringify(sent.body)}`);
    await acceptInvite(c);
    people[role] = c;
  }
  return { teamId, owner, ...(people as Record<"lead" | "engineer" | "viewer", TestClient>) };
}

/** The text parsed as JSON, or null when it is not JSON. */
export function jsonOrNull(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}
