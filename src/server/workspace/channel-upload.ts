import "server-only";
import { eq, sql } from "drizzle-orm";
import { db } from "@db/client";
import { chains, channels } from "@db/schema";
import { parseChannelCsv, type ChannelCsvParse, type ChannelCsvRow, type FileIssue } from "@/lib/imports";
import { PLAN_LIMITS } from "@/schemas/plan";
import type { ChannelsUploadQuery } from "@/schemas/workspace";
import type { Actor } from "@/server/auth/actor";
import { inTransaction, type Queryable, type Tx } from "@/server/core/db";
import { HttpError } from "@/server/core/http";
import { getMissionRow, lockMission } from "@/server/core/mission-scope";
import { assemblePlan } from "./assemble";
import { prepareCheck, saveAndCheck, stageRevision, type PreparedCheck, type StagedRevision } from "./save-and-check";
import { badFile, storeUpload, textOf, type UploadedFile } from "./uploads";

/**
 * Channel list upload: preview every row with its errors (a page of rows
 * at a time), or apply a file whose rows are all valid — create or update
 * channels by key; channels not in the file stay.
 *
 * The work is ordered so that the mission lock is held only for writing
 * (docs/decisions/023-hardening.md): the file is read and every row
 * validated before the lock, every limit (the plan's channel limit
 * included) is checked before the first write, and the rows are written by
 * one `insert … on conflict do update` statement. The engine checks the
 * plan the file should leave before the lock too, and that revision with
 * its findings is written before the lock (stageRevision); under the lock
 * the plan is assembled again and the staged revision kept only if it is
 * exactly that plan. The chains are read again under the lock; if they
 * changed meanwhile the file is validated again against them.
 */

type ChainKey = { id: string; key: string };

async function chainKeys(q: Queryable, missionId: string): Promise<ChainKey[]> {
  return q.select({ id: chains.id, key: chains.key }).from(chains).where(eq(chains.missionId, missionId));
}

const sameChains = (a: ChainKey[], b: ChainKey[]) => {
  const key = (xs: ChainKey[]) =>
    xs
      .map((c) => `${c.key}\u0000${c.id}`)
      .sort()
      .join("\u0001");
  return key(a) === key(b);
};

function parsedOrRefused(text: string, chainRows: ChainKey[], filename: string) {
  const parsed: ChannelCsvParse = parseChannelCsv(text, chainRows);
  if (!parsed.ok) throw badFile(parsed.issues, filename);
  return parsed;
}

function rowIssues(rows: ChannelCsvRow[]): FileIssue[] {
  return rows.flatMap((r) => r.errors.map((e) => ({ row: r.row, column: e.column, message: e.message })));
}

/** Refuses, before any write, a file that would leave the mission with more channels than a plan may hold. */
function checkChannelLimit(existingKeys: Iterable<string>, rows: ChannelCsvRow[], filename: string): void {
  const keys = new Set(existingKeys);
  const before = keys.size;
  let firstOver: number | null = null;
  for (const r of rows) {
    keys.add(r.channel!.key);
    if (firstOver === null && keys.size > PLAN_LIMITS.channels) firstOver = r.row;
  }
  if (firstOver === null) return;
  throw new HttpError(
    400,
    "invalid-file",
    `"${filename}" would give the mission ${keys.size} channels (it has ${before}); a plan holds at most ${PLAN_LIMITS.channels} (the limit of a plan document). Nothing was saved.`,
    [
      {
        path: `row ${firstOver}`,
        message: `the channel of this row is number ${PLAN_LIMITS.channels + 1}: over the limit of ${PLAN_LIMITS.channels}`,
      },
    ],
  );
}

