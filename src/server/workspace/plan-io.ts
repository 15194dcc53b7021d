import "server-only";
import { eq, sql } from "drizzle-orm";
import { db } from "@db/client";
import { chains, channels, detectors, lasers, missions, planRevisions, planSettings, resonators } from "@db/schema";
import { parsePlan, planBoundIssues, type Plan } from "@/schemas/plan";
import type { Actor } from "@/server/auth/actor";
import { inTransaction, type Queryable, type Tx } from "@/server/core/db";
import { HttpError } from "@/server/core/http";
import { unstorableIssues } from "./plan-storable";
import { getMissionRow, lockMission } from "@/server/core/mission-scope";
import { assemblePlan } from "./assemble";
import { saveAndCheck, type RevisionInfo } from "./save-and-check";
import { channelFigures } from "./mappers";
import { scheduleRowOf } from "./schedule-rows";
import { chainNoise, channelNoise, detectorNoise, laserNoise, resonatorNoise } from "./noise-fields";

/**
 * The plan document (`heterolane.plan/2`) of the mission's current draft. No team
 * check: callers check access first (getMissionRow) or pass a mission they
 * already hold.
 */
export async function getPlanDocument(missionId: string, q: Queryable = db) {
  return assemblePlan(q, missionId);
}

/** The number of the mission's newest revision (0 before the first). */
export async function latestRevisionNumber(missionId: string, q: Queryable = db): Promise<number> {
  const [row] = await q
    .select({ max: sql<number | null>`max(${planRevisions.number})` })
    .from(planRevisions)
    .where(eq(planRevisions.missionId, missionId));
  return Number(row?.max ?? 0);
}

/**
 * The draft plan document of a mission of the actor's team (404 otherwise)
 * and the number of the revision it is (to send back with an import).
 */
export async function exportPlanDocument(actor: Actor, missionId: string) {
  const m = await getMissionRow(actor, missionId);
  // One snapshot: the document and its revision number are read in one transaction.
  return inTransaction(async (tx) => ({
    plan: await assemblePlan(tx, m.id),
    revision: await latestRevisionNumber(m.id, tx),
  }));
}

/**
 * Replaces the draft of a mission with a plan document (validated first:
 * an invalid document, or one the database cannot store, answers 400
 * `invalid-plan` with every issue and changes nothing) and stores the
 * result as a new revision. The plan's name becomes the mission's name, so
 * exporting gives the same document.
 *
 * `opts.baseRevision` is the revision the caller's document replaces (the
 * `x-heterolane-revision` of its export, or the revision it last read):
 * when the plan has moved on since, the import answers 409 `stale-version`
 * with the current revision number and changes nothing, so no concurrent
 * edit is silently overwritten. Without it the import replaces whatever is
 * there (as before; for scripts that own the mission).
 */
export async function importPlanDocument(
  actor: Actor,
  missionId: string,
  body: unknown,
  opts: { baseRevision?: number } = {},
): Promise<{ revision: RevisionInfo }> {
  const parsed = parsePlan(body);
  if (!parsed.ok)
    throw new HttpError(400, "invalid-plan", "The plan document is not valid; nothing was imported.", parsed.issues);
  const unstorable = [...planBoundIssues(parsed.plan), ...unstorableIssues(parsed.plan)];
  if (unstorable.length)
    throw new HttpError(400, "invalid-plan", "The plan document cannot be stored; nothing was imported.", unstorable);
  return inTransaction(async (tx) => {
    await lockMission(tx, actor, missionId);
    if (opts.baseRevision !== undefined) {
      const latest = await latestRevisionNumber(missionId, tx);
      if (latest !== opts.baseRevision)
        throw new HttpError(
          409,
          "stale-version",
          `The plan changed since revision ${opts.baseRevision}: the current revision is ${latest}; nothing was imported. Pull it and apply your change again.`,
          undefined,
          { current: { revision: latest } },
        );
    }
    await replaceDraft(tx, missionId, parsed.plan);
    const p = parsed.plan;
    const revision = await saveAndCheck(tx, missionId, actor, {
      action: "import",
      entity: "plan",
      summary: `Imported plan "${p.name}": ${p.lasers.length} lasers, ${p.resonators.length} resonators, ${p.detectors.length} detectors, ${p.chains.length} chains, ${p.channels.length} channels.`,
    });
    return { revision };
  });
}

