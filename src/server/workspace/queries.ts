import "server-only";
import { and, asc, desc, eq, sql, type SQL } from "drizzle-orm";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import { db } from "@db/client";
import {
  activity,
  chains,
  channels,
  detectors,
  findings,
  lasers,
  missions,
  planRevisions,
  planSettings,
  resonators,
} from "@db/schema";
import type { FindingsQuery } from "@/schemas/workspace";
import type { Actor } from "@/server/auth/actor";
import type { Queryable } from "@/server/core/db";
import { notFound } from "@/server/core/http";
import { isUuid } from "@/server/core/input";
import {
  chainDto,
  channelDto,
  channelFigures,
  detectorDto,
  laserDto,
  missionDto,
  resonatorDto,
  settingsDto,
} from "./mappers";

/** Named read queries of the workspace. Every one is scoped to the actor's team. */

/**
 * The mission of the actor's team with the status of its latest revision,
 * in one query (the status by a subquery; "draft" before the first
 * revision), or 404 like getMissionRow.
 */
export async function getMission(actor: Actor, missionId: string, q: Queryable = db) {
  if (!isUuid(missionId)) throw notFound("mission");
  const [r] = await q
    .select({
      m: missions,
      // Written out in full: drizzle names a column of the outer table without its table inside `sql`.
      status: sql<string | null>`${sql.raw(
        '(select r.status from plan_revisions r where r.mission_id = "missions"."id" order by r.number desc limit 1)',
      )}`,
    })
    .from(missions)
    .where(and(eq(missions.id, missionId), eq(missions.teamId, actor.teamId)));
  if (!r) throw notFound("mission");
  return missionDto(r.m, r.status ?? "draft");
}

export async function listMissions(actor: Actor) {
  const latest = (col: string) =>
    sql.raw(
      `(select r.${col} from plan_revisions r where r.mission_id = "missions"."id" order by r.number desc limit 1)`,
    );
  const rows = await db
    .select({
      m: missions,
      status: sql<string | null>`${latest("status")}`,
      openErrors: sql<number | null>`${latest("error_count")}`,
      openWarnings: sql<number | null>`${latest("warning_count")}`,
      chainCount: sql<number>`${sql.raw('(select count(*)::int from chains c where c.mission_id = "missions"."id")')}`,
      channelCount: sql<number>`${sql.raw('(select count(*)::int from channels c where c.mission_id = "missions"."id")')}`,
      // Errors of the newest revision whose finding key (code|chain|channel) carries a waiver not withdrawn.
      waivedErrors: sql<number>`${sql.raw(
        `(select count(*)::int from findings f
           where f.severity = 'error'
             and f.revision_id = (select r.id from plan_revisions r where r.mission_id = "missions"."id" order by r.number desc limit 1)
             and exists (select 1 from waivers w where w.mission_id = "missions"."id" and w.withdrawn_at is null
                           and w.finding_key = f.code || '|' || f.chain_key || '|' || coalesce(f.channel_key, '')))`,
      )}`,
    })
    .from(missions)
    .where(eq(missions.teamId, actor.teamId))
    .orderBy(desc(missions.updatedAt));
  return rows.map((r) => ({
    id: r.m.id,
    name: r.m.name,
    description: r.m.description,
    status: r.status ?? "draft",
    chainCount: Number(r.chainCount),
    channelCount: Number(r.channelCount),
    openErrors: Number(r.openErrors ?? 0),
    openWarnings: Number(r.openWarnings ?? 0),
    waivedErrors: Number(r.waivedErrors ?? 0),
    updatedAt: r.m.updatedAt.toISOString(),
    version: r.m.version,
  }));
}

const order = (t: { position: AnyPgColumn; createdAt: AnyPgColumn }) => [asc(t.position), asc(t.createdAt)];

