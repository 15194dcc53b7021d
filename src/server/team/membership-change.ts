import "server-only";
import type { ActivityEntry } from "@/server/core/activity";

/**
 * Reading a membership change from the answer of one of better-auth's
 * organization endpoints, and its activity row (pure: no database). Used by
 * the auth instance's after-hook in membership-audit.ts.
 */

/** A membership change read from an endpoint's answer (pure; no database). */
export interface MembershipChange {
  action:
    | "team-create"
    | "member-invite"
    | "member-join"
    | "invitation-decline"
    | "invitation-cancel"
    | "member-role"
    | "member-remove"
    | "member-leave";
  teamId: string;
  /** The person the change is about, by user id (members) … */
  subjectUserId?: string;
  /** … or by e-mail address (invitations). */
  email?: string;
  role?: string;
  teamName?: string;
}

const str = (v: unknown): string | undefined => (typeof v === "string" && v !== "" ? v : undefined);
const rec = (v: unknown): Record<string, unknown> =>
  typeof v === "object" && v !== null ? (v as Record<string, unknown>) : {};

/** The change an organization endpoint made, from its path and answer; null for any other endpoint or answer. */
export function membershipChange(path: string, returned: unknown): MembershipChange | null {
  const r = rec(returned);
  const of = (
    action: MembershipChange["action"],
    o: Record<string, unknown>,
    extra: Partial<MembershipChange> = {},
  ) => {
    const teamId = str(o.organizationId);
    return teamId ? { action, teamId, role: str(o.role), ...extra } : null;
  };
  switch (path) {
    case "/organization/create": {
      const teamId = str(r.id);
      const owner = Array.isArray(r.members) ? rec(r.members[0]) : {};
      return teamId
        ? {
            action: "team-create",
            teamId,
            teamName: str(r.name),
            subjectUserId: str(owner.userId),
            role: str(owner.role),
          }
        : null;
    }
    case "/organization/invite-member":
      return of("member-invite", r, { email: str(r.email) });
    case "/organization/accept-invitation":
      return of("member-join", rec(r.member), { subjectUserId: str(rec(r.member).userId) });
    case "/organization/reject-invitation":
      return of("invitation-decline", rec(r.invitation), { email: str(rec(r.invitation).email) });
    case "/organization/cancel-invitation":
      return of("invitation-cancel", r, { email: str(r.email) });
    case "/organization/update-member-role":
      return of("member-role", r, { subjectUserId: str(r.userId) });
    case "/organization/remove-member":
      return of("member-remove", rec(r.member), { subjectUserId: str(rec(r.member).userId) });
    case "/organization/leave":
      return of("member-leave", r, { subjectUserId: str(r.userId) });
    default:
      return null;
  }
}

/** The activity row of a change; `subject` is the person it is about when known by user id. */
export function membershipEntry(
  change: MembershipChange,
  subject: { name: string; email: string } | null,
): ActivityEntry {
  const who = subject ? `${subject.name} (${subject.email})` : (change.email ?? "someone");
  const as = change.role ? ` as ${change.role}` : "";
  const entity = change.email ? `invitation ${change.email}` : `member ${subject?.email ?? change.subjectUserId ?? ""}`;
  const summary = {
    "team-create": `Created the team${change.teamName ? ` ${change.teamName}` : ""}${as}.`,
    "member-invite": `Invited ${who}${as}.`,
    "member-join": `${who} joined the team${as}.`,
    "invitation-decline": `${who} declined the invitation to join${as}.`,
    "invitation-cancel": `Cancelled the invitation of ${who}${as}.`,
    "member-role": `Changed the role of ${who} to ${change.role ?? "?"}.`,
    "member-remove": `Removed ${who} from the team.`,
    "member-leave": `${who} left the team.`,
  }[change.action];
  return {
    missionId: null,
    action: change.action,
    entity: change.action === "team-create" ? `team ${change.teamName ?? change.teamId}` : entity,
    summary,
  };
}
