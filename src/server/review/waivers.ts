import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@db/client";
import { findings, waivers } from "@db/schema";
import type { Actor } from "@/server/auth/actor";
import { writeActivity } from "@/server/core/activity";
import { inTransaction, type Tx } from "@/server/core/db";
import { HttpError, invalidInput, notFound, staleVersion } from "@/server/core/http";
import { isUuid } from "@/server/core/input";
import { lockMission } from "@/server/core/mission-scope";
import { activeWaivers, keyOfRow, latestRevision } from "./reads";

/** Waivers: recorded acceptances of open error findings (record, change the reason, withdraw; never deleted). */

export const waiverDto = (w: typeof waivers.$inferSelect) => ({
  id: w.id,
  findingKey: w.findingKey,
  code: w.code,
  chain: w.chainKey,
  channel: w.channelKey,
  revision: w.revisionNumber,
  findingMessage: w.findingMessage,
  reason: w.reason,
  waivedBy: w.waivedByName,
  waivedAt: w.waivedAt.toISOString(),
  withdrawnBy: w.withdrawnByName,
  withdrawnAt: w.withdrawnAt?.toISOString() ?? null,
  active: w.withdrawnAt === null,
  version: w.version,
});

export async function listWaivers(missionId: string) {
  const rows = await db.select().from(waivers).where(eq(waivers.missionId, missionId)).orderBy(desc(waivers.waivedAt));
  return rows.map(waiverDto);
}

export async function createWaiver(actor: Actor, missionId: string, input: { findingId: string; reason: string }) {
  return inTransaction(async (tx) => {
    const mission = await lockMission(tx, actor, missionId);
    const latest = await latestRevision(tx, mission.id);
    const [f] = await tx
      .select()
      .from(findings)
      .where(and(eq(findings.id, input.findingId), eq(findings.missionId, mission.id)));
    if (!f)
      throw invalidInput(
        [{ path: "findingId", message: "no finding with this id in this mission" }],
        "The waiver is not valid.",
      );
    if (!latest || f.revisionId !== latest.id)
      throw new HttpError(
        409,
        "stale-revision",
        "This finding belongs to an older revision; reload and waive the finding of the current revision.",
        [{ path: "findingId", message: "finding of an older revision" }],
      );
    if (f.severity !== "error")
      throw invalidInput(
        [{ path: "findingId", message: `only error findings need a waiver; this one is a ${f.severity}` }],
        "The waiver is not valid.",
      );
    const key = keyOfRow(f);
    const existing = (await activeWaivers(tx, mission.id)).find((w) => w.findingKey === key);
    if (existing)
      throw new HttpError(
        409,
        "already-waived",
        "This finding already has a waiver; change or withdraw that one.",
        undefined,
        { waiver: waiverDto(existing) },
      );
    const [w] = await tx
      .insert(waivers)
      .values({
        missionId: mission.id,
        findingKey: key,
        code: f.code,
        chainKey: f.chainKey,
        channelKey: f.channelKey,
        revisionNumber: latest.number,
        findingMessage: f.message,
        reason: input.reason,
        waivedBy: actor.userId,
        waivedByName: actor.name,
      })
      .returning();
    await writeActivity(tx, actor, {
      missionId: mission.id,
      action: "waiver-create",
      entity: `finding ${key}`,
      summary: `Waived ${f.code} on chain ${f.chainKey}${f.channelKey ? `, channel ${f.channelKey}` : ""}: ${input.reason}`,
      revisionBefore: latest.number,
      revisionAfter: latest.number,
    });
    return waiverDto(w!);
  });
}

async function lockedWaiver(tx: Tx, actor: Actor, missionId: string, waiverId: string) {
  const mission = await lockMission(tx, actor, missionId);
  if (!isUuid(waiverId)) throw notFound("waiver");
  const [w] = await tx
    .select()
    .from(waivers)
    .where(and(eq(waivers.id, waiverId), eq(waivers.missionId, mission.id)));
  if (!w) throw notFound("waiver");
  if (w.withdrawnAt) throw new HttpError(409, "withdrawn", "This waiver was withdrawn; record a new one instead.");
  const latest = await latestRevision(tx, mission.id);
  return { mission, w, latestNumber: latest?.number ?? null };
}

export async function updateWaiver(
  actor: Actor,
  missionId: string,
  waiverId: string,
  input: { reason: string; version: number },
) {
  return inTransaction(async (tx) => {
    const { mission, w, latestNumber } = await lockedWaiver(tx, actor, missionId, waiverId);
    if (w.version !== input.version) throw staleVersion(waiverDto(w), "waiver");
    const [u] = await tx
      .update(waivers)
      .set({ reason: input.reason, version: w.version + 1 })
      .where(eq(waivers.id, w.id))
      .returning();
    await writeActivity(tx, actor, {
      missionId: mission.id,
      action: "waiver-update",
      entity: `finding ${w.findingKey}`,
      summary: `Changed the reason of the waiver of ${w.code}: ${input.reason}`,
      revisionBefore: latestNumber,
      revisionAfter: latestNumber,
    });
    return waiverDto(u!);
  });
}

export async function withdrawWaiver(actor: Actor, missionId: string, waiverId: string) {
  return inTransaction(async (tx) => {
    const { mission, w, latestNumber } = await lockedWaiver(tx, actor, missionId, waiverId);
    const [u] = await tx
      .update(waivers)
      .set({ withdrawnAt: new Date(), withdrawnBy: actor.userId, withdrawnByName: actor.name, version: w.version + 1 })
      .where(eq(waivers.id, w.id))
      .returning();
    await writeActivity(tx, actor, {
      missionId: mission.id,
      action: "waiver-withdraw",
      entity: `finding ${w.findingKey}`,
      summary: `Withdrew the waiver of ${w.code} on chain ${w.chainKey}`,
      revisionBefore: latestNumber,
      revisionAfter: latestNumber,
    });
    return waiverDto(u!);
  });
}
