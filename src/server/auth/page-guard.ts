import "server-only";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { auth } from "./auth";
import { getActor } from "./guard";
import type { Actor } from "./actor";

/** The session of a signed-in page, or a redirect to /sign-in (coming back to `next` afterwards). */
export async function requireSessionPage(next = "/missions") {
  const session = await auth.api.getSession({ headers: await headers() });
  if (!session) redirect(`/sign-in?next=${encodeURIComponent(next)}`);
  return session;
}

/**
 * For pages of the signed-in app that work inside a team: the actor, or a
 * redirect to /sign-in (signed out) or /teams/new (no active team yet).
 */
export async function requirePageActor(next = "/missions"): Promise<Actor> {
  await requireSessionPage(next);
  const actor = await getActor(await headers());
  if (!actor) redirect("/teams/new");
  return actor;
}
