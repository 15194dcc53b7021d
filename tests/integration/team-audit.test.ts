/**
 * Team membership changes write audit rows: creating a team, inviting,
 * accepting, declining and cancelling invitations, changing a role,
 * removing a member and leaving, whether made through the app's /api/team
 * routes or better-auth's own /api/auth/organization endpoints. Each row
 * names who acted, shows in the audit page and the audit CSV of that team
 * only, and a refused change writes none.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  acceptInvite,
  closeTestPool,
  createTeam,
  invite,
  makeTeamWithRoles,
  newVerifiedUser,
  readMail,
  firstLink,
  TestClient,
  testPool,
  uniqueEmail,
  type TeamWithRoles,
} from "../setup/auth-helpers";
import { call } from "../setup/workspace-helpers";

interface Row {
  action: string;
  entity: string;
  summary: string;
  actor_id: string;
  mission_id: string | null;
}

let t: TeamWithRoles;
let outsider: TestClient;

beforeAll(async () => {
  t = await makeTeamWithRoles();
  outsider = await newVerifiedUser("outsider");
  await createTeam(outsider);
}, 240_000);
afterAll(closeTestPool);

/** The team's activity rows, oldest first. */
async function rows(teamId = t.teamId): Promise<Row[]> {
  const r = await testPool().query<Row>(
    "select action, entity, summary, actor_id, mission_id from activity where team_id = $1 order by at, id",
    [teamId],
  );
  return r.rows;
}
const rowsSince = async (n: number) => (await rows()).slice(n);

/** The member id of `email` in the team, from the team API. */
async function memberId(email: string): Promise<string> {
  const team = (await call(t.owner, "GET", "/api/team")).body;
  const m = team.members.find((x: { email: string }) => x.email === email);
  if (!m) throw new Error(`${email} is not a member`);
  return m.id;
}

/** A new person who has joined the team as viewer (through better-auth's endpoints). */
async function joinedViewer(): Promise<TestClient> {
  const p = await newVerifiedUser("joiner");
  const sent = await invite(t.owner, t.teamId, p.email, "viewer");
  if (sent.status !== 200) throw new Error(`invite answered ${sent.status}`);
  await acceptInvite(p);
  return p;
}

