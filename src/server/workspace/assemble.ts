import "server-only";
import { asc, eq } from "drizzle-orm";
import type { AnyPgColumn } from "drizzle-orm/pg-core";
import { chains, channels, detectors, lasers, missions, planSettings, resonators } from "@db/schema";
import type { PlanInput } from "@/schemas/plan";
import { PLAN_FORMAT } from "@/schemas/plan";
import type { Queryable } from "@/server/core/db";
import { notFound } from "@/server/core/http";
import { channelFigures } from "./mappers";
import { scheduleOfRow } from "./schedule-rows";
import { chainNoise, channelNoise, detectorNoise, laserNoise, resonatorNoise } from "./noise-fields";

/**
 * Assembles the plan document (`heterolane.plan/2`, docs/plan-format.md
 * §12) of a mission's current draft from its rows, in stored order
 * (position), with every optional field written out in the key order of a
 * parsed plan (each entity's version 1 fields, then its noise-budget fields,
 * then its other version 2 fields). Hardware references become plan-document keys.
 */
export async function assemblePlan(q: Queryable, missionId: string): Promise<PlanInput> {
  const [mission] = await q.select().from(missions).where(eq(missions.id, missionId));
  if (!mission) throw notFound("mission");
  const [settings] = await q.select().from(planSettings).where(eq(planSettings.missionId, missionId));
  if (!settings) throw notFound("plan settings");
  const byPos = (t: { position: AnyPgColumn; createdAt: AnyPgColumn }) => [asc(t.position), asc(t.createdAt)];
  // One query after the other: inside a transaction they share one connection.
  const ls = await q
    .select()
    .from(lasers)
    .where(eq(lasers.missionId, missionId))
    .orderBy(...byPos(lasers));
  const rs = await q
    .select()
    .from(resonators)
    .where(eq(resonators.missionId, missionId))
    .orderBy(...byPos(resonators));
  const ds = await q
    .select()
    .from(detectors)
    .where(eq(detectors.missionId, missionId))
    .orderBy(...byPos(detectors));
  const cs = await q
    .select()
    .from(chains)
    .where(eq(chains.missionId, missionId))
    .orderBy(...byPos(chains));
  const chs = await q
    .select()
    .from(channels)
    .where(eq(channels.missionId, missionId))
    .orderBy(...byPos(channels));
  const keyOf = (rows: { id: string; key: string }[]) => new Map(rows.map((r) => [r.id, r.key]));
  const laserKey = keyOf(ls);
  const resonatorKey = keyOf(rs);
  const detectorKey = keyOf(ds);
  const chainKey = keyOf(cs);
  return {
    format: PLAN_FORMAT,
    name: mission.name,
    settings: {
      guardMHz: settings.guardMHz,
      imageRejectionDB: settings.imageRejectionDB,
      spurMaxOrder: settings.spurMaxOrder,
      replicaLimitDB: settings.replicaLimitDB,
    },
    lasers: ls.map((l) => ({
      id: l.key,
      carrierTHz: l.carrierTHz,
      carrierPowerMW: l.carrierPowerMW,
      loPowerMW: l.loPowerMW,
      reach: l.reach.map((i) => ({ minGHz: i.minGHz, maxGHz: i.maxGHz })),
      stepMHz: l.stepMHz,
      driftMHz: l.driftMHz,
      lock: { modulationMHz: l.lockModulationMHz, modulationIndex: l.lockModulationIndex, orders: l.lockOrders },
      ...laserNoise(l),
      schedule: scheduleOfRow(l.schedule, chainKey),
    })),
    resonators: rs.map((r) => ({
      id: r.key,
      fsrGHz: r.fsrGHz,
      loadedQ: r.loadedQ,
      ...resonatorNoise(r),
      fsrShiftMHzPerK: r.fsrShiftMHzPerK,
    })),
    detectors: ds.map((d) => ({
      id: d.key,
      minGHz: d.minGHz,
      maxGHz: d.maxGHz,
      maxInputMW: d.maxInputMW,
      sampleRateGHz: d.sampleRateGHz,
      ...detectorNoise(d),
    })),
    chains: cs.map((c) => ({
      id: c.key,
      laser: laserKey.get(c.laserId) ?? "",
      resonator: resonatorKey.get(c.resonatorId) ?? "",
      detector: detectorKey.get(c.detectorId) ?? "",
      mode: c.mode,
      sideband: c.sideband,
      loOffsetGHz: c.loOffsetGHz,
      rfInput: { minGHz: c.rfInputMinGHz, maxGHz: c.rfInputMaxGHz },
      tapFraction: c.tapFraction,
      pathLossDB: c.pathLossDB,
      carrierRejectionDB: c.carrierRejectionDB,
      sharedIf: c.sharedIf,
      ...chainNoise(c),
      temperatureExcursionK: c.temperatureExcursionK,
    })),
    channels: chs.map((ch) => {
      const { ifFilter, centreToleranceMHz, ...figures } = channelFigures(ch);
      return {
        id: ch.key,
        name: ch.name,
        chain: chainKey.get(ch.chainId) ?? "",
        ...figures,
        ...channelNoise(ch),
        ifFilter,
        centreToleranceMHz,
      };
    }),
  };
}
