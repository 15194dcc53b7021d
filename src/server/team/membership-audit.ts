import "server-only";
import { inArray } from "drizzle-orm";
import { createAuthMiddleware, getSessionFromCtx, isAPIError } from "better-auth/api";
import { db } from "@db/client";
import { user } from "@db/schema";
import { writeActivity, type ActivityEntry } from "@/server/core/activity";

/**
 * The audit rows of team membership changes. Members change through
 * better-auth's organization endpoints, whether called over HTTP
 * (/api/auth/organization/…) or by the server (auth.api.… in the team
 * service), so one after-hook of the auth instance writes the activity row
 * of every successful change: invitations sent, accepted, declined and
 * cancelled, role changes, removals, leaving, and creating a team. The rows
 * are team-level (no mission) and show in the audit page and its CSV.
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

async function personOf(userId: string | undefined) {
  if (!userId) return null;
  const [u] = await db
    .select({ name: user.name, email: user.email })
    .from(user)
    .where(inArray(user.id, [userId]));
  return u ?? null;
}

/** The auth instance's after-hook: one activity row per successful membership change, in the team changed. */
export const membershipAudit = createAuthMiddleware(async (ctx) => {
  const returned = ctx.context.returned;
  if (returned === undefined || isAPIError(returned) || returned instanceof Response) return;
  const change = membershipChange(ctx.path, returned);
  if (!change) return;
  try {
    const session = ctx.context.session ?? (await getSessionFromCtx(ctx));
    if (!session) return;
    const entry = membershipEntry(change, await personOf(change.subjectUserId));
    await writeActivity(db, { userId: session.user.id, name: session.user.name, teamId: change.teamId }, entry);
  } catch (err) {
    // The membership change itself has happened; a failed audit insert is logged, never turned into an error.
    console.error(`[audit] membership row for ${ctx.path} not written:`, err);
  }
});
