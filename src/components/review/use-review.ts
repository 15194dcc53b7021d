"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiFetch, sendJson } from "@/queries/api";
import { missionKeys } from "@/queries/keys";

/** React Query hooks of the review panel. Keys live under the mission's key so any plan edit refreshes them. */
export const reviewKeys = {
  overview: (m: string) => [...missionKeys.detail(m), "review"] as const,
  comments: (m: string) => [...missionKeys.detail(m), "review", "comments"] as const,
};

const base = (m: string) => `/api/v1/missions/${encodeURIComponent(m)}/review`;

export type ReviewState = "draft" | "in-review" | "baselined" | "changes-requested";

export interface WaiverView {
  id: string;
  findingKey: string;
  code: string;
  chain: string;
  channel: string | null;
  reason: string;
  waivedBy: string;
  waivedAt: string;
  active: boolean;
  version: number;
}

export interface ReviewOverview {
  state: ReviewState;
  revision: { number: number; authorName: string; createdAt: string; errorCount: number } | null;
  baselineRevision: number | null;
  channels: string[];
  errors: {
    id: string;
    key: string;
    code: string;
    chain: string;
    channel: string | null;
    message: string;
    waiver: WaiverView | null;
  }[];
  reviews: {
    id: string;
    revision: number;
    submittedBy: string;
    submittedAt: string;
    note: string;
    outcome: string;
    decidedBy: string | null;
    decidedAt: string | null;
    decisionNote: string | null;
    waivers: { findingKey: string; reason: string; waivedByName: string; waivedAt: string }[];
  }[];
}

export interface CommentView {
  id: string;
  revision: number;
  channelKey: string | null;
  findingId: string | null;
  authorName: string;
  body: string;
  createdAt: string;
}

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
  useReviewMutation(m, (v: { revision?: number; note?: string }) => sendJson(`${base(m)}/submit`, "POST", v));
export const useDecideMutation = (m: string) =>
  useReviewMutation(m, (v: { decision: "baseline" | "request-changes"; revision?: number; note?: string }) =>
    sendJson(`${base(m)}/decide`, "POST", v),
  );
export const useWaiveMutation = (m: string) =>
  useReviewMutation(m, (v: { findingId: string; reason: string }) => sendJson(`${base(m)}/waivers`, "POST", v));
export const useWithdrawWaiverMutation = (m: string) =>
  useReviewMutation(m, (id: string) => apiFetch(`${base(m)}/waivers/${encodeURIComponent(id)}`, { method: "DELETE" }));
export const useCommentMutation = (m: string) =>
  useReviewMutation(m, (v: { body: string; revision?: number; channelKey?: string; findingId?: string }) =>
    sendJson(`${base(m)}/comments`, "POST", v),
  );