/** Deletes the draft rows of a mission and inserts those of `plan` (validated), in document order. */
export async function replaceDraft(tx: Tx, missionId: string, plan: Plan): Promise<void> {
  await tx.delete(channels).where(eq(channels.missionId, missionId));
  await tx.delete(chains).where(eq(chains.missionId, missionId));
  await tx.delete(lasers).where(eq(lasers.missionId, missionId));
  await tx.delete(resonators).where(eq(resonators.missionId, missionId));
  await tx.delete(detectors).where(eq(detectors.missionId, missionId));
  const [m] = await tx.select().from(missions).where(eq(missions.id, missionId));
  if (m && m.name !== plan.name)
    await tx
      .update(missions)
      .set({ name: plan.name, version: m.version + 1, updatedAt: new Date() })
      .where(eq(missions.id, missionId));
  const [s] = await tx.select().from(planSettings).where(eq(planSettings.missionId, missionId));
  await tx
    .update(planSettings)
    .set({ ...plan.settings, version: (s?.version ?? 0) + 1, updatedAt: new Date() })
    .where(eq(planSettings.missionId, missionId));

  const ids = (rows: { id: string; key: string }[]) => new Map(rows.map((r) => [r.key, r.id]));
  const laserIds = ids(
    plan.lasers.length
      ? await tx
          .insert(lasers)
          .values(
            plan.lasers.map((l, position) => ({
              missionId,
              position,
              key: l.id,
              carrierTHz: l.carrierTHz,
              carrierPowerMW: l.carrierPowerMW,
              loPowerMW: l.loPowerMW,
              reach: l.reach.map((r) => ({ minGHz: r.minGHz, maxGHz: r.maxGHz })),
              stepMHz: l.stepMHz,
              driftMHz: l.driftMHz,
              lockModulationMHz: l.lock.modulationMHz,
              lockModulationIndex: l.lock.modulationIndex,
              lockOrders: l.lock.orders,
              ...laserNoise(l),
            })),
          )
          .returning({ id: lasers.id, key: lasers.key })
      : [],
  );
  const resonatorIds = ids(
    plan.resonators.length
      ? await tx
          .insert(resonators)
          .values(
            plan.resonators.map((r, position) => ({
              missionId,
              position,
              key: r.id,
              fsrGHz: r.fsrGHz,
              loadedQ: r.loadedQ,
              fsrShiftMHzPerK: r.fsrShiftMHzPerK,
              ...resonatorNoise(r),
            })),
          )
          .returning({ id: resonators.id, key: resonators.key })
      : [],
  );
  const detectorIds = ids(
    plan.detectors.length
      ? await tx
          .insert(detectors)
          .values(
            plan.detectors.map((d, position) => ({
              missionId,
              position,
              key: d.id,
              minGHz: d.minGHz,
              maxGHz: d.maxGHz,
              maxInputMW: d.maxInputMW,
              sampleRateGHz: d.sampleRateGHz,
              ...detectorNoise(d),
            })),
          )
          .returning({ id: detectors.id, key: detectors.key })
      : [],
  );
  const chainIds = ids(
    plan.chains.length
      ? await tx
          .insert(chains)
          .values(
            plan.chains.map((c, position) => ({
              missionId,
              position,
              key: c.id,
              laserId: laserIds.get(c.laser)!,
              resonatorId: resonatorIds.get(c.resonator)!,
              detectorId: detectorIds.get(c.detector)!,
              mode: c.mode,
              sideband: c.sideband,
              loOffsetGHz: c.loOffsetGHz,
              rfInputMinGHz: c.rfInput.minGHz,
              rfInputMaxGHz: c.rfInput.maxGHz,
              tapFraction: c.tapFraction,
              pathLossDB: c.pathLossDB,
              carrierRejectionDB: c.carrierRejectionDB,
              sharedIf: c.sharedIf,
              temperatureExcursionK: c.temperatureExcursionK,
              ...chainNoise(c),
            })),
          )
          .returning({ id: chains.id, key: chains.key })
      : [],
  );
  if (plan.channels.length)
    await tx.insert(channels).values(
      plan.channels.map((ch, position) => ({
        missionId,
        position,
        key: ch.id,
        name: ch.name,
        chainId: chainIds.get(ch.chain)!,
        ...channelFigures(ch),
        ...channelNoise(ch),
      })),
    );
  // a schedule names its chains, which exist only now
  for (const l of plan.lasers)
    if (l.schedule)
      await tx
        .update(lasers)
        .set({ schedule: scheduleRowOf(l.schedule, chainIds) })
        .where(eq(lasers.id, laserIds.get(l.id)!));
}
