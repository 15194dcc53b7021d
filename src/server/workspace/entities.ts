import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "@db/client";
import type { AnyPgColumn, PgTable } from "drizzle-orm/pg-core";
import { chains, channels, detectors, lasers, resonators } from "@db/schema";
import { entityCreateSchemas, entityUpdateSchemas, type EntityKind } from "@/schemas/workspace";
import { HttpError, notFound } from "@/server/http";
import type { Actor } from "@/server/auth/actor";
import { invalidInput, isUuid, mapDbError, parseOr400, staleVersion, zodIssues } from "./errors";
import {
  chainDto,
  chainInputOf,
  chainValues,
  channelDto,
  channelInputOf,
  channelValues,
  detectorDto,
  detectorInputOf,
  detectorValues,
  laserDto,
  laserInputOf,
  laserValues,
  resonatorDto,
  resonatorInputOf,
  resonatorValues,
} from "./mappers";
import { saveAndCheck, type RevisionInfo } from "./save-and-check";
import { inTransaction, lockMission, type Queryable, type Tx } from "./tx";
import { getMissionRow } from "./queries";
import { assemblePlan } from "./assemble";

/* eslint-disable @typescript-eslint/no-explicit-any -- one table-driven service for five entity kinds */
type AnyRow = { id: string; key: string; version: number; missionId: string; position: number } & Record<string, any>;
interface Kind {
  singular: string;
  table: PgTable & { id: AnyPgColumn; missionId: AnyPgColumn; version: AnyPgColumn; position: AnyPgColumn };
  dto: (r: any) => Record<string, unknown>;
  inputOf: (r: any) => Record<string, unknown>;
  values: (i: any) => Record<string, unknown>;
}

const KINDS: Record<EntityKind, Kind> = {
  lasers: { singular: "laser", table: lasers, dto: laserDto, inputOf: laserInputOf, values: laserValues },
  resonators: {
    singular: "resonator",
    table: resonators,
    dto: resonatorDto,
    inputOf: resonatorInputOf,
    values: resonatorValues,
  },
  detectors: {
    singular: "detector",
    table: detectors,
    dto: detectorDto,
    inputOf: detectorInputOf,
    values: detectorValues,
  },
  chains: { singular: "chain", table: chains, dto: chainDto, inputOf: chainInputOf, values: chainValues },
  channels: { singular: "channel", table: channels, dto: channelDto, inputOf: channelInputOf, values: channelValues },
};

export function singularOf(kind: EntityKind): string {
  return KINDS[kind].singular;
}

async function findRow(q: Queryable, kind: EntityKind, missionId: string, id: string, lock: boolean): Promise<AnyRow> {
  const k = KINDS[kind];
  if (!isUuid(id)) throw notFound(k.singular);
  const base = q
    .select()
    .from(k.table as any)
    .where(and(eq(k.table.id, id), eq(k.table.missionId, missionId)));
  const rows = (lock ? await base.for("update") : await base) as AnyRow[];
  const row = rows[0];
  if (!row) throw notFound(k.singular);
  return row;
}

