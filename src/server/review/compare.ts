import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@db/client";
import { findings, planRevisions } from "@db/schema";
import { compareRevisions } from "@/lib/review";
import { notFound } from "@/server/core/http";

async function loadRevision(missionId: string, number: number) {
  const [r] = await db
    .select()
    .from(planRevisions)
    .where(and(eq(planRevisions.missionId, missionId), eq(planRevisions.number, number)));
  if (!r) throw notFound(`revision ${number}`);
  const rows = await db.select().from(findings).where(eq(findings.revisionId, r.id)).orderBy(asc(findings.position));
  return {
    meta: {
      number: r.number,
      status: r.status,
      authorName: r.authorName,
      createdAt: r.createdAt.toISOString(),
      summary: r.summary,
    },
    plan: r.plan,
    findings: rows.map((f) => ({
      id: f.id,
      code: f.code,
      severity: f.severity,
      chain: f.chainKey,
      channel: f.channelKey,
      message: f.message,
    })),
  };
}

/** Field-level and finding-level differences between two revisions of a mission (404 when either is missing). */
export async function compareMissionRevisions(missionId: string, from: number, to: number) {
  const a = await loadRevision(missionId, from);
  const b = await loadRevision(missionId, to);
  return { from: a.meta, to: b.meta, ...compareRevisions(a, b) };
}
