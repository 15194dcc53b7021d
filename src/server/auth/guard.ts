import "server-only";
import { headers as nextHeaders } from "next/headers";
import { auth } from "./auth";
import type { Actor } from "./actor";
import { isRoleName, roleCan, type Permission } from "@/lib/permissions";
import { forbidden, HttpError, unauthorized } from "@/server/http";

/**
 * The signed-in person and their role in the active team, or null when
 * signed out or with no active team. Reads the session from the database
 * (through better-auth), never from process memory.
 */
export async function getActor(reqHeaders?: Headers): Promise<Actor | null> {
  const h = reqHeaders ?? (await nextHeaders());
  const session = await auth.api.getSession({ headers: h });
  if (!session) return null;
  const teamId = session.session.activeOrganizationId;
  if (!teamId) return null;
  const member = await auth.api.getActiveMember({ headers: h }).catch(() => null);
  if (!member || !isRoleName(member.role)) return null;
  return {
    userId: session.user.id,
    email: session.user.email,
    name: session.user.name,
    teamId,
    role: member.role,
  };
}

/**
 * Loads the actor and checks a permission: 401 when signed out (or with no
 * active team), 403 when the role may not act. Call it first in every route
 * handler and server action.
 */
export async function requireActor(reqHeaders?: Headers, permission?: Permission, what?: string): Promise<Actor> {
  const h = reqHeaders ?? (await nextHeaders());
  const session = await auth.api.getSession({ headers: h });
  if (!session) throw unauthorized();
  const actor = await getActor(h);
  if (!actor) throw new HttpError(403, "no-team", "Choose or create a team first.");
  if (permission && !roleCan(actor.role, permission)) throw forbidden(what);
  return actor;
}