/** References of a chain or channel must be rows of the same mission. */
async function checkReferences(tx: Tx, kind: EntityKind, missionId: string, input: Record<string, unknown>) {
  const refs: [string, Kind][] =
    kind === "chains"
      ? [
          ["laserId", KINDS.lasers],
          ["resonatorId", KINDS.resonators],
          ["detectorId", KINDS.detectors],
        ]
      : kind === "channels"
        ? [["chainId", KINDS.chains]]
        : [];
  const issues = [];
  for (const [field, k] of refs) {
    const id = String(input[field]);
    const rows = await tx
      .select({ id: k.table.id })
      .from(k.table as any)
      .where(and(eq(k.table.id, id), eq(k.table.missionId, missionId)));
    if (rows.length === 0) issues.push({ path: field, message: `no ${k.singular} with this id in the mission` });
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

export async function listEntities(actor: Actor, missionId: string, kind: EntityKind) {
  await getMissionRow(actor, missionId);
  const k = KINDS[kind];
  const rows = (await db
    .select()
    .from(k.table as any)
    .where(eq(k.table.missionId, missionId))
    .orderBy(asc(k.table.position), sql`created_at`)) as AnyRow[];
  return rows.map(k.dto);
}

export async function getEntity(actor: Actor, missionId: string, kind: EntityKind, id: string) {
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
async function checkAfter(
  tx: Tx,
  missionId: string,
  actor: Actor,
  kind: EntityKind,
  key: string,
  note: Parameters<typeof saveAndCheck>[3],
) {
  try {
    return await saveAndCheck(tx, missionId, actor, note);
  } catch (e) {
    if (!(e instanceof HttpError) || e.code !== "invalid-plan" || !e.issues) throw e;
    const plan = await assemblePlan(tx, missionId);
    const index = (plan[kind] as { id: string }[]).findIndex((r) => r.id === key);
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

export type MutationResult = { entity: Record<string, unknown>; revision: RevisionInfo };

export async function createEntity(
  actor: Actor,
  missionId: string,
  kind: EntityKind,
  body: unknown,
): Promise<MutationResult> {
  const k = KINDS[kind];
  const input = parseOr400(entityCreateSchemas[kind], body, k.singular) as Record<string, unknown>;
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    await checkReferences(tx, kind, missionId, input);
    const [{ next } = { next: 0 }] = await tx
      .select({ next: sql<number>`coalesce(max(${k.table.position}), -1) + 1` })
      .from(k.table as any)
      .where(eq(k.table.missionId, missionId));
    let row: AnyRow;
    try {
      const inserted = (await tx
        .insert(k.table)
        .values({ ...k.values(input), missionId, position: Number(next) } as any)
        .returning()) as AnyRow[];
      row = inserted[0] as AnyRow;
    } catch (e) {
      throw mapDbError(e, k.singular);
    }
    const revision = await checkAfter(tx, missionId, actor, kind, row.key, {
      action: "create",
      entity: `${k.singular} ${row.key}`,
      summary: `Added ${k.singular} ${row.key}.`,
    });
    return { entity: k.dto(row), revision };
  });
}

export async function updateEntity(
  actor: Actor,
  missionId: string,
  kind: EntityKind,
  id: string,
  body: unknown,
): Promise<MutationResult> {
  const k = KINDS[kind];
  const patch = parseOr400(entityUpdateSchemas[kind], body, `${k.singular} update`) as Record<string, unknown>;
  const { version, ...changes } = patch;
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    const current = await findRow(tx, kind, missionId, id, true);
    if (current.version !== version) throw staleVersion(k.dto(current), k.singular);
    const merged = { ...k.inputOf(current), ...changes };
    const parsed = entityCreateSchemas[kind].safeParse(merged);
    if (!parsed.success) throw invalidInput(zodIssues(parsed.error), `The ${k.singular} is not valid.`);
    const input = parsed.data as Record<string, unknown>;
    await checkReferences(tx, kind, missionId, input);
    let row: AnyRow;
    try {
      const updated = (await tx
        .update(k.table)
        .set({ ...k.values(input), version: current.version + 1, updatedAt: new Date() } as any)
        .where(and(eq(k.table.id, id), eq(k.table.version, current.version)))
        .returning()) as AnyRow[];
      if (!updated[0]) throw staleVersion(k.dto(current), k.singular);
      row = updated[0];
    } catch (e) {
      throw mapDbError(e, k.singular);
    }
    const fields = Object.keys(changes).filter(
      (f) => JSON.stringify(k.inputOf(current)[f]) !== JSON.stringify((input as Record<string, unknown>)[f]),
    );
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

export async function deleteEntity(
  actor: Actor,
  missionId: string,
  kind: EntityKind,
  id: string,
  version: number,
): Promise<{ revision: RevisionInfo }> {
  const k = KINDS[kind];
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
    await tx.delete(k.table).where(eq(k.table.id, id));
    const revision = await saveAndCheck(tx, missionId, actor, {
      action: "delete",
      entity: `${k.singular} ${current.key}`,
      summary: `Removed ${k.singular} ${current.key}.`,
    });
    return { revision };
  });
}
