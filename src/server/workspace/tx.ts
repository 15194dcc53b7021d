import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@db/client";
import { missions, type Mission } from "@db/schema";
import { notFound } from "@/server/http";
import type { Actor } from "@/server/auth/actor";
import { isUuid } from "./errors";

export type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];
/** The database or a transaction: read helpers accept either. */
export type Queryable = typeof db | Tx;

/**
 * Locks the mission row of the actor's team for the rest of the
 * transaction (serialising every mutation of one mission: versions and
 * revision numbers cannot race) or answers 404 — also for another team's
 * mission, whose existence is never revealed.
 */
export async function lockMission(tx: Tx, actor: Actor, missionId: string): Promise<Mission> {
  if (!isUuid(missionId)) throw notFound("mission");
  const [m] = await tx
    .select()
    .from(missions)
    .where(and(eq(missions.id, missionId), eq(missions.teamId, actor.teamId)))
    .for("update");
  if (!m) throw notFound("mission");
  return m;
}

/** Runs `fn` in one transaction; anything thrown rolls everything back. */
export function inTransaction<T>(fn: (tx: Tx) => Promise<T>): Promise<T> {
  return db.transaction(fn);
}
