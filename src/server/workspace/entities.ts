import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "@db/client";
import { chains, channels } from "@db/schema";
import type { EntityKind } from "@/schemas/workspace";
import type { Actor } from "@/server/auth/actor";
import { inTransaction, mapDbError, type Queryable, type Tx } from "@/server/core/db";
import { HttpError, invalidInput, notFound, staleVersion } from "@/server/core/http";
import { isUuid, parseOr400 } from "@/server/core/input";
import { getMissionRow, lockMission } from "@/server/core/mission-scope";
import {
  KINDS,
  REFERENCES,
  rowsOf,
  type EntityInput,
  type EntityPatch,
  type EntityTable,
  type Row,
} from "./entity-kinds";
import { saveAndCheck, type ActivityNote, type RevisionInfo } from "./save-and-check";
import { assemblePlan } from "./assemble";

/**
 * One service for the five entity kinds of a mission (lasers, resonators,
 * detectors, chains, channels): list, read, create, update (with version)
 * and delete, each change re-checked through saveAndCheck. What differs per
 * kind is in its typed spec (entity-kinds.ts).
 */

export type { EntityInput, EntityPatch };
export { singularOf } from "./entity-kinds";

async function findRow<K extends EntityKind>(
  q: Queryable,
  kind: K,
  missionId: string,
  id: string,
  lock: boolean,
): Promise<Row<K>> {
  const k = KINDS[kind];
  if (!isUuid(id)) throw notFound(k.singular);
  const table: EntityTable = k.table;
  const base = q
    .select()
    .from(table)
    .where(and(eq(table.id, id), eq(table.missionId, missionId)));
  const [row] = rowsOf(k, lock ? await base.for("update") : await base);
  if (!row) throw notFound(k.singular);
  return row;
}

/** References of a chain or channel must be rows of the same mission. */
async function checkReferences<K extends EntityKind>(tx: Tx, kind: K, missionId: string, input: EntityInput<K>) {
  const issues = [];
  for (const [field, target] of REFERENCES[kind]) {
    const table: EntityTable = KINDS[target].table;
    const rows = await tx
      .select({ id: table.id })
      .from(table)
      .where(and(eq(table.id, String(input[field])), eq(table.missionId, missionId)));
    if (rows.length === 0)
      issues.push({ path: field, message: `no ${KINDS[target].singular} with this id in the mission` });
  }
  if (issues.length) throw invalidInput(issues);
}

async function dependents(tx: Tx, kind: EntityKind, id: string): Promise<string[]> {
  if (kind === "channels") return [];
  if (kind === "chains")
    return (await tx.select({ key: channels.key }).from(channels).where(eq(channels.chainId, id))).map(
      (r) => `channel ${r.key}`,
    );
  const col = kind === "lasers" ? chains.laserId : kind === "resonators" ? chains.resonatorId : chains.detectorId;
  return (await tx.select({ key: chains.key }).from(chains).where(eq(col, id))).map((r) => `chain ${r.key}`);
}

export async function listEntities<K extends EntityKind>(actor: Actor, missionId: string, kind: K) {
  await getMissionRow(actor, missionId);
  const k = KINDS[kind];
  const table: EntityTable = k.table;
  const rows = await db
    .select()
    .from(table)
    .where(eq(table.missionId, missionId))
    .orderBy(asc(table.position), asc(table.createdAt));
  return rowsOf(k, rows).map((r) => k.dto(r));
}

export async function getEntity<K extends EntityKind>(actor: Actor, missionId: string, kind: K, id: string) {
  await getMissionRow(actor, missionId);
  return KINDS[kind].dto(await findRow(db, kind, missionId, id, false));
}

/** Plan-document field names that differ from the entity form's. */
const FORM_FIELD: Record<string, string> = {
  id: "key",
  laser: "laserId",
  resonator: "resonatorId",
  detector: "detectorId",
  chain: "chainId",
};

/**
 * Re-checks after a row change; when the assembled plan is invalid, issues
 * about the changed row are renamed to the form's fields (`chains[1].laser`
 * → `laserId`) so a form can show them beside the field; issues about other
 * rows keep their plan-document path.
 */
