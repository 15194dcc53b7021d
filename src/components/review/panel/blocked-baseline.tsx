"use client";
import { explainCode } from "@/lib/lanes/explain-code";
import type { ReviewOverview } from "../use-review";

/**
 * The refusal of a baseline because of open errors without a waiver, kept
 * up to date from the review data: each finding still unwaived is named in
 * words (its rule, chain and channel, and the engine's message), and the
 * list shrinks as waivers are recorded — it is not the stale list of keys
 * the server named when it refused.
 */
export function BlockedBaseline({ data }: { data: ReviewOverview }) {
  const left = data.errors.filter((e) => !e.waiver);
  if (left.length === 0)
    return (
      <p
        role="status"
        className="mt-2 rounded border border-emerald-300 bg-emerald-50 px-3 py-2 text-sm text-emerald-900"
      >
        Every open error finding now has a waiver: the revision can be baselined.
      </p>
    );
  return (
    <div
      role="alert"
      data-testid="blocked-baseline"
      className="mt-2 rounded border border-rose-300 bg-rose-50 px-3 py-2 text-sm text-rose-900"
    >
      Not baselined: {left.length} open error finding{left.length === 1 ? " has" : "s have"} no waiver yet.
      <ul className="mt-1 list-disc pl-5">
        {left.map((e) => (
          <li key={e.id}>
            <span className="font-medium">
              Chain {e.chain}
              {e.channel ? `, channel ${e.channel}` : ""}
            </span>
            : {explainCode(e.code)} <span className="text-rose-800">{e.message}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}