describe("membership audit rows", () => {
  it("creating the team and the three accepted invitations are logged, team-level, by whoever acted", async () => {
    const logged = await rows();
    const members = logged.filter((r) => r.action.startsWith("member-") || r.action === "team-create");
    expect(members.map((r) => [r.action, r.actor_id])).toEqual([
      ["team-create", t.owner.userId],
      ...[t.lead, t.engineer, t.viewer].flatMap((p) => [
        ["member-invite", t.owner.userId],
        ["member-join", p.userId],
      ]),
    ]);
    for (const [p, role] of [
      [t.lead, "lead"],
      [t.engineer, "engineer"],
      [t.viewer, "viewer"],
    ] as const) {
      expect(members).toContainEqual(
        expect.objectContaining({
          action: "member-invite",
          entity: `invitation ${p.email}`,
          summary: `Invited ${p.email} as ${role}.`,
        }),
      );
      expect(members).toContainEqual(
        expect.objectContaining({
          action: "member-join",
          entity: `member ${p.email}`,
          summary: `${p.name} (${p.email}) joined the team as ${role}.`,
        }),
      );
    }
    expect(members.every((r) => r.mission_id === null)).toBe(true);
  });

  interface Case {
    name: string;
    /** Makes the change; returns who acted and what the row must say. */
    run: () => Promise<{ by: TestClient; status: number; expected: number; entity: string; summary: RegExp }>;
    action: string;
  }

  const CASES: Case[] = [
    {
      name: "an invitation through /api/team/invitations (by a lead)",
      action: "member-invite",
      run: async () => {
        const email = uniqueEmail("invited");
        const r = await call(t.lead, "POST", "/api/team/invitations", { email, role: "engineer" });
        return {
          by: t.lead,
          status: r.status,
          expected: 201,
          entity: `invitation ${email}`,
          summary: /^Invited .+ as engineer\.$/,
        };
      },
    },
    {
      name: "cancelling an invitation through /api/team/invitations/{id}",
      action: "invitation-cancel",
      run: async () => {
        const email = uniqueEmail("cancelled");
        const sent = await call(t.owner, "POST", "/api/team/invitations", { email, role: "viewer" });
        const r = await call(t.owner, "DELETE", `/api/team/invitations/${sent.body.id}`);
        return {
          by: t.owner,
          status: r.status,
          expected: 200,
          entity: `invitation ${email}`,
          summary: /^Cancelled the invitation of .+ as viewer\.$/,
        };
      },
    },
    {
      name: "declining an invitation (better-auth's endpoint, by the invitee)",
      action: "invitation-decline",
      run: async () => {
        const p = await newVerifiedUser("decliner");
        await call(t.owner, "POST", "/api/team/invitations", { email: p.email, role: "viewer" });
        const id = firstLink(await readMail(p.email, /invitation to join/i)).match(/\/invitations\/([^/?#\s]+)/)![1];
        const r = await p.postJson("/api/auth/organization/reject-invitation", { invitationId: id });
        return {
          by: p,
          status: r.status,
          expected: 200,
          entity: `invitation ${p.email}`,
          summary: /declined the invitation to join as viewer/,
        };
      },
    },
    {
      name: "a role change through /api/team/members/{id}",
      action: "member-role",
      run: async () => {
        const p = await joinedViewer();
        const r = await call(t.owner, "PATCH", `/api/team/members/${await memberId(p.email)}`, { role: "engineer" });
        return { by: t.owner, status: r.status, expected: 200, entity: `member ${p.email}`, summary: /to engineer\.$/ };
      },
    },
    {
      name: "a role change through better-auth's endpoint",
      action: "member-role",
      run: async () => {
        const p = await joinedViewer();
        const r = await t.owner.postJson("/api/auth/organization/update-member-role", {
          memberId: await memberId(p.email),
          role: "lead",
          organizationId: t.teamId,
        });
        return { by: t.owner, status: r.status, expected: 200, entity: `member ${p.email}`, summary: /to lead\.$/ };
      },
    },
    {
      name: "removing a member through /api/team/members/{id}",
      action: "member-remove",
      run: async () => {
        const p = await joinedViewer();
        const r = await call(t.owner, "DELETE", `/api/team/members/${await memberId(p.email)}`);
        return {
          by: t.owner,
          status: r.status,
          expected: 200,
          entity: `member ${p.email}`,
          summary: /^Removed .+ from the team\.$/,
        };
      },
    },
    {
      name: "leaving through /api/team/leave",
      action: "member-leave",
      run: async () => {
        const p = await joinedViewer();
        const r = await call(p, "POST", "/api/team/leave");
        return { by: p, status: r.status, expected: 200, entity: `member ${p.email}`, summary: /left the team\.$/ };
      },
    },
  ];

  it.each(CASES)(
    "$name writes one $action row",
    async (c) => {
      const before = (await rows()).length;
      const done = await c.run();
      expect(done.status).toBe(done.expected);
      const mine = (await rowsSince(before)).filter((r) => r.action === c.action);
      expect(mine).toHaveLength(1);
      expect(mine[0]).toMatchObject({ actor_id: done.by.userId, entity: done.entity, mission_id: null });
      expect(mine[0]!.summary).toMatch(done.summary);
    },
    180_000,
  );

  it("a refused change writes no row", async () => {
    const before = (await rows()).length;
    const viewerId = await memberId(t.viewer.email);
    expect((await call(t.engineer, "DELETE", `/api/team/members/${viewerId}`)).status).toBe(403);
    expect((await call(t.engineer, "PATCH", `/api/team/members/${viewerId}`, { role: "owner" })).status).toBe(403);
    expect(
      (
        await t.engineer.postJson("/api/auth/organization/remove-member", {
          memberIdOrEmail: viewerId,
          organizationId: t.teamId,
        })
      ).status,
    ).toBeGreaterThanOrEqual(400);
    expect((await call(t.owner, "POST", "/api/team/leave")).status).toBe(409);
    expect(
      (await call(t.viewer, "POST", "/api/team/invitations", { email: uniqueEmail("no"), role: "viewer" })).status,
    ).toBe(403);
    expect(await rowsSince(before)).toEqual([]);
  });

  it("the rows show in the audit page and the audit CSV of this team only", async () => {
    const csv = await t.owner.fetch("/api/v1/audit.csv?action=member-join");
    expect(csv.status).toBe(200);
    const lines = (await csv.text()).trim().split("\r\n");
    for (const p of [t.lead, t.engineer, t.viewer])
      expect(lines.some((l) => l.includes(`member ${p.email}`))).toBe(true);
    expect(lines.slice(1).every((l) => l.includes(",member-join,"))).toBe(true);

    const page = await t.viewer.fetch("/audit?action=member-role");
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("member-role");
    expect(html).toMatch(/Changed the role of .+ to engineer\./);

    const theirs = await (await outsider.fetch("/api/v1/audit.csv?action=member-join")).text();
    expect(theirs.trim().split("\r\n")).toHaveLength(1);
    const own = (await rows((await call(outsider, "GET", "/api/team")).body.team.id)).map((r) => r.action);
    expect(own).toEqual(["team-create"]);
  });
});
