"use client";

import { useMemo } from "react";
import { useReviewQuery } from "@/components/review/use-review";
import type { WaiverMap } from "./waiver-words";

/** The mission's recorded waivers by finding key, from the review overview (empty while loading or unreadable). */
export function useWaivers(missionId: string): WaiverMap {
  const review = useReviewQuery(missionId);
  return useMemo(
    () =>
      new Map(
        (review.data?.errors ?? []).flatMap((e) =>
          e.waiver
            ? [[e.key, { waivedBy: e.waiver.waivedBy, reason: e.waiver.reason, waivedAt: e.waiver.waivedAt }]]
            : [],
        ),
      ),
    [review.data],
  );
}
