"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { z } from "zod";
import { apiFetch, sendJson } from "@/queries/api";
import { missionKeys } from "@/queries/keys";
import type { createCommentSchema, createWaiverSchema, decideReviewSchema, submitReviewSchema } from "@/schemas/review";
import type { getReviewOverview, listComments } from "@/server/review";

/** React Query hooks of the review panel. Keys live under the mission's key so any plan edit refreshes them. */
export const reviewKeys = {
  overview: (m: string) => [...missionKeys.detail(m), "review"] as const,
  comments: (m: string) => [...missionKeys.detail(m), "review", "comments"] as const,
};

const base = (m: string) => `/api/v1/missions/${encodeURIComponent(m)}/review`;

/**
 * The review API's replies, typed by the server functions that build them
 * (`import type` only: nothing of the server reaches the client bundle).
 */
export type ReviewOverview = Awaited<ReturnType<typeof getReviewOverview>>;
export type WaiverView = NonNullable<ReviewOverview["errors"][number]["waiver"]>;
export type CommentView = Awaited<ReturnType<typeof listComments>>[number];

export function useReviewQuery(missionId: string) {
  return useQuery({
    queryKey: reviewKeys.overview(missionId),
    queryFn: () => apiFetch<ReviewOverview>(base(missionId)),
  });
}

export function useCommentsQuery(missionId: string) {
  return useQuery({
    queryKey: reviewKeys.comments(missionId),
    queryFn: async () => (await apiFetch<{ comments: CommentView[] }>(`${base(missionId)}/comments`)).comments,
  });
}

/**
 * A review mutation refreshes the review panel first, then what shows the
 * state elsewhere (the mission's status, revisions and activity); the plan's
 * entities and result are unchanged by a review action, so they are not refetched.
 */
function useReviewMutation<V>(missionId: string, fn: (v: V) => Promise<unknown>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSettled: async () => {
      await qc.invalidateQueries({ queryKey: reviewKeys.overview(missionId) });
      for (const key of [
        missionKeys.mission(missionId),
        missionKeys.revisions(missionId),
        missionKeys.activity(missionId),
      ])
        void qc.invalidateQueries({ queryKey: key });
    },
  });
}

export const useSubmitMutation = (m: string) =>
  useReviewMutation(m, (v: z.input<typeof submitReviewSchema>) => sendJson(`${base(m)}/submit`, "POST", v));
export const useDecideMutation = (m: string) =>
  useReviewMutation(m, (v: z.input<typeof decideReviewSchema>) => sendJson(`${base(m)}/decide`, "POST", v));
export const useWaiveMutation = (m: string) =>
  useReviewMutation(m, (v: z.input<typeof createWaiverSchema>) => sendJson(`${base(m)}/waivers`, "POST", v));
export const useWithdrawWaiverMutation = (m: string) =>
  useReviewMutation(m, (id: string) => apiFetch(`${base(m)}/waivers/${encodeURIComponent(id)}`, { method: "DELETE" }));
export const useCommentMutation = (m: string) =>
  useReviewMutation(m, (v: z.input<typeof createCommentSchema>) => sendJson(`${base(m)}/comments`, "POST", v));
