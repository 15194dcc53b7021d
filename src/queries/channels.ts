"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api, sendJson } from "./api";
import { missionKeys } from "./keys";
import { invalidateMission, type EntityInput } from "./missions";
import type { Channel } from "./types";
import { unwrapItem } from "./unwrap";
import { applyChannelEdit } from "./optimistic";
import { confirmEditDuringReview } from "./edit-during-review";

/**
 * Channel edit with an optimistic update: the table shows the new values at
 * once; on any error the previous list is put back, and on settle the whole
 * mission (result, findings) is refetched because the server re-ran the engine.
 */
export function useUpdateChannelMutation(missionId: string) {
  const qc = useQueryClient();
  const key = missionKeys.channels(missionId);
  return useMutation({
    mutationFn: async ({ id, input }: { id: string; input: EntityInput }) => {
      await confirmEditDuringReview(missionId);
      return unwrapItem<Channel>(await sendJson(api.item(missionId, "channels", id), "PATCH", input), "channel");
    },
    onMutate: async ({ id, input }) => {
      await qc.cancelQueries({ queryKey: key });
      const previous = qc.getQueryData<Channel[]>(key);
      if (previous) qc.setQueryData<Channel[]>(key, applyChannelEdit(previous, id, input));
      return { previous };
    },
    onError: (_err, _vars, context) => {
      if (context?.previous) qc.setQueryData(key, context.previous);
    },
    onSettled: () => invalidateMission(qc, missionId),
  });
}