async function checkAfter(tx: Tx, missionId: string, actor: Actor, kind: EntityKind, key: string, note: ActivityNote) {
  try {
    return await saveAndCheck(tx, missionId, actor, note);
  } catch (e) {
    if (!(e instanceof HttpError) || e.code !== "invalid-plan" || !e.issues) throw e;
    const plan = await assemblePlan(tx, missionId);
    const index = plan[kind].findIndex((r) => r.id === key);
    const prefix = `${kind}[${index}].`;
    const issues = e.issues.map((i) => {
      if (index < 0 || !i.path.startsWith(prefix)) return i;
      const rest = i.path.slice(prefix.length);
      const head = rest.split(/[.[]/)[0] ?? rest;
      return { ...i, path: (FORM_FIELD[head] ?? head) + rest.slice(head.length) };
    });
    throw new HttpError(e.status, e.code, e.message, issues, e.extra);
  }
}

export type MutationResult = { entity: { id: string; key: string; version: number }; revision: RevisionInfo };

export async function createEntity<K extends EntityKind>(
  actor: Actor,
  missionId: string,
  kind: K,
  input: EntityInput<K>,
): Promise<MutationResult> {
  const k = KINDS[kind];
  const table: EntityTable = k.table;
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    await checkReferences(tx, kind, missionId, input);
    const [{ next } = { next: 0 }] = await tx
      .select({ next: sql<number>`coalesce(max(${table.position}), -1) + 1` })
      .from(table)
      .where(eq(table.missionId, missionId));
    const values: EntityTable["$inferInsert"] = { ...k.values(input), missionId, position: Number(next) };
    let row: Row<K> | undefined;
    try {
      [row] = rowsOf(k, await tx.insert(table).values(values).returning());
    } catch (e) {
      throw mapDbError(e, k.singular);
    }
    if (!row) throw new Error(`${k.singular} insert returned no row`);
    const revision = await checkAfter(tx, missionId, actor, kind, row.key, {
      action: "create",
      entity: `${k.singular} ${row.key}`,
      summary: `Added ${k.singular} ${row.key}.`,
    });
    return { entity: k.dto(row), revision };
  });
}

export async function updateEntity<K extends EntityKind>(
  actor: Actor,
  missionId: string,
  kind: K,
  id: string,
  patch: EntityPatch<K>,
): Promise<MutationResult> {
  const k = KINDS[kind];
  const table: EntityTable = k.table;
  const { version, ...changes } = patch;
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    const current = await findRow(tx, kind, missionId, id, true);
    if (current.version !== version) throw staleVersion(k.dto(current), k.singular);
    const before: Record<string, unknown> = k.inputOf(current);
    const input = parseOr400(k.schema, { ...before, ...changes }, k.singular);
    await checkReferences(tx, kind, missionId, input);
    const values: Partial<EntityTable["$inferInsert"]> = {
      ...k.values(input),
      version: current.version + 1,
      updatedAt: new Date(),
    };
    let row: Row<K> | undefined;
    try {
      [row] = rowsOf(
        k,
        await tx
          .update(table)
          .set(values)
          .where(and(eq(table.id, id), eq(table.version, current.version)))
          .returning(),
      );
    } catch (e) {
      throw mapDbError(e, k.singular);
    }
    if (!row) throw staleVersion(k.dto(current), k.singular);
    const after: Record<string, unknown> = input;
    const fields = Object.keys(changes).filter((f) => JSON.stringify(before[f]) !== JSON.stringify(after[f]));
    const revision = await checkAfter(tx, missionId, actor, kind, row.key, {
      action: "update",
      entity: `${k.singular} ${row.key}`,
      summary: fields.length
        ? `Changed ${k.singular} ${current.key}: ${fields.join(", ")}.`
        : `Saved ${k.singular} ${current.key} unchanged.`,
    });
    return { entity: k.dto(row), revision };
  });
}

export async function deleteEntity<K extends EntityKind>(
  actor: Actor,
  missionId: string,
  kind: K,
  id: string,
  version: number,
): Promise<{ revision: RevisionInfo }> {
  const k = KINDS[kind];
  const table: EntityTable = k.table;
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    const current = await findRow(tx, kind, missionId, id, true);
    if (current.version !== version) throw staleVersion(k.dto(current), k.singular);
    const users = await dependents(tx, kind, id);
    if (users.length)
      throw new HttpError(
        409,
        "in-use",
        `${k.singular[0]!.toUpperCase()}${k.singular.slice(1)} ${current.key} is used by ${users.join(", ")}; remove or re-point them first.`,
      );
    await tx.delete(table).where(eq(table.id, id));
    const revision = await saveAndCheck(tx, missionId, actor, {
      action: "delete",
      entity: `${k.singular} ${current.key}`,
      summary: `Removed ${k.singular} ${current.key}.`,
    });
    return { revision };
  });
}
