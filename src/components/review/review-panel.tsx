"use client";
import Link from "next/link";
import { useId, useState } from "react";
import { ApiError } from "@/queries/api";
import { ReviewStateBadge } from "./state-badge";
import {
  useCommentMutation,
  useCommentsQuery,
  useDecideMutation,
  useReviewQuery,
  useSubmitMutation,
  useWaiveMutation,
  useWithdrawWaiverMutation,
  type ReviewOverview,
} from "./use-review";

export interface ReviewAbilities {
  canSubmit: boolean;
  canDecide: boolean;
  canWaive: boolean;
  canComment: boolean;
}

const when = (iso: string) => new Date(iso).toISOString().slice(0, 16).replace("T", " ") + " UTC";

function ErrorLine({ error }: { error: unknown }) {
  if (!error) return null;
  const e = error as ApiError;
  return (
    <div role="alert" className="mt-2 rounded border border-rose-300 bg-rose-50 px-3 py-2 text-sm text-rose-900">
      {e.message}
      {e.issues?.length ? (
        <ul className="mt-1 list-disc pl-5">
          {e.issues.map((i, n) => (
            <li key={n}>
              {i.path ? <code>{i.path}</code> : null} {i.message}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

/**
 * The review section of the mission overview: state badge, submit and
 * decision buttons for the roles that may use them (the server checks
 * again), a waiver form beside each open error finding, the review history
 * and the comment thread.
 */
export function ReviewPanel({ missionId, can }: { missionId: string; can: ReviewAbilities }) {
  const review = useReviewQuery(missionId);
  const d = review.data;
  return (
    <section aria-labelledby="review-heading" className="mt-8 rounded border border-slate-300 bg-white p-4">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="review-heading" className="text-lg font-semibold text-slate-900">
          Review
        </h2>
        {d ? <ReviewStateBadge state={d.state} /> : null}
        {d?.revision ? (
          <span className="text-sm text-slate-700">
            revision {d.revision.number} by {d.revision.authorName}
            {d.baselineRevision ? ` · baseline: revision ${d.baselineRevision}` : " · no baseline yet"}
          </span>
        ) : null}
        <span className="ml-auto flex gap-3 text-sm">
          {d?.revision && d.revision.number > 1 ? (
            <Link
              className="text-sky-800 underline"
              href={`/missions/${missionId}/compare?from=${d.baselineRevision ?? d.revision.number - 1}&to=${d.revision.number}`}
            >
              Compare revisions
            </Link>
          ) : null}
          <Link className="text-sky-800 underline" href={`/audit?mission=${missionId}`}>
            Audit trail
          </Link>
        </span>
      </div>
      {review.isPending ? <p className="mt-2 text-sm text-slate-600">Loading the review…</p> : null}
      <ErrorLine error={review.error} />
      {d ? (
        <>
          <Actions missionId={missionId} data={d} can={can} />
          <OpenErrors missionId={missionId} data={d} can={can} />
          <History data={d} />
          <Comments missionId={missionId} data={d} can={can} />
        </>
      ) : null}
    </section>
  );
}

function Actions({ missionId, data, can }: { missionId: string; data: ReviewOverview; can: ReviewAbilities }) {
  const submit = useSubmitMutation(missionId);
  const decide = useDecideMutation(missionId);
  const [note, setNote] = useState("");
  const noteId = useId();
  const rev = data.revision?.number;
  const unwaived = data.errors.filter((e) => !e.waiver).length;
  const canSubmitNow =
    can.canSubmit && rev !== undefined && (data.state === "draft" || data.state === "changes-requested");
  const canDecideNow = can.canDecide && data.state === "in-review";
  if (!canSubmitNow && !canDecideNow)
    return (
      <p className="mt-3 text-sm text-slate-700">
        {data.state === "in-review" && !can.canDecide
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
        Note {canDecideNow ? "(required when requesting changes)" : "(optional)"}
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
              Request changes
            </button>
          </>
        ) : null}
      </div>
      {canDecideNow && unwaived > 0 ? (
        <p className="mt-2 text-sm text-amber-900">
          {unwaived} open error finding{unwaived === 1 ? "" : "s"} without a waiver: record a waiver for each below, or
          request changes.
        </p>
      ) : null}
      <ErrorLine error={submit.error ?? decide.error} />
    </div>
  );
}

function WaiverForm({ missionId, findingId }: { missionId: string; findingId: string }) {
  const waive = useWaiveMutation(missionId);
  const [reason, setReason] = useState("");
  const id = useId();
  return (
    <form
      className="mt-2"
      onSubmit={(e) => {
        e.preventDefault();
        waive.mutate({ findingId, reason });
      }}
    >
      <label htmlFor={id} className="block text-xs font-medium text-slate-800">
        Why is this error acceptable?
      </label>
      <div className="flex gap-2">
        <input
          id={id}
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          aria-invalid={waive.error ? true : undefined}
          className="min-w-0 flex-1 rounded border border-slate-400 px-2 py-1 text-sm"
        />
        <button
          type="submit"
          disabled={waive.isPending}
          className="rounded border border-slate-700 px-2 py-1 text-sm font-medium"
        >
          Record waiver
        </button>
      </div>
      <ErrorLine error={waive.error} />
    </form>
  );
}

function OpenErrors({ missionId, data, can }: { missionId: string; data: ReviewOverview; can: ReviewAbilities }) {
  const withdraw = useWithdrawWaiverMutation(missionId);
  if (data.errors.length === 0)
    return <p className="mt-4 text-sm text-slate-700">No open error findings in this revision.</p>;
  return (
    <div className="mt-4">
      <h3 className="text-sm font-semibold text-slate-900">Open error findings and waivers</h3>
      <ul className="mt-1 divide-y divide-slate-200">
        {data.errors.map((e) => (
          <li key={e.id} className="py-2" data-testid="open-error">
            <div className="text-sm">
              <code className="font-semibold">{e.code}</code> · chain {e.chain}
              {e.channel ? ` · channel ${e.channel}` : ""}
            </div>
            <p className="text-sm text-slate-700">{e.message}</p>
            {e.waiver ? (
              <p className="mt-1 text-sm text-emerald-900">
                Waived by {e.waiver.waivedBy} on {when(e.waiver.waivedAt)}: “{e.waiver.reason}”
                {can.canWaive && data.state !== "baselined" ? (
                  <button
                    type="button"
                    onClick={() => withdraw.mutate(e.waiver!.id)}
                    className="ml-2 text-xs text-rose-800 underline"
                  >
                    Withdraw
                  </button>
                ) : null}
              </p>
            ) : can.canWaive ? (
              <WaiverForm missionId={missionId} findingId={e.id} />
            ) : (
              <p className="mt-1 text-xs text-slate-600">No waiver. Only leads and owners record waivers.</p>
            )}
          </li>
        ))}
      </ul>
      <ErrorLine error={withdraw.error} />
    </div>
  );
}

function History({ data }: { data: ReviewOverview }) {
  if (data.reviews.length === 0) return null;
  const label: Record<string, string> = {
    open: "waiting for a decision",
    baselined: "baselined",
    "changes-requested": "changes requested",
    withdrawn: "withdrawn by an edit",
  };
  return (
    <div className="mt-4">
      <h3 className="text-sm font-semibold text-slate-900">Reviews</h3>
      <ul className="mt-1 space-y-1 text-sm text-slate-800">
        {data.reviews.map((r) => (
          <li key={r.id}>
            Revision {r.revision}: submitted by {r.submittedBy} ({when(r.submittedAt)}){r.note ? ` “${r.note}”` : ""} —{" "}
            {label[r.outcome] ?? r.outcome}
            {r.decidedBy && r.outcome !== "withdrawn" ? ` by ${r.decidedBy}` : ""}
            {r.decisionNote && r.outcome !== "withdrawn" ? `: “${r.decisionNote}”` : ""}
            {r.waivers.length ? ` (${r.waivers.length} waiver${r.waivers.length === 1 ? "" : "s"})` : ""}
          </li>
        ))}
      </ul>
    </div>
  );
}

function Comments({ missionId, data, can }: { missionId: string; data: ReviewOverview; can: ReviewAbilities }) {
  const comments = useCommentsQuery(missionId);
  const post = useCommentMutation(missionId);
  const [body, setBody] = useState("");
  const [target, setTarget] = useState("");
  const bodyId = useId();
  const targetId = useId();
  const findingName = new Map(
    data.errors.map((e) => [e.id, `${e.code} (${e.chain}${e.channel ? `/${e.channel}` : ""})`]),
  );
  return (
    <div className="mt-4">
      <h3 className="text-sm font-semibold text-slate-900">Comments</h3>
      {comments.data?.length ? (
        <ul className="mt-1 space-y-2" data-testid="comments">
          {comments.data.map((c) => (
            <li key={c.id} className="rounded bg-slate-50 px-3 py-2 text-sm">
              <div className="text-xs text-slate-600">
                {c.authorName} · {when(c.createdAt)} · revision {c.revision}
                {c.channelKey ? ` · channel ${c.channelKey}` : ""}
                {c.findingId ? ` · finding ${findingName.get(c.findingId) ?? ""}` : ""}
              </div>
              <p className="whitespace-pre-wrap text-slate-900">{c.body}</p>
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-1 text-sm text-slate-600">No comments yet.</p>
      )}
      {can.canComment && data.revision ? (
        <form
          className="mt-2"
          onSubmit={(e) => {
            e.preventDefault();
            const [kind, value] = target.split(":", 2);
            post.mutate(
              {
                body,
                revision: data.revision!.number,
                ...(kind === "channel" ? { channelKey: value } : {}),
                ...(kind === "finding" ? { findingId: value } : {}),
              },
              { onSuccess: () => setBody("") },
            );
          }}
        >
          <label htmlFor={targetId} className="block text-xs font-medium text-slate-800">
            On
          </label>
          <select
            id={targetId}
            value={target}
            onChange={(e) => setTarget(e.target.value)}
            className="rounded border border-slate-400 px-2 py-1 text-sm"
          >
            <option value="">revision {data.revision.number} as a whole</option>
            {data.channels.map((c) => (
              <option key={c} value={`channel:${c}`}>
                channel {c}
              </option>
            ))}
            {data.errors.map((e) => (
              <option key={e.id} value={`finding:${e.id}`}>
                finding {findingName.get(e.id)}
              </option>
            ))}
          </select>
          <label htmlFor={bodyId} className="mt-2 block text-xs font-medium text-slate-800">
            Comment (mention someone with @name or @e-mail address to send them an e-mail)
          </label>
          <textarea
            id={bodyId}
            value={body}
            onChange={(e) => setBody(e.target.value)}
            rows={2}
            maxLength={5000}
            className="w-full rounded border border-slate-400 px-2 py-1 text-sm"
          />
          <button
            type="submit"
            disabled={post.isPending || body.trim() === ""}
            className="mt-1 rounded bg-slate-900 px-3 py-1.5 text-sm font-medium text-white disabled:opacity-50"
          >
            Post comment
          </button>
          <ErrorLine error={post.error} />
        </form>
      ) : null}
    </div>
  );
}
