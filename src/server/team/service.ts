import "server-only";
import { randomBytes } from "node:crypto";
import type { RoleName } from "@/lib/permissions";
import { slugFromName } from "@/schemas/auth";
import type { Actor } from "@/server/auth/actor";
import { auth } from "@/server/auth/auth";
import { authError } from "@/server/auth/errors";
import { HttpError } from "@/server/core/http";

/**
 * Team membership operations behind the /api/team routes and the team,
 * invitation and team-creation server actions. The guards (src/server/core)
 * have checked the caller's role before these run; better-auth's
 * organization plugin checks the same statements again and guards the last
 * owner. Each change is written to the activity log by the auth instance's
 * after-hook (membership-audit.ts), whichever way it was made.
 */

const FRIENDLY: Record<string, [number, string]> = {
  USER_IS_ALREADY_A_MEMBER_OF_THIS_ORGANIZATION: [409, "This person is already a member of the team."],
  YOU_ARE_NOT_ALLOWED_TO_INVITE_USER_WITH_THIS_ROLE: [403, "Only an owner may invite someone as owner."],
  YOU_ARE_NOT_ALLOWED_TO_INVITE_USERS_TO_THIS_ORGANIZATION: [
    403,
    "Your role in this team does not allow you to invite people.",
  ],
  YOU_CANNOT_LEAVE_THE_ORGANIZATION_AS_THE_ONLY_OWNER: [
    409,
    "The team needs at least one owner. Make someone else owner first.",
  ],
  YOU_CANNOT_LEAVE_THE_ORGANIZATION_WITHOUT_AN_OWNER: [
    409,
    "The team needs at least one owner. Make someone else owner first.",
  ],
  YOU_ARE_NOT_ALLOWED_TO_DELETE_THIS_MEMBER: [403, "Your role in this team does not allow you to remove members."],
  YOU_ARE_NOT_ALLOWED_TO_UPDATE_THIS_MEMBER: [403, "Your role in this team does not allow you to change roles."],
  MEMBER_NOT_FOUND: [404, "No such member in this team."],
  INVITATION_NOT_FOUND: [404, "No such pending invitation."],
  INVITATION_LIMIT_REACHED: [409, "The team has too many pending invitations. Cancel some first."],
};

/** Runs a better-auth call; its refusals become HttpErrors (known codes with a plain message, `messages` first). */
async function call<T>(fn: () => Promise<T>, messages: Record<string, string> = {}): Promise<T> {
  try {
    return await fn();
  } catch (err) {
    const e = authError(err);
    if (!e) throw err;
    const code = e.code.toLowerCase().replace(/_/g, "-");
    const own = messages[e.code];
    if (own) throw new HttpError(e.status >= 400 && e.status < 500 ? e.status : 400, code, own);
    const known = FRIENDLY[e.code];
    if (known) throw new HttpError(known[0], code, known[1]);
    throw new HttpError(e.status >= 400 && e.status < 500 ? e.status : 400, "auth", e.message);
  }
}

export async function getTeam(actor: Actor, h: Headers) {
  const team = await call(() => auth.api.getFullOrganization({ query: { organizationId: actor.teamId }, headers: h }));
  if (!team) throw new HttpError(404, "not-found", "No such team.");
  return {
    actor,
    team: { id: team.id, name: team.name, slug: team.slug },
    members: team.members
      .map((m) => ({ id: m.id, userId: m.userId, role: m.role as RoleName, name: m.user.name, email: m.user.email }))
      .sort((a, b) => a.name.localeCompare(b.name)),
    invitations: team.invitations
      .filter((i) => i.status === "pending")
      .map((i) => ({ id: i.id, email: i.email, role: i.role as RoleName, expiresAt: i.expiresAt })),
  };
}

export async function inviteMember(actor: Actor, h: Headers, value: { email: string; role: RoleName }) {
  if (value.role === "owner" && actor.role !== "owner")
    throw new HttpError(403, "forbidden", "Only an owner may invite someone as owner.");
  const inv = await call(() =>
    auth.api.createInvitation({
      body: { email: value.email, role: value.role, organizationId: actor.teamId },
      headers: h,
    }),
  );
  return { id: inv.id, email: inv.email, role: inv.role, expiresAt: inv.expiresAt };
}

export async function changeMemberRole(actor: Actor, h: Headers, value: { memberId: string; role: RoleName }) {
  await call(() =>
    auth.api.updateMemberRole({
      body: { memberId: value.memberId, role: value.role, organizationId: actor.teamId },
      headers: h,
    }),
  );
  return { memberId: value.memberId, role: value.role };
}

export async function removeMember(actor: Actor, h: Headers, value: { memberId: string }) {
  await call(() =>
    auth.api.removeMember({ body: { memberIdOrEmail: value.memberId, organizationId: actor.teamId }, headers: h }),
  );
  return { memberId: value.memberId };
}

export async function cancelInvitation(_actor: Actor, h: Headers, value: { invitationId: string }) {
  await call(() => auth.api.cancelInvitation({ body: { invitationId: value.invitationId }, headers: h }));
  return { invitationId: value.invitationId };
}

/** Leaves the active team. The last owner may not leave (409). */
export async function leaveTeam(actor: Actor, h: Headers) {
  await call(() => auth.api.leaveOrganization({ body: { organizationId: actor.teamId }, headers: h }));
  return { teamId: actor.teamId };
}

/** Creates a team (the creator becomes its owner) and makes it the active one. */
export async function createTeam(h: Headers, name: string) {
  const team = await call(() =>
    auth.api.createOrganization({
      body: { name, slug: slugFromName(name, randomBytes(3).toString("hex")) },
      headers: h,
    }),
  );
  if (team) await switchTeam(h, team.id);
  return team;
}

/** Makes a team the active one (better-auth checks membership). */
export async function switchTeam(h: Headers, teamId: string) {
  await call(() => auth.api.setActiveOrganization({ body: { organizationId: teamId }, headers: h }));
}

/** Accepts an invitation for the signed-in person and makes its team active; returns the team id. */
export async function acceptInvitation(h: Headers, invitationId: string): Promise<string> {
  const res = await call(() => auth.api.acceptInvitation({ body: { invitationId }, headers: h }), {
    INVITATION_NOT_FOUND: "This invitation has expired or was already answered.",
    YOU_ARE_NOT_THE_RECIPIENT_OF_THE_INVITATION:
      "This invitation is for another e-mail address. Sign in with that address to accept it.",
  });
  if (!res) throw new HttpError(409, "not-accepted", "This invitation could not be accepted.");
  await switchTeam(h, res.invitation.organizationId);
  return res.invitation.organizationId;
}

/** Declines an invitation addressed to the signed-in person. */
export async function declineInvitation(h: Headers, invitationId: string): Promise<void> {
  await call(() => auth.api.rejectInvitation({ body: { invitationId }, headers: h }));
}
