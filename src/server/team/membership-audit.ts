import "server-only";
import { eq } from "drizzle-orm";
import { createAuthMiddleware, getSessionFromCtx, isAPIError } from "better-auth/api";
import { db } from "@db/client";
import { user } from "@db/schema";
import { writeActivity } from "@/server/core/activity";
import { membershipChange, membershipEntry } from "./membership-change";

/**
 * The audit rows of team membership changes. Members change through
 * better-auth's organization endpoints, whether called over HTTP
 * (/api/auth/organization/…) or by the server (auth.api.… in the team
 * service), so one after-hook of the auth instance writes the activity row
 * of every successful change: invitations sent, accepted, declined and
 * cancelled, role changes, removals, leaving, and creating a team. The rows
 * are team-level (no mission) and show in the audit page and its CSV.
 */

async function personOf(userId: string | undefined) {
  if (!userId) return null;
  const [u] = await db.select({ name: user.name, email: user.email }).from(user).where(eq(user.id, userId));
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
