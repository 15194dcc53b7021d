import "server-only";
import { headers as nextHeaders } from "next/headers";
import { auth, type Session } from "./auth";
import type { Actor } from "./actor";
import { memberRole } from "./queries";
import { isRoleName, roleCan, type Permission } from "@/lib/permissions";
import { forbidden, noTeam, unauthorized } from "@/server/core/http";

export interface SessionAndActor {
  /** The better-auth session, or null when signed out. */
  session: Session | null;
  /** The person acting in their active team, or null (signed out, or no active team they belong to). */
  actor: Actor | null;
}

/**
 * Reads who is calling, once: the better-auth session (one `getSession`,
 * from the database, never from process memory), then the role of the
 * session's active team from the member table (one query).
 */
export async function readActor(reqHeaders?: Headers): Promise<SessionAndActor> {
  const h = reqHeaders ?? (await nextHeaders());
  const session = await auth.api.getSession({ headers: h });
  if (!session) return { session: null, actor: null };
  const teamId = session.session.activeOrganizationId;
  if (!teamId) return { session, actor: null };
  const role = await memberRole(session.user.id, teamId);
  if (!role || !isRoleName(role)) return { session, actor: null };
  const actor: Actor = { userId: session.user.id, email: session.user.email, name: session.user.name, teamId, role };
  return { session, actor };
}

/** The signed-in person and their role in the active team, or null when signed out or with no active team. */
export async function getActor(reqHeaders?: Headers): Promise<Actor | null> {
  return (await readActor(reqHeaders)).actor;
}

/**
 * The actor, after checking a permission: 401 when signed out, 403
 * `no-team` with no active team, 403 `forbidden` when the role may not act
 * (`what` completes "Your role in this team does not allow you to …").
 * Route handlers and server actions reach it through the guards in
 * src/server/core.
 */
export async function requireActor(reqHeaders?: Headers, permission?: Permission, what?: string): Promise<Actor> {
  return assertActor(await readActor(reqHeaders), permission, what);
}

/** The checks of `requireActor` on a caller already read. */
export function assertActor(read: SessionAndActor, permission?: Permission, what?: string): Actor {
  if (!read.session) throw unauthorized();
  if (!read.actor) throw noTeam();
  if (permission && !roleCan(read.actor.role, permission)) throw forbidden(what);
  return read.actor;
}
