import "server-only";
import { and, eq } from "drizzle-orm";
import { missions, planSettings } from "@db/schema";
import {
  DEFAULT_SETTINGS,
  type MissionCreateInput,
  type MissionUpdateInput,
  type SettingsUpdateInput,
} from "@/schemas/workspace";
import type { Actor } from "@/server/auth/actor";
import { writeActivity } from "@/server/core/activity";
import { inTransaction, type Tx } from "@/server/core/db";
import { staleVersion } from "@/server/core/http";
import { lockMission } from "@/server/core/mission-scope";
import { missionDto, settingsDto } from "./mappers";
import { getMission } from "./queries";
import { saveAndCheck } from "./save-and-check";

/** Creates a mission with default plan settings and its first (empty) revision. */
export async function createMission(actor: Actor, input: MissionCreateInput) {
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

export async function updateMission(actor: Actor, missionId: string, input: MissionUpdateInput) {
  const { version, ...changes } = input;
  return inTransaction(async (tx) => {
    const current = await lockMission(tx, actor, missionId);
    if (current.version !== version) throw staleVersion(await getMission(actor, missionId, tx), "mission");
    const [m] = await tx
      .update(missions)
      .set({ ...changes, version: current.version + 1, updatedAt: new Date() })
      .where(eq(missions.id, missionId))
      .returning();
    const fields = (Object.keys(changes) as (keyof typeof changes)[]).filter((k) => changes[k] !== current[k]);
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
    await writeActivity(tx, actor, {
      missionId: null,
      action: "delete",
      entity: `mission ${current.name}`,
      summary: `Deleted mission ${current.name} (${missionId}) and all its revisions.`,
    });
    return { deleted: missionId };
  });
}

export async function updateSettings(actor: Actor, missionId: string, input: SettingsUpdateInput) {
  const { version, ...values } = input;
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
