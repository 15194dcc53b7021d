import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@db/client";
import { missions, type Mission } from "@db/schema";
import type { Actor } from "@/server/auth/actor";
import { notFound } from "./http";
import { isUuid } from "./input";
import type { Queryable, Tx } from "./db";

/**
 * Team scope of a mission, shared by every area that hangs off one (the
 * workspace, review): another team's mission answers 404, exactly like a
 * mission that does not exist, so its existence is never revealed.
 */

/** The mission of the actor's team, or 404. */
export async function getMissionRow(actor: Actor, missionId: string, q: Queryable = db): Promise<Mission> {
  if (!isUuid(missionId)) throw notFound("mission");
  const [m] = await q
    .select()
    .from(missions)
    .where(and(eq(missions.id, missionId), eq(missions.teamId, actor.teamId)));
  if (!m) throw notFound("mission");
  return m;
}

/**
 * Locks the mission row of the actor's team for the rest of the
 * transaction (serialising every mutation of one mission: versions and
 * revision numbers cannot race) or answers 404. The lock is `for no key
 * update`: it excludes every other mission lock and every update of the
 * row, but not the key-share locks that inserting rows which reference the
 * mission takes — so a save may write its large rows before it takes the
 * lock (stageRevision) without holding anyone up meanwhile.
 */
export async function lockMission(tx: Tx, actor: Actor, missionId: string): Promise<Mission> {
  if (!isUuid(missionId)) throw notFound("mission");
  const [m] = await tx
    .select()
    .from(missions)
    .where(and(eq(missions.id, missionId), eq(missions.teamId, actor.teamId)))
    .for("no key update");
  if (!m) throw notFound("mission");
  return m;
}
