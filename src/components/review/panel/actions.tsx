"use client";
import { useId, useState } from "react";
import { useDecideMutation, useSubmitMutation, type ReviewOverview } from "../use-review";
import type { ReviewAbilities } from "./abilities";
import { BlockedBaseline } from "./blocked-baseline";
import { ErrorLine } from "./error-line";
import type { ApiError } from "@/queries/api";

/** Submit the newest revision, or baseline it or return it for rework, with an optional note; or say why neither is possible. */
export function Actions({ missionId, data, can }: { missionId: string; data: ReviewOverview; can: ReviewAbilities }) {
  const submit = useSubmitMutation(missionId);
  const decide = useDecideMutation(missionId);
  const [note, setNote] = useState("");
  const noteId = useId();
  const rev = data.revision?.number;
  const unwaived = data.errors.filter((e) => !e.waiver).length;
  const submittable = rev !== undefined && (data.state === "draft" || data.state === "changes-requested");
  const empty = data.channels.length === 0;
  const canSubmitNow = can.canSubmit && submittable && !empty;
  const canDecideNow = can.canDecide && data.state === "in-review";
  if (!canSubmitNow && !canDecideNow)
    return (
      <p className="mt-3 text-sm text-slate-700" data-testid="review-not-possible">
        {can.canSubmit && submittable && empty
          ? "This plan has no channels, so no rule has checked anything yet: add at least one channel before submitting it for review."
          : data.state === "in-review" && !can.canDecide
            ? "Waiting for a lead or owner to decide."
            : data.state === "baselined"
              ? "This revision is the baseline. Any edit starts a new draft; the baseline stays as approved."
              : rev === undefined
                ? "No plan revision yet."
                : "Your role may not submit or decide."}
      </p>
    );
  return (
    <div className="mt-3">
      <label htmlFor={noteId} className="block text-sm font-medium text-slate-800">
        Note {canDecideNow ? "(required when returning for rework)" : "(optional)"}
      </label>
      <textarea
        id={noteId}
        value={note}
        onChange={(e) => setNote(e.target.value)}
        rows={2}
        maxLength={2000}
        className="mt-1 w-full rounded border border-slate-400 px-2 py-1 text-sm"
      />
      <div className="mt-2 flex flex-wrap gap-2">
        {canSubmitNow ? (
          <button
            type="button"
            disabled={submit.isPending}
            onClick={() => submit.mutate({ revision: rev, note: note || undefined }, { onSuccess: () => setNote("") })}
            className="rounded bg-slate-900 px-3 py-1.5 text-sm font-medium text-white disabled:opacity-50"
          >
            Submit revision {rev} for review
          </button>
        ) : null}
        {canDecideNow ? (
          <>
            <button
              type="button"
              disabled={decide.isPending}
              onClick={() =>
                decide.mutate(
                  { decision: "baseline", revision: rev, note: note || undefined },
                  { onSuccess: () => setNote("") },
                )
              }
              className="rounded bg-emerald-800 px-3 py-1.5 text-sm font-medium text-white disabled:opacity-50"
            >
              Baseline revision {rev}
            </button>
            <button
              type="button"
              disabled={decide.isPending}
              onClick={() =>
                decide.mutate(
                  { decision: "request-changes", revision: rev, note: note || undefined },
                  { onSuccess: () => setNote("") },
                )
              }
              className="rounded border border-rose-700 px-3 py-1.5 text-sm font-medium text-rose-800 disabled:opacity-50"
            >
              Return for rework
            </button>
          </>
        ) : null}
      </div>
      {canDecideNow && unwaived > 0 ? (
        <p className="mt-2 text-sm text-amber-900">
          {unwaived} open error finding{unwaived === 1 ? "" : "s"} without a waiver: record a waiver for each below, or
          return the plan for rework.
        </p>
      ) : null}
      {(decide.error as ApiError | null)?.code === "unwaived-errors" ? (
        <>
          <BlockedBaseline data={data} />
          <ErrorLine error={submit.error} />
        </>
      ) : (
        <ErrorLine error={submit.error ?? decide.error} />
      )}
    </div>
  );
}
