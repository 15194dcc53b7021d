"use client";
import { useId, useState } from "react";
import { useWaiveMutation, useWithdrawWaiverMutation, type ReviewOverview } from "../use-review";
import { when, type ReviewAbilities } from "./abilities";
import { ErrorLine } from "./error-line";

/** Records why one open error finding is acceptable. */
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

/** The revision's open error findings, each with its waiver (withdrawable) or a form to record one. */
export function OpenErrors({
  missionId,
  data,
  can,
}: {
  missionId: string;
  data: ReviewOverview;
  can: ReviewAbilities;
}) {
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