export async function listLasers(missionId: string, q: Queryable = db) {
  return (
    await q
      .select()
      .from(lasers)
      .where(eq(lasers.missionId, missionId))
      .orderBy(...order(lasers))
  ).map(laserDto);
}
export async function listResonators(missionId: string, q: Queryable = db) {
  return (
    await q
      .select()
      .from(resonators)
      .where(eq(resonators.missionId, missionId))
      .orderBy(...order(resonators))
  ).map(resonatorDto);
}
export async function listDetectors(missionId: string, q: Queryable = db) {
  return (
    await q
      .select()
      .from(detectors)
      .where(eq(detectors.missionId, missionId))
      .orderBy(...order(detectors))
  ).map(detectorDto);
}
export async function listChains(missionId: string, q: Queryable = db) {
  return (
    await q
      .select()
      .from(chains)
      .where(eq(chains.missionId, missionId))
      .orderBy(...order(chains))
  ).map(chainDto);
}
export async function listChannels(missionId: string, q: Queryable = db) {
  return (
    await q
      .select()
      .from(channels)
      .where(eq(channels.missionId, missionId))
      .orderBy(...order(channels))
  ).map(channelDto);
}

export async function getSettings(missionId: string, q: Queryable = db) {
  const [s] = await q.select().from(planSettings).where(eq(planSettings.missionId, missionId));
  if (!s) throw notFound("plan settings");
  return settingsDto(s);
}

export async function getLatestRevision(missionId: string, q: Queryable = db) {
  const [r] = await q
    .select()
    .from(planRevisions)
    .where(eq(planRevisions.missionId, missionId))
    .orderBy(desc(planRevisions.number))
    .limit(1);
  return r ?? null;
}

export async function listRevisions(missionId: string) {
  const rows = await db
    .select({
      number: planRevisions.number,
      status: planRevisions.status,
      authorName: planRevisions.authorName,
      createdAt: planRevisions.createdAt,
      errorCount: planRevisions.errorCount,
      warningCount: planRevisions.warningCount,
      infoCount: planRevisions.infoCount,
      summary: planRevisions.summary,
    })
    .from(planRevisions)
    .where(eq(planRevisions.missionId, missionId))
    .orderBy(desc(planRevisions.number));
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

export async function getRevision(missionId: string, number: number) {
  const [r] = await db
    .select()
    .from(planRevisions)
    .where(and(eq(planRevisions.missionId, missionId), eq(planRevisions.number, number)));
  if (!r) throw notFound("revision");
  return {
    number: r.number,
    status: r.status,
    authorName: r.authorName,
    createdAt: r.createdAt.toISOString(),
    summary: r.summary,
    plan: r.plan,
    result: r.result,
  };
}

/** Findings of the latest revision, filtered by severity, chain key, channel key and code. */
export async function listFindings(missionId: string, filter: FindingsQuery) {
  const latest = await getLatestRevision(missionId);
  if (!latest) return { revision: null, findings: [] };
  const conds: SQL[] = [eq(findings.revisionId, latest.id)];
  if (filter.severity) conds.push(eq(findings.severity, filter.severity));
  if (filter.chain) conds.push(eq(findings.chainKey, filter.chain));
  if (filter.channel) conds.push(eq(findings.channelKey, filter.channel));
  if (filter.code) conds.push(eq(findings.code, filter.code));
  const rows = await db
    .select()
    .from(findings)
    .where(and(...conds))
    .orderBy(asc(findings.position));
  return {
    revision: latest.number,
    findings: rows.map((f) => ({
      code: f.code,
      severity: f.severity,
      chain: f.chainKey,
      channel: f.channelKey,
      message: f.message,
      data: f.data,
    })),
  };
}

export async function listActivity(missionId: string, limit = 500) {
  const rows = await db
    .select()
    .from(activity)
    .where(eq(activity.missionId, missionId))
    .orderBy(desc(activity.at), desc(activity.revisionAfter))
    .limit(limit);
  return rows.map((a) => ({
    at: a.at.toISOString(),
    actorName: a.actorName,
    action: a.action,
    entity: a.entity,
    summary: a.summary,
    revision: a.revisionAfter,
    revisionBefore: a.revisionBefore,
  }));
}

/** Channels with their chain key, in stored order, for the CSV export. */
export async function listChannelsForCsv(missionId: string) {
  const rows = await db
    .select({ ch: channels, chainKey: chains.key })
    .from(channels)
    .innerJoin(chains, eq(chains.id, channels.chainId))
    .where(eq(channels.missionId, missionId))
    .orderBy(asc(channels.position), asc(channels.createdAt));
  return rows.map(({ ch, chainKey }) => ({
    key: ch.key,
    name: ch.name,
    chain: chainKey,
    ...channelFigures(ch),
  }));
}
