import "server-only";
import { z } from "zod";
import { auth } from "@/server/auth/auth";
import { requireActor } from "@/server/auth/guard";
import { authError } from "@/server/auth/errors";
import { HttpError, type Issue } from "@/server/http";
import { ChangeRoleSchema, InviteSchema, MemberIdSchema } from "@/schemas/auth";
import type { RoleName } from "@/lib/permissions";

/**
 * Team membership operations shared by the Team page's server actions and the
 * /api/team routes. Each one checks the caller's role in the active team
 * first (401/403 before any work); better-auth's organization plugin checks
 * the same statements again and guards the last owner.
 */

function parse<T>(schema: z.ZodType<T>, input: unknown): T {
  const r = schema.safeParse(input);
  if (r.success) return r.data;
  const issues: Issue[] = r.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
  throw new HttpError(400, "invalid-input", issues.map((i) => `${i.path}: ${i.message}`).join("; "), issues);
}

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

async function call<T>(fn: () => Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (err) {
    const e = authError(err);
    if (!e) throw err;
    const known = FRIENDLY[e.code];
    if (known) throw new HttpError(known[0], e.code.toLowerCase().replace(/_/g, "-"), known[1]);
    throw new HttpError(e.status >= 400 && e.status < 500 ? e.status : 400, "auth", e.message);
  }
}

export async function getTeam(h: Headers) {
  const actor = await requireActor(h);
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

export async function inviteMember(h: Headers, input: unknown) {
  const value = parse(InviteSchema, input);
  const actor = await requireActor(h, { invitation: ["create"] }, "invite people");
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

export async function changeMemberRole(h: Headers, input: unknown) {
  const value = parse(ChangeRoleSchema, input);
  const actor = await requireActor(h, { member: ["update"] }, "change roles");
  await call(() =>
    auth.api.updateMemberRole({
      body: { memberId: value.memberId, role: value.role, organizationId: actor.teamId },
      headers: h,
    }),
  );
  return { memberId: value.memberId, role: value.role };
}

export async function removeMember(h: Headers, input: unknown) {
  const value = parse(MemberIdSchema, input);
  const actor = await requireActor(h, { member: ["delete"] }, "remove members");
  await call(() =>
    auth.api.removeMember({ body: { memberIdOrEmail: value.memberId, organizationId: actor.teamId }, headers: h }),
  );
  return { memberId: value.memberId };
}

export async function cancelInvitation(h: Headers, input: unknown) {
  const value = parse(z.object({ invitationId: z.string().min(1, "Invitation is missing.") }), input);
  await requireActor(h, { invitation: ["cancel"] }, "cancel invitations");
  await call(() => auth.api.cancelInvitation({ body: { invitationId: value.invitationId }, headers: h }));
  return { invitationId: value.invitationId };
}

/** Leaves the active team. The last owner may not leave (409). */
export async function leaveTeam(h: Headers) {
  const actor = await requireActor(h);
  await call(() => auth.api.leaveOrganization({ body: { organizationId: actor.teamId }, headers: h }));
  return { teamId: actor.teamId };
}
