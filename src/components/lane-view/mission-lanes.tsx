"use client";

import { useWaivers } from "@/components/waivers";
import { useCallback } from "react";
import Link from "next/link";
import { useQueryClient } from "@tanstack/react-query";
import type { ResultDocument } from "@/lib/plan";
import { api, sendJson } from "@/queries/api";
import { confirmEditDuringReview } from "@/queries/edit-during-review";
import { missionKeys } from "@/queries/keys";
import { invalidateMission, useCollectionQuery, useResultQuery } from "@/queries/missions";
import { usePlanDocumentQuery } from "@/queries/plan-document";
import { LaneView, type SaveOutcome } from "./lane-view";

/**
 * The lane view of a mission: plan and stored result through the API; saving
 * an LO makes a revision. Without `canEdit` (the role cannot edit the plan)
 * there is no save control; the server refuses such writes anyway.
 */
export function MissionLanes({ missionId, canEdit = false }: { missionId: string; canEdit?: boolean }) {
  const qc = useQueryClient();
  const waivers = useWaivers(missionId);
  const planQuery = usePlanDocumentQuery(missionId);
  const resultQuery = useResultQuery(missionId);
  const chainsQuery = useCollectionQuery(missionId, "chains");

  const onSaveLo = useCallback(
    async (chainKey: string, loOffsetGHz: number): Promise<SaveOutcome> => {
      // Fresh ids and versions: the plan document names chains by key.
      const list = (await chainsQuery.refetch()).data ?? [];
      const row = list.find((c) => c.key === chainKey);
      if (!row) throw new Error(`Chain ${chainKey} is no longer in the mission; reload the page.`);
      await confirmEditDuringReview(missionId);
      const body = await sendJson<{ revision?: { number: number; errorCount: number; warningCount: number } }>(
        api.item(missionId, "chains", row.id),
        "PATCH",
        {
          loOffsetGHz,
          version: row.version,
        },
      );
      await invalidateMission(qc, missionId);
      const result = (await qc.fetchQuery({ queryKey: missionKeys.result(missionId) })) as ResultDocument | null;
      return {
        revision: body.revision?.number ?? null,
        errors: body.revision?.errorCount ?? 0,
        warnings: body.revision?.warningCount ?? 0,
        result,
      };
    },
    [qc, missionId, chainsQuery],
  );

  if (planQuery.isPending || resultQuery.isPending) return <p className="text-sm text-ink-soft">Loading the plan…</p>;
  if (planQuery.isError)
    return (
      <p role="alert" className="text-sm text-sev-error">
        {(planQuery.error as Error).message}
      </p>
    );
  const plan = planQuery.data;
  if (plan.chains.length === 0)
    return (
      <p className="text-sm text-ink-soft">
        This mission has no receiver chains yet. <Link href={`/missions/${missionId}`}>Add hardware and chains</Link> to
        see the lane view.
      </p>
    );
  return (
    <LaneView
      plan={plan}
      result={(resultQuery.data as unknown as ResultDocument | null) ?? null}
      onSaveLo={canEdit ? onSaveLo : undefined}
      waivers={waivers}
    />
  );
}
