import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@db/client";
import { chains, lasers, type Laser } from "@db/schema";
import type { ScheduleUpdateInput } from "@/schemas/workspace-schedule";
import type { Actor } from "@/server/auth/actor";
import { inTransaction, type Queryable } from "@/server/core/db";
import { HttpError, invalidInput, notFound, staleVersion } from "@/server/core/http";
import { isUuid } from "@/server/core/input";
import { getMissionRow, lockMission } from "@/server/core/mission-scope";
import { assemblePlan } from "./assemble";
import { saveAndCheck, type RevisionInfo } from "./save-and-check";
import { scheduleOfRow } from "./schedule-rows";

/**
 * A laser pair's observation schedule in the workspace (docs/plan-format.md
 * §13): read it, and replace it as a whole (or remove it), each change
 * re-checked through saveAndCheck as a new revision, so "apply best split"
 * is a change like any other that the server checks again. A chain of
 * another laser pair put in the schedule moves to this laser pair (that is
 * what sharing it means); every other rule is the plan's own, its issues
 * given back at the request's fields (`schedule.dwells[1].dwellMs`).
 */

/** The schedule of a laser as the routes answer it. */
export interface ScheduleAnswer {
  laserId: string;
  laserKey: string;
  /** The laser's version: send it back with a change. */
  version: number;
  schedule: {
    cycleMs: number;
    retuneMs: number;
    retuneMsPerGHz: number;
    relockMs: number;
    dwells: { chainId: string; chainKey: string; dwellMs: number }[];
  } | null;
}

async function findLaser(q: Queryable, missionId: string, id: string, lock: boolean): Promise<Laser> {
  if (!isUuid(id)) throw notFound("laser");
  const base = q
    .select()
    .from(lasers)
    .where(and(eq(lasers.id, id), eq(lasers.missionId, missionId)));
  const [row] = lock ? await base.for("update") : await base;
  if (!row) throw notFound("laser");
  return row;
}

async function answerOf(q: Queryable, row: Laser): Promise<ScheduleAnswer> {
  const cs = await q
    .select({ id: chains.id, key: chains.key })
    .from(chains)
    .where(eq(chains.missionId, row.missionId))
    .orderBy(asc(chains.position));
  const keyOf = new Map(cs.map((c) => [c.id, c.key]));
  const plan = scheduleOfRow(row.schedule, keyOf);
  const idOf = new Map(cs.map((c) => [c.key, c.id]));
  return {
    laserId: row.id,
    laserKey: row.key,
    version: row.version,
    schedule: plan && {
      cycleMs: plan.cycleMs,
      retuneMs: plan.retuneMs,
      retuneMsPerGHz: plan.retuneMsPerGHz,
      relockMs: plan.relockMs,
      dwells: plan.dwells.map((d) => ({ chainId: idOf.get(d.chain)!, chainKey: d.chain, dwellMs: d.dwellMs })),
    },
  };
}

export async function getSchedule(actor: Actor, missionId: string, laserId: string): Promise<ScheduleAnswer> {
  await getMissionRow(actor, missionId);
  return answerOf(db, await findLaser(db, missionId, laserId, false));
}

/** Plan-document paths of this laser's schedule, as the request's fields (`lasers[0].schedule.dwells[1].chain` → `schedule.dwells[1].chainId`). */
function requestPath(path: string, prefix: string): string {
  if (!path.startsWith(prefix)) return path;
  return `schedule${path.slice(prefix.length)}`.replace(/(dwells\[\d+\])\.chain$/, "$1.chainId");
}

export async function putSchedule(
  actor: Actor,
  missionId: string,
  laserId: string,
  body: ScheduleUpdateInput,
): Promise<ScheduleAnswer & { revision: RevisionInfo }> {
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    const current = await findLaser(tx, missionId, laserId, true);
    if (current.version !== body.version) throw staleVersion(await answerOf(tx, current), "schedule");
    const s = body.schedule;
    const moved: string[] = [];
    if (s) {
      const rows = await tx
        .select({ id: chains.id, key: chains.key, laserId: chains.laserId, version: chains.version })
        .from(chains)
        .where(eq(chains.missionId, missionId));
      const byId = new Map(rows.map((r) => [r.id, r]));
      const issues = s.dwells.flatMap((d, j) =>
        byId.has(d.chainId)
          ? []
          : [{ path: `schedule.dwells[${j}].chainId`, message: "no chain with this id in the mission" }],
      );
      if (issues.length) throw invalidInput(issues);
      // a chain put in this laser pair's schedule now uses this laser pair (the check refuses it if that breaks another schedule)
      for (const d of s.dwells) {
        const c = byId.get(d.chainId)!;
        if (c.laserId === laserId) continue;
        await tx
          .update(chains)
          .set({ laserId, version: c.version + 1, updatedAt: new Date() })
          .where(eq(chains.id, c.id));
        moved.push(c.key);
      }
    }
    const [row] = await tx
      .update(lasers)
      .set({
        schedule: s && {
          cycleMs: s.cycleMs,
          retuneMs: s.retuneMs,
          retuneMsPerGHz: s.retuneMsPerGHz,
          relockMs: s.relockMs,
          dwells: s.dwells.map((d) => ({ chainId: d.chainId, dwellMs: d.dwellMs })),
        },
        version: current.version + 1,
        updatedAt: new Date(),
      })
      .where(and(eq(lasers.id, laserId), eq(lasers.version, current.version)))
      .returning();
    if (!row) throw staleVersion(await answerOf(tx, current), "schedule");
    const note = {
      action: "update",
      entity: `laser ${row.key}`,
      summary: s
        ? `Set the observation schedule of laser ${row.key}: ${s.dwells.length} dwells in a ${s.cycleMs} ms cycle${moved.length ? `; chains ${moved.join(", ")} now use laser ${row.key}` : ""}.`
        : `Removed the observation schedule of laser ${row.key}.`,
    };
    let revision: RevisionInfo;
    try {
      revision = await saveAndCheck(tx, missionId, actor, note);
    } catch (e) {
      if (!(e instanceof HttpError) || e.code !== "invalid-plan" || !e.issues) throw e;
      const plan = await assemblePlan(tx, missionId);
      const prefix = `lasers[${plan.lasers.findIndex((l) => l.id === row.key)}].schedule`;
      const issues = e.issues.map((i) => ({ ...i, path: requestPath(i.path, prefix) }));
      throw new HttpError(e.status, e.code, e.message, issues, e.extra);
    }
    return { ...(await answerOf(tx, row)), revision };
  });
}
