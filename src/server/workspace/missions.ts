import "server-only";
import { and, eq } from "drizzle-orm";
import { activity, missions, planSettings } from "@db/schema";
import { DEFAULT_SETTINGS, missionCreateSchema, missionUpdateSchema, settingsUpdateSchema } from "@/schemas/workspace";
import type { Actor } from "@/server/auth/actor";
import { parseOr400, staleVersion } from "./errors";
import { missionDto, settingsDto } from "./mappers";
import { getMission } from "./queries";
import { saveAndCheck } from "./save-and-check";
import { inTransaction, lockMission, type Tx } from "./tx";

/** Creates a mission with default plan settings and its first (empty) revision. */
export async function createMission(actor: Actor, body: unknown) {
  const input = parseOr400(missionCreateSchema, body, "mission");
  return inTransaction((tx) => createMissionIn(tx, actor, input.name, input.description ?? ""));
}

export async function createMissionIn(tx: Tx, actor: Actor, name: string, description: string) {
  const [m] = await tx
    .insert(missions)
    .values({ teamId: actor.teamId, name, description, createdBy: actor.userId })
    .returning();
  if (!m) throw new Error("mission insert returned no row");
  await tx.insert(planSettings).values({ missionId: m.id, ...DEFAULT_SETTINGS });
  const revision = await saveAndCheck(tx, m.id, actor, {
    action: "create",
    entity: `mission ${name}`,
    summary: `Created mission ${name}.`,
  });
  return { ...missionDto(m, "draft"), revision };
}

export async function updateMission(actor: Actor, missionId: string, body: unknown) {
  const { version, ...changes } = parseOr400(missionUpdateSchema, body, "mission update");
  return inTransaction(async (tx) => {
    const current = await lockMission(tx, actor, missionId);
    if (current.version !== version) throw staleVersion(await getMission(actor, missionId, tx), "mission");
    const [m] = await tx
      .update(missions)
      .set({ ...changes, version: current.version + 1, updatedAt: new Date() })
      .where(eq(missions.id, missionId))
      .returning();
    const fields = Object.keys(changes).filter(
      (k) => (changes as Record<string, unknown>)[k] !== (current as Record<string, unknown>)[k],
    );
    const revision = await saveAndCheck(tx, missionId, actor, {
      action: "update",
      entity: `mission ${m!.name}`,
      summary: fields.length ? `Changed mission: ${fields.join(", ")}.` : "Saved the mission unchanged.",
    });
    return { ...(await getMission(actor, missionId, tx)), revision };
  });
}

/** Deletes a mission and everything in it (owner only; checked by the route). Logged at team level. */
export async function deleteMission(actor: Actor, missionId: string, version: number | undefined) {
  return inTransaction(async (tx) => {
    const current = await lockMission(tx, actor, missionId);
    if (version !== undefined && current.version !== version)
      throw staleVersion(await getMission(actor, missionId, tx), "mission");
    await tx.delete(missions).where(and(eq(missions.id, missionId), eq(missions.teamId, actor.teamId)));
    await tx.insert(activity).values({
      teamId: actor.teamId,
      missionId: null,
      actorId: actor.userId,
      actorName: actor.name,
      action: "delete",
      entity: `mission ${current.name}`,
      summary: `Deleted mission ${current.name} (${missionId}) and all its revisions.`,
    });
    return { deleted: missionId };
  });
}

export async function updateSettings(actor: Actor, missionId: string, body: unknown) {
  const { version, ...values } = parseOr400(settingsUpdateSchema, body, "settings");
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    const [current] = await tx.select().from(planSettings).where(eq(planSettings.missionId, missionId)).for("update");
    if (!current) throw new Error("mission without settings");
    if (current.version !== version) throw staleVersion(settingsDto(current), "settings");
    const [row] = await tx
      .update(planSettings)
      .set({ ...values, version: current.version + 1, updatedAt: new Date() })
      .where(eq(planSettings.missionId, missionId))
      .returning();
    const fields = (Object.keys(values) as (keyof typeof values)[]).filter((k) => values[k] !== current[k]);
    const revision = await saveAndCheck(tx, missionId, actor, {
      action: "update",
      entity: "settings",
      summary: fields.length
        ? `Changed settings: ${fields.map((f) => `${f} ${current[f]} → ${values[f]}`).join(", ")}.`
        : "Saved the settings unchanged.",
    });
    return { ...settingsDto(row!), revision };
  });
}
