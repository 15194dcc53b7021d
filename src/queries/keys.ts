import type { z } from "zod";
import type { EntityKind, findingsQuerySchema } from "@/schemas/workspace";

/**
 * React Query key factories. Every key of one mission starts with
 * `missionKeys.detail(id)`, so a mutation that re-runs the engine can
 * invalidate the whole mission (entities, result, findings, revisions) at once.
 */

/** The entity collections of a mission (the workspace schemas' entity kinds). */
export type Collection = EntityKind;

/** The filters of the findings endpoint, as its query schema reads them. */
export type FindingFilter = z.input<typeof findingsQuerySchema>;

export const missionKeys = {
  all: ["missions"] as const,
  lists: () => [...missionKeys.all, "list"] as const,
  detail: (missionId: string) => [...missionKeys.all, "detail", missionId] as const,
  mission: (missionId: string) => [...missionKeys.detail(missionId), "mission"] as const,
  collection: (missionId: string, c: Collection) => [...missionKeys.detail(missionId), c] as const,
  lasers: (missionId: string) => missionKeys.collection(missionId, "lasers"),
  resonators: (missionId: string) => missionKeys.collection(missionId, "resonators"),
  detectors: (missionId: string) => missionKeys.collection(missionId, "detectors"),
  chains: (missionId: string) => missionKeys.collection(missionId, "chains"),
  channels: (missionId: string) => missionKeys.collection(missionId, "channels"),
  settings: (missionId: string) => [...missionKeys.detail(missionId), "settings"] as const,
  result: (missionId: string) => [...missionKeys.detail(missionId), "result"] as const,
  findings: (missionId: string, filter: FindingFilter = {}) =>
    [...missionKeys.detail(missionId), "findings", filter] as const,
  revisions: (missionId: string) => [...missionKeys.detail(missionId), "revisions"] as const,
  activity: (missionId: string) => [...missionKeys.detail(missionId), "activity"] as const,
};
