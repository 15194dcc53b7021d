"use client";

import { useState } from "react";
import type { ScheduleResult } from "@/lib/plan";
import { useScheduleMutation, useScheduleQuery } from "@/queries/schedule";
import type { Chain, Laser, PlanResult } from "@/queries/types";
import { buttonClass, Card, ErrorNote, Spinner } from "../ui";
import { NedtBars } from "./nedt-bars";
import { ScheduleEditor } from "./schedule-editor";
import { TimelineChart } from "./timeline-chart";

const pct = (m: number) => `${(m * 100).toFixed(1)} %`;

/**
 * Observation schedules of the mission's laser pairs (docs/plan-format.md
 * §13): per laser pair with a chain, its schedule as last checked — the
 * timeline of one cycle, NEΔT against requirement as saved and with the
 * best split — the editor, and "apply best split", which saves the split as
 * a new revision the server checks again.
 */
export function SchedulesCard({
  missionId,
  lasers,
  chains,
  result,
  canEdit,
}: {
  missionId: string;
  lasers: Laser[];
  chains: Chain[];
  result: PlanResult | null | undefined;
  canEdit: boolean;
}) {
  const used = lasers.filter((l) => chains.some((c) => c.laserId === l.id));
  if (used.length === 0) return null;
  return (
    <Card title="Observation schedules">
      <p className="mb-2 text-xs text-ink-soft">
        One laser pair can serve several chains in turn: each cycle it dwells on each chain, losing the retune (and,
        between resonators, the relock) at the start of each dwell. Each channel integrates for its share of the cycle.
      </p>
      <div className="space-y-4">
        {used.map((l) => (
          <LaserSchedulePanel
            key={l.id}
            missionId={missionId}
            laser={l}
            chains={chains}
            checked={result?.schedules?.find((s) => s.laser === l.key) ?? null}
            canEdit={canEdit}
          />
        ))}
      </div>
    </Card>
  );
}

function LaserSchedulePanel({
  missionId,
  laser,
  chains,
  checked,
  canEdit,
}: {
  missionId: string;
  laser: Laser;
  chains: Chain[];
  checked: ScheduleResult | null;
  canEdit: boolean;
}) {
  const q = useScheduleQuery(missionId, laser.id);
  const apply = useScheduleMutation(missionId, laser.id);
  const [editing, setEditing] = useState(false);
  const [saved, setSaved] = useState<number | null>(null);
  const best = checked?.bestSplit ?? null;
  const onApply = () => {
    const s = q.data?.schedule;
    if (!s || !best || !q.data) return;
    apply.mutate(
      {
        version: q.data.version,
        schedule: {
          ...s,
          dwells: s.dwells.map((d, j) => ({ chainId: d.chainId, dwellMs: best.dwellsMs[j] ?? d.dwellMs })),
        },
      },
      { onSuccess: (r) => setSaved(r.revision.number) },
    );
  };
  return (
    <section
      data-testid={`schedule-${laser.key}`}
      className="space-y-2 border-t border-ink/10 pt-3 first:border-0 first:pt-0"
    >
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="font-semibold">
          Laser pair {laser.key}
          {checked ? (
            <span className="ml-2 text-sm font-normal text-ink-soft">
              cycle {checked.cycleMs} ms · {checked.dwells.length} dwells
              {checked.busyMs > checked.plannedCycleMs ? ` · overruns the planned ${checked.plannedCycleMs} ms` : ""}
            </span>
          ) : (
            <span className="ml-2 text-sm font-normal text-ink-soft">no schedule: one chain, the whole time</span>
          )}
        </h3>
        {canEdit ? (
          <div className="flex gap-2">
            {best ? (
              <button
                type="button"
                className={buttonClass.primary}
                onClick={onApply}
                disabled={apply.isPending || !q.data}
              >
                {apply.isPending ? "Applying…" : "Apply best split"}
              </button>
            ) : null}
            <button
              type="button"
              className={buttonClass.secondary}
              onClick={() => setEditing((e) => !e)}
              disabled={!q.data}
            >
              {checked ? "Edit schedule" : "Add schedule"}
            </button>
          </div>
        ) : null}
      </div>
      {q.isLoading ? <Spinner label="Loading schedule…" /> : null}
      {q.error ? <ErrorNote title="The schedule could not be loaded.">{q.error.message}</ErrorNote> : null}
      {apply.error ? <ErrorNote title="The best split could not be saved.">{apply.error.message}</ErrorNote> : null}
      {saved !== null ? (
        <p className="text-sm text-ink-soft" role="status" data-testid="schedule-saved">
          Saved as revision {saved}; the server checked it again.
        </p>
      ) : null}
      {editing && q.data ? (
        <ScheduleEditor missionId={missionId} current={q.data} chains={chains} onDone={() => setEditing(false)} />
      ) : null}
      {checked ? (
        <>
          <TimelineChart schedule={checked} />
          <NedtBars schedule={checked} />
          {best ? (
            <p className="text-xs text-ink-soft" data-testid={`best-split-${laser.key}`}>
              Best split ({best.method === "closed-form" ? "closed form" : "search"}):{" "}
              {best.dwellsMs.map((d, j) => `${checked.dwells[j]?.chain} ${d} ms`).join(", ")}; common margin{" "}
              {pct(best.commonMargin)} (as saved {pct(best.currentMargin)}).
            </p>
          ) : null}
        </>
      ) : null}
    </section>
  );
}
