"use client";
import { useId, useState } from "react";
import { useCommentMutation, useCommentsQuery, type ReviewOverview } from "../use-review";
import { when, type ReviewAbilities } from "./abilities";
import { ErrorLine } from "./error-line";
import { MentionField } from "./mention-field";

/** The comment thread, and a form to comment on the revision, one of its channels or one of its error findings. */
export function Comments({ missionId, data, can }: { missionId: string; data: ReviewOverview; can: ReviewAbilities }) {
  const comments = useCommentsQuery(missionId);
  const post = useCommentMutation(missionId);
  const [body, setBody] = useState("");
  const [target, setTarget] = useState("");
  const bodyId = useId();
  const targetId = useId();
  const previewId = useId();
  const [mentionsOk, setMentionsOk] = useState(true);
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
            Comment (type @ and a name or e-mail address to mention a team member: they get an e-mail)
          </label>
          <MentionField
            id={bodyId}
            value={body}
            onChange={setBody}
            errorId={previewId}
            selfUserId={can.userId}
            onValidity={setMentionsOk}
          />
          <button
            type="submit"
            disabled={post.isPending || body.trim() === "" || !mentionsOk}
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
