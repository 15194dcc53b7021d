import "server-only";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { auth } from "./auth";
import { readActor } from "./guard";
import type { Actor } from "./actor";

/** The session of a signed-in page, or a redirect to /sign-in (coming back to `next` afterwards). */
export async function requireSessionPage(next = "/missions") {
  const session = await auth.api.getSession({ headers: await headers() });
  if (!session) redirect(`/sign-in?next=${encodeURIComponent(next)}`);
  return session;
}

/**
 * For pages of the signed-in app that work inside a team: the actor (one
 * session read), or a redirect to /sign-in (signed out) or /teams/new (no
 * active team yet).
 */
export async function requirePageActor(next = "/missions"): Promise<Actor> {
  const { session, actor } = await readActor(await headers());
  if (!session) redirect(`/sign-in?next=${encodeURIComponent(next)}`);
  if (!actor) redirect("/teams/new");
  return actor;
}
