import { describe, expect, it } from "vitest";
import { membershipChange, membershipEntry, type MembershipChange } from "./membership-change";

// The answers of better-auth's organization endpoints, trimmed to the fields read.
const invitation = { id: "i1", email: "new@example.org", role: "viewer", organizationId: "t1", status: "pending" };
const member = { id: "m1", userId: "u2", organizationId: "t1", role: "engineer" };
const erin = { name: "Erin", email: "erin@example.org" };

describe("membershipChange and membershipEntry", () => {
  const cases: {
    path: string;
    returned: unknown;
    subject?: typeof erin;
    change: MembershipChange;
    entity: string;
    summary: string;
  }[] = [
    {
      path: "/organization/create",
      returned: { id: "t1", name: "Sounder team", members: [{ userId: "u1", role: "owner" }] },
      change: { action: "team-create", teamId: "t1", teamName: "Sounder team", subjectUserId: "u1", role: "owner" },
      entity: "team Sounder team",
      summary: "Created the team Sounder team as owner.",
    },
    {
      path: "/organization/invite-member",
      returned: invitation,
      change: { action: "member-invite", teamId: "t1", email: "new@example.org", role: "viewer" },
      entity: "invitation new@example.org",
      summary: "Invited new@example.org as viewer.",
    },
    {
      path: "/organization/accept-invitation",
      returned: { invitation, member },
      subject: erin,
      change: { action: "member-join", teamId: "t1", subjectUserId: "u2", role: "engineer" },
      entity: "member erin@example.org",
      summary: "Erin (erin@example.org) joined the team as engineer.",
    },
    {
      path: "/organization/reject-invitation",
      returned: { invitation, member: null },
      change: { action: "invitation-decline", teamId: "t1", email: "new@example.org", role: "viewer" },
      entity: "invitation new@example.org",
      summary: "new@example.org declined the invitation to join as viewer.",
    },
    {
      path: "/organization/cancel-invitation",
      returned: { ...invitation, status: "canceled" },
      change: { action: "invitation-cancel", teamId: "t1", email: "new@example.org", role: "viewer" },
      entity: "invitation new@example.org",
      summary: "Cancelled the invitation of new@example.org as viewer.",
    },
    {
      path: "/organization/update-member-role",
      returned: { ...member, role: "lead" },
      subject: erin,
      change: { action: "member-role", teamId: "t1", subjectUserId: "u2", role: "lead" },
      entity: "member erin@example.org",
      summary: "Changed the role of Erin (erin@example.org) to lead.",
    },
    {
      path: "/organization/remove-member",
      returned: { member },
      subject: erin,
      change: { action: "member-remove", teamId: "t1", subjectUserId: "u2", role: "engineer" },
      entity: "member erin@example.org",
      summary: "Removed Erin (erin@example.org) from the team.",
    },
    {
      path: "/organization/leave",
      returned: member,
      subject: erin,
      change: { action: "member-leave", teamId: "t1", subjectUserId: "u2", role: "engineer" },
      entity: "member erin@example.org",
      summary: "Erin (erin@example.org) left the team.",
    },
  ];

  it.each(cases)("$path → $change.action", (c) => {
    const change = membershipChange(c.path, c.returned);
    expect(change).toEqual(c.change);
    const entry = membershipEntry(change!, c.subject ?? null);
    expect(entry).toEqual({ missionId: null, action: c.change.action, entity: c.entity, summary: c.summary });
  });

  it("ignores other endpoints and answers without a team", () => {
    expect(membershipChange("/sign-in/email", { user: { id: "u1" } })).toBeNull();
    expect(membershipChange("/organization/set-active", { id: "t1" })).toBeNull();
    expect(membershipChange("/organization/invite-member", { email: "x@example.org" })).toBeNull();
    expect(membershipChange("/organization/remove-member", null)).toBeNull();
  });
});
