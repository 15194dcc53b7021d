"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ScheduleUpdateInput } from "@/schemas/workspace-schedule";
import { api, apiFetch, sendJson } from "./api";
import { missionKeys } from "./keys";
import { invalidateMission } from "./missions";
import type { MutationRevision } from "./types";

/** A laser pair's observation schedule as `GET …/lasers/{id}/schedule` answers it. */
export interface LaserSchedule {
  laserId: string;
  laserKey: string;
  version: number;
  schedule: {
    cycleMs: number;
    retuneMs: number;
    retuneMsPerGHz: number;
    relockMs: number;
    dwells: { chainId: string; chainKey: string; dwellMs: number }[];
  } | null;
}

const schedulePath = (missionId: string, laserId: string) => `${api.item(missionId, "lasers", laserId)}/schedule`;

export function useScheduleQuery(missionId: string, laserId: string) {
  return useQuery({
    queryKey: [...missionKeys.detail(missionId), "schedule", laserId] as const,
    queryFn: async () => apiFetch<LaserSchedule>(schedulePath(missionId, laserId)),
  });
}

/** Replace (or remove, with `schedule: null`) a laser pair's schedule: a new revision the server checks. */
export function useScheduleMutation(missionId: string, laserId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (input: ScheduleUpdateInput) =>
      sendJson<LaserSchedule & Required<MutationRevision>>(schedulePath(missionId, laserId), "PUT", input),
    onSettled: () => invalidateMission(qc, missionId),
  });
}