/** The numbered page of a preview: the rows from `offset`, at most `limit`, and what the whole file holds. */
function previewPage(rows: ChannelCsvRow[], valid: boolean, q: Pick<ChannelsUploadQuery, "offset" | "limit">) {
  const invalid = rows.filter((r) => r.errors.length > 0);
  return {
    rows: rows.slice(q.offset, q.offset + q.limit),
    valid,
    total: rows.length,
    offset: q.offset,
    limit: q.limit,
    invalidRows: invalid.length,
    /** The file rows of the first invalid rows (at most 20), wherever they are in the file. */
    firstInvalidRows: invalid.slice(0, 20).map((r) => r.row),
  };
}

/** The columns the upsert writes, by field name: every field of a channel row but the plan-document-only `chain`. */
const WRITTEN = [
  "name",
  "chainId",
  "centerGHz",
  "bandwidthMHz",
  "dsbOffsetGHz",
  "integrationMs",
  "antennaK",
  "receiverK",
  "gainStability",
  "requiredNedtK",
  "ifFilter",
  "centreToleranceMHz",
] as const;

/** The fields of plan format 2 a file without their column leaves as stored (ChannelCsvParse.keptColumns). */
type KeptColumns = readonly ("ifFilter" | "centreToleranceMHz")[];

/**
 * Writes the rows in one statement (insert, or update the row with the
 * same key); new keys are appended after the existing channels in file
 * order. An updated row keeps its stored value of a `kept` column (a
 * version 2 column the file does not have). Returns how many were created
 * and updated.
 */
export async function writeChannelRows(
  tx: Tx,
  missionId: string,
  rows: ChannelCsvRow[],
  existing: Map<string, number>,
  kept: KeptColumns = [],
): Promise<{ created: number; updated: number }> {
  if (rows.length === 0) return { created: 0, updated: 0 };
  let next = existing.size ? Math.max(...existing.values()) + 1 : 0;
  const values = rows.map((r) => {
    const { chain: _chainKey, ...input } = r.channel!;
    return { ...input, missionId, position: existing.get(input.key) ?? next++ };
  });
  const set = Object.fromEntries(
    WRITTEN.filter((field) => !(kept as readonly string[]).includes(field)).map((field) => [
      field,
      sql.raw(`excluded."${channels[field].name}"`),
    ]),
  ) as Record<(typeof WRITTEN)[number], ReturnType<typeof sql.raw>>;
  const written = await tx
    .insert(channels)
    .values(values)
    .onConflictDoUpdate({
      target: [channels.missionId, channels.key],
      set: { ...set, version: sql`${channels.version} + 1`, updatedAt: sql`now()` },
    })
    .returning({ inserted: sql<boolean>`(xmax = 0)` });
  const created = written.filter((w) => w.inserted).length;
  return { created, updated: written.length - created };
}

/** Key → position of the mission's channels, locked for the rest of the transaction. */
async function lockedChannelPositions(tx: Tx, missionId: string): Promise<Map<string, number>> {
  const rows = await tx
    .select({ key: channels.key, position: channels.position })
    .from(channels)
    .where(eq(channels.missionId, missionId))
    .for("update");
  return new Map(rows.map((r) => [r.key, r.position]));
}

/** A channel file read and validated outside the lock: every row valid and within the limit, ready to apply. */
export interface PreparedChannels {
  text: string;
  file: UploadedFile;
  rows: ChannelCsvRow[];
  keptColumns: KeptColumns;
  chainsBefore: ChainKey[];
  /** The check of the plan this apply should leave, computed before the lock. */
  check: PreparedCheck | null;
}

/**
 * The plan document the rows would leave: the draft's channels updated by
 * key (keeping the kept columns' stored values), new ones appended in file
 * order (as writeChannelRows stores them).
 */
function planAfter(draft: Awaited<ReturnType<typeof assemblePlan>>, rows: ChannelCsvRow[], kept: KeptColumns) {
  const channelsAfter = [...draft.channels];
  const at = new Map(channelsAfter.map((c, i) => [c.id, i]));
  for (const r of rows) {
    const { chain, chainId: _chainId, key, ...fields } = r.channel!;
    const doc = { id: key, chain, ...fields };
    const i = at.get(key);
    if (i === undefined) {
      at.set(key, channelsAfter.length);
      channelsAfter.push(doc);
    } else {
      const stored = channelsAfter[i]!;
      channelsAfter[i] = {
        ...doc,
        ...Object.fromEntries(kept.map((c) => [c, (stored as Record<string, unknown>)[c]])),
      };
    }
  }
  return { ...draft, channels: channelsAfter };
}

