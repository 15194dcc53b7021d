"use client";

import { useQuery } from "@tanstack/react-query";
import { parsePlan, type Plan } from "@/schemas/plan";
import { api, apiFetch } from "./api";
import { missionKeys } from "./keys";

/** The query key of a mission's plan document (under the mission, so saving anything refreshes it). */
export const planDocumentKey = (missionId: string) => [...missionKeys.detail(missionId), "plan-document"] as const;

/**
 * A mission's stored plan as the plan document the engine reads (parsed, with
 * defaults), for the lane view and the report's envelope plots. Fails with a
 * message naming every invalid path when the stored plan does not parse.
 */
export function usePlanDocumentQuery(missionId: string) {
  return useQuery({
    queryKey: planDocumentKey(missionId),
    queryFn: async (): Promise<Plan> => {
      const doc = await apiFetch<unknown>(api.collection(missionId, "plan"));
      const parsed = parsePlan(doc);
      if (!parsed.ok)
        throw new Error(
          `The stored plan is not valid: ${parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}`,
        );
      return parsed.plan;
    },
  });
}
