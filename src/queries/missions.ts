"use client";

import { confirmEditDuringReview } from "./edit-during-review";
import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { MissionCreateInput, MissionUpdateInput, SettingsUpdateInput } from "@/schemas/workspace";
import { api, apiFetch, sendJson } from "./api";
import { missionKeys, type Collection, type FindingFilter } from "./keys";
import type {
  ActivityEntry,
  Chain,
  Channel,
  Detector,
  Finding,
  Laser,
  Mission,
  MissionSummary,
  MutationRevision,
  PlanResult,
  Resonator,
  RevisionSummary,
  Settings,
} from "./types";
import { singularOf, unwrapItem, unwrapList } from "./unwrap";

export function useMissionsQuery() {
  return useQuery({
    queryKey: missionKeys.lists(),
    queryFn: async () => unwrapList<MissionSummary>(await apiFetch(api.missions), "missions"),
  });
}

export function useCreateMissionMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (input: MissionCreateInput) =>
      unwrapItem<Mission>(await sendJson(api.missions, "POST", input), "mission"),
    onSuccess: () => qc.invalidateQueries({ queryKey: missionKeys.lists() }),
  });
}

export function useMissionQuery(missionId: string) {
  return useQuery({
    queryKey: missionKeys.mission(missionId),
    queryFn: async () => unwrapItem<Mission>(await apiFetch(api.mission(missionId)), "mission"),
  });
}

type EntityOf = {
  lasers: Laser;
  resonators: Resonator;
  detectors: Detector;
  chains: Chain;
  channels: Channel;
};

export function useCollectionQuery<C extends Collection>(missionId: string, c: C) {
  return useQuery({
    queryKey: missionKeys.collection(missionId, c),
    queryFn: async () => unwrapList<EntityOf[C]>(await apiFetch(api.collection(missionId, c)), c),
  });
}

export function useSettingsQuery(missionId: string) {
  return useQuery({
    queryKey: missionKeys.settings(missionId),
    queryFn: async () => unwrapItem<Settings>(await apiFetch(api.collection(missionId, "settings")), "settings"),
  });
}

/** The stored result of the latest revision; null while the mission has never been checked. */
export function useResultQuery(missionId: string) {
  return useQuery({
    queryKey: missionKeys.result(missionId),
    placeholderData: keepPreviousData,
    queryFn: async () => {
      try {
        const body = await apiFetch<unknown>(api.collection(missionId, "result"));
        const o = body as { format?: string; result?: PlanResult };
        return (o?.format ? body : (o?.result ?? null)) as PlanResult | null;
      } catch (e) {
        if ((e as { status?: number }).status === 404) return null;
        throw e;
      }
    },
  });
}

export function useFindingsQuery(missionId: string, filter: FindingFilter = {}) {
  const qs = new URLSearchParams(Object.entries(filter).filter(([, v]) => v) as [string, string][]).toString();
  return useQuery({
    queryKey: missionKeys.findings(missionId, filter),
    placeholderData: keepPreviousData,
    queryFn: () =>
      apiFetch<{ revision: number | null; findings: Finding[] }>(
        `${api.collection(missionId, "findings")}${qs ? `?${qs}` : ""}`,
      ),
  });
}

export function useRevisionsQuery(missionId: string) {
  return useQuery({
    queryKey: missionKeys.revisions(missionId),
    queryFn: async () =>
      unwrapList<RevisionSummary>(await apiFetch(api.collection(missionId, "revisions")), "revisions"),
  });
}

export function useActivityQuery(missionId: string) {
  return useQuery({
    queryKey: missionKeys.activity(missionId),
    queryFn: async () => unwrapList<ActivityEntry>(await apiFetch(api.collection(missionId, "activity")), "activity"),
  });
}

/** After any mutation the server has re-run the engine: everything of the mission is stale, and so is the list. */
export function invalidateMission(qc: ReturnType<typeof useQueryClient>, missionId: string) {
  return Promise.all([
    qc.invalidateQueries({ queryKey: missionKeys.detail(missionId) }),
    qc.invalidateQueries({ queryKey: missionKeys.lists() }),
  ]);
}

export function useUpdateMissionMutation(missionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (input: MissionUpdateInput) =>
      unwrapItem<Mission>(await sendJson(api.mission(missionId), "PATCH", input), "mission"),
    onSettled: () => invalidateMission(qc, missionId),
  });
}

/** Deletes the mission with all its hardware, chains, channels and revisions (owners only; the server checks). */
export function useDeleteMissionMutation(missionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ version }: { version: number }) =>
      apiFetch<unknown>(`${api.mission(missionId)}?version=${version}`, { method: "DELETE" }),
    onSuccess: () => {
      qc.removeQueries({ queryKey: missionKeys.detail(missionId) });
      return qc.invalidateQueries({ queryKey: missionKeys.lists() });
    },
  });
}

export function useSaveSettingsMutation(missionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (input: SettingsUpdateInput) => {
      await confirmEditDuringReview(missionId);
      return unwrapItem<Settings & MutationRevision>(
        await sendJson(api.collection(missionId, "settings"), "PUT", input),
        "settings",
      );
    },
    onSettled: () => invalidateMission(qc, missionId),
  });
}

export type EntityInput = Record<string, unknown>;

/** Create (no id) or update (id + version) one entity of a collection. */
export function useSaveEntityMutation<C extends Collection>(missionId: string, c: C) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, input }: { id?: string; input: EntityInput }) => {
      await confirmEditDuringReview(missionId);
      const body = id
        ? await sendJson(api.item(missionId, c, id), "PATCH", input)
        : await sendJson(api.collection(missionId, c), "POST", input);
      return unwrapItem<EntityOf[C]>(body, singularOf[c] ?? c);
    },
    onSettled: () => invalidateMission(qc, missionId),
  });
}

export function useDeleteEntityMutation(missionId: string, c: Collection) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, version }: { id: string; version: number }) => {
      await confirmEditDuringReview(missionId);
      return apiFetch<unknown>(`${api.item(missionId, c, id)}?version=${version}`, { method: "DELETE" });
    },
    onSettled: () => invalidateMission(qc, missionId),
  });
}

/** Every query a whole-mission page reads: the hardware, chains and channels, the settings, the latest result and the revisions. */
export function useMissionDataQueries(missionId: string) {
  return {
    lasers: useCollectionQuery(missionId, "lasers"),
    resonators: useCollectionQuery(missionId, "resonators"),
    detectors: useCollectionQuery(missionId, "detectors"),
    chains: useCollectionQuery(missionId, "chains"),
    channels: useCollectionQuery(missionId, "channels"),
    settings: useSettingsQuery(missionId),
    result: useResultQuery(missionId),
    revisions: useRevisionsQuery(missionId),
  };
}