/**
 * Everything before the lock: reads and validates the file (preview: the
 * page of rows; apply: 400 for any row error or a file over the channel
 * limit). Holds no lock, so a large or bad file holds no one up.
 */
export async function prepareChannelUpload(
  actor: Actor,
  missionId: string,
  q: Pick<ChannelsUploadQuery, "apply" | "offset" | "limit">,
  file: UploadedFile,
): Promise<{ preview: ReturnType<typeof previewPage> } | { prepared: PreparedChannels }> {
  const text = textOf(file);
  await getMissionRow(actor, missionId);
  const chainsBefore = await chainKeys(db, missionId);
  const parsed = parsedOrRefused(text, chainsBefore, file.filename);
  if (!q.apply) return { preview: previewPage(parsed.rows, parsed.valid, q) };
  if (!parsed.valid) throw badFile(rowIssues(parsed.rows), file.filename);
  const keysBefore = await db.select({ key: channels.key }).from(channels).where(eq(channels.missionId, missionId));
  checkChannelLimit(
    keysBefore.map((k) => k.key),
    parsed.rows,
    file.filename,
  );
  // The engine runs here, without the lock, on the plan the apply should leave; under the lock
  // saveAndCheck uses this result only if the plan there is exactly this one.
  const check = await prepareCheck(planAfter(await assemblePlan(db, missionId), parsed.rows, parsed.keptColumns));
  return { prepared: { text, file, rows: parsed.rows, keptColumns: parsed.keptColumns, chainsBefore, check } };
}

/**
 * The part under the mission lock (the caller holds it, lockMission): the
 * chains read again (the file validated again only if they changed), the
 * limit checked again against the locked channel rows, one upsert
 * statement, the stored upload and the re-check with its revision.
 */
export async function applyPreparedChannels(
  tx: Tx,
  actor: Actor,
  missionId: string,
  p: PreparedChannels,
  staged?: StagedRevision | null,
) {
  let rows = p.rows;
  const chainsNow = await chainKeys(tx, missionId);
  if (!sameChains(chainsNow, p.chainsBefore)) {
    const again = parsedOrRefused(p.text, chainsNow, p.file.filename);
    if (!again.valid) throw badFile(rowIssues(again.rows), p.file.filename);
    rows = again.rows;
  }
  const existing = await lockedChannelPositions(tx, missionId);
  checkChannelLimit(existing.keys(), rows, p.file.filename);
  const { created, updated } = await writeChannelRows(tx, missionId, rows, existing, p.keptColumns);
  await storeUpload(tx, actor, missionId, "channels", p.file);
  const revision = await saveAndCheck(
    tx,
    missionId,
    actor,
    {
      action: "upload",
      entity: "channels",
      summary: `Applied channel list "${p.file.filename}": ${created} added, ${updated} updated.`,
    },
    staged ?? p.check,
  );
  return { ...previewPage(rows, true, { offset: 0, limit: Math.max(rows.length, 1) }), created, updated, revision };
}

export async function uploadChannels(
  actor: Actor,
  missionId: string,
  q: Pick<ChannelsUploadQuery, "apply" | "offset" | "limit">,
  file: UploadedFile,
) {
  const ready = await prepareChannelUpload(actor, missionId, q, file);
  if ("preview" in ready) return ready.preview;
  return inTransaction(async (tx) => {
    // The revision and its findings are written first, before the lock (see stageRevision).
    const staged = ready.prepared.check ? await stageRevision(tx, missionId, actor, ready.prepared.check) : null;
    await lockMission(tx, actor, missionId);
    return applyPreparedChannels(tx, actor, missionId, ready.prepared, staged);
  });
}
