"use client";

import { useState } from "react";
import type { ApiError, ApiIssue } from "@/queries/api";
import type { LaserSchedule } from "@/queries/schedule";
import { useScheduleMutation } from "@/queries/schedule";
import type { Chain } from "@/queries/types";
import { scheduleUpdateSchema } from "@/schemas/workspace-schedule";
import { buttonClass } from "../ui";

const input =
  "w-24 rounded border border-ink/30 bg-white px-2 py-1 text-sm tabular-nums aria-[invalid=true]:border-sev-error focus:border-ink focus:outline-none";

interface Row {
  chainId: string;
  key: string;
  included: boolean;
  dwellMs: string;
}

const TIMING = [
  ["cycleMs", "Cycle (ms)"],
  ["retuneMs", "Retune, fixed (ms)"],
  ["retuneMsPerGHz", "Retune per GHz of LO change (ms/GHz)"],
  ["relockMs", "Relock between resonators (ms)"],
] as const;
type TimingKey = (typeof TIMING)[number][0];

/** The rows of the editor: the schedule's dwells in order, then the laser's other chains, then every other chain (left out). */
function initialRows(current: LaserSchedule, chains: Chain[]): Row[] {
  const dwells = current.schedule?.dwells ?? [];
  const listed = new Set(dwells.map((d) => d.chainId));
  const own = chains.filter((c) => c.laserId === current.laserId && !listed.has(c.id));
  const others = chains.filter((c) => c.laserId !== current.laserId && !listed.has(c.id));
  return [
    ...dwells.map((d) => ({ chainId: d.chainId, key: d.chainKey, included: true, dwellMs: String(d.dwellMs) })),
    ...own.map((c) => ({ chainId: c.id, key: c.key, included: true, dwellMs: "" })),
    ...others.map((c) => ({ chainId: c.id, key: c.key, included: false, dwellMs: "" })),
  ];
}

/**
 * The schedule editor of one laser pair (docs/plan-format.md §13.1): its
 * timing and, per chain, whether it dwells and for how long, in cycle
 * order. Saving sends the whole schedule; the server checks the plan and
 * stores a new revision, or answers with every issue at its field.
 */
export function ScheduleEditor({
  missionId,
  current,
  chains,
  onDone,
}: {
  missionId: string;
  current: LaserSchedule;
  chains: Chain[];
  onDone: () => void;
}) {
  const s = current.schedule;
  const [timing, setTiming] = useState<Record<TimingKey, string>>({
    cycleMs: s ? String(s.cycleMs) : "",
    retuneMs: s ? String(s.retuneMs) : "0",
    retuneMsPerGHz: s ? String(s.retuneMsPerGHz) : "0",
    relockMs: s ? String(s.relockMs) : "0",
  });
  const [rows, setRows] = useState<Row[]>(() => initialRows(current, chains));
  const [issues, setIssues] = useState<ApiIssue[]>([]);
  const save = useScheduleMutation(missionId, current.laserId);

  const move = (i: number, by: number) =>
    setRows((rs) => {
      const j = i + by;
      if (j < 0 || j >= rs.length) return rs;
      const out = [...rs];
      [out[i], out[j]] = [out[j]!, out[i]!];
      return out;
    });
  const setRow = (i: number, patch: Partial<Row>) =>
    setRows((rs) => rs.map((r, k) => (k === i ? { ...r, ...patch } : r)));
  const num = (v: string) => (v.trim() === "" ? Number.NaN : Number(v));
  const included = rows.filter((r) => r.included);
  const errorAt = (path: string) => issues.filter((i) => i.path === path).map((i) => i.message);

  const submit = (schedule: unknown) => {
    const body = { version: current.version, schedule };
    const parsed = scheduleUpdateSchema.safeParse(body);
    if (!parsed.success) {
      setIssues(
        parsed.error.issues.map((i) => ({
          path: i.path
            .map(String)
            .join(".")
            .replace(/\.(\d+)/g, "[$1]"),
          message: i.message,
        })),
      );
      return;
    }
    setIssues([]);
    save.mutate(parsed.data, {
      onSuccess: onDone,
      onError: (e) =>
        setIssues((e as ApiError).issues?.length ? (e as ApiError).issues : [{ path: "", message: e.message }]),
    });
  };
  const onSave = (e: React.FormEvent) => {
    e.preventDefault();
    submit({
      cycleMs: num(timing.cycleMs),
      retuneMs: num(timing.retuneMs),
      retuneMsPerGHz: num(timing.retuneMsPerGHz),
      relockMs: num(timing.relockMs),
      dwells: included.map((r) => ({ chainId: r.chainId, dwellMs: num(r.dwellMs) })),
    });
  };

  return (
    <form
      onSubmit={onSave}
      className="space-y-3 rounded border border-ink/15 bg-ink-faint/40 p-3"
      data-testid={`schedule-editor-${current.laserKey}`}
      noValidate
    >
      <div className="flex flex-wrap gap-4">
        {TIMING.map(([k, label]) => (
          <label key={k} className="flex flex-col gap-0.5 text-xs">
            <span className="text-ink-soft">{label}</span>
            <input
              className={input}
              name={k}
              inputMode="decimal"
              value={timing[k]}
              aria-invalid={errorAt(`schedule.${k}`).length > 0}
              onChange={(e) => setTiming((t) => ({ ...t, [k]: e.target.value }))}
            />
            {errorAt(`schedule.${k}`).map((m) => (
              <span key={m} className="text-sev-error">
                {m}
              </span>
            ))}
          </label>
        ))}
      </div>
      <table className="text-sm">
        <thead>
          <tr className="text-left text-xs text-ink-soft">
            <th className="px-2 py-1">Order</th>
            <th className="px-2 py-1">Chain</th>
            <th className="px-2 py-1">Dwells</th>
            <th className="px-2 py-1">Dwell (ms)</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => {
            const j = included.indexOf(r);
            const errs =
              j >= 0 ? [...errorAt(`schedule.dwells[${j}].dwellMs`), ...errorAt(`schedule.dwells[${j}].chainId`)] : [];
            return (
              <tr key={r.chainId} data-dwell-row={r.key}>
                <td className="px-2 py-1">
                  <button
                    type="button"
                    className={buttonClass.quiet}
                    onClick={() => move(i, -1)}
                    aria-label={`Move ${r.key} earlier`}
                  >
                    ↑
                  </button>
                  <button
                    type="button"
                    className={buttonClass.quiet}
                    onClick={() => move(i, 1)}
                    aria-label={`Move ${r.key} later`}
                  >
                    ↓
                  </button>
                </td>
                <td className="px-2 py-1 font-medium">{r.key}</td>
                <td className="px-2 py-1">
                  <input
                    type="checkbox"
                    checked={r.included}
                    onChange={(e) => setRow(i, { included: e.target.checked })}
                    aria-label={`${r.key} dwells in the schedule`}
                  />
                </td>
                <td className="px-2 py-1">
                  <input
                    className={input}
                    name={`dwell-${r.key}`}
                    aria-label={`Dwell of ${r.key} (ms)`}
                    inputMode="decimal"
                    disabled={!r.included}
                    value={r.dwellMs}
                    aria-invalid={errs.length > 0}
                    onChange={(e) => setRow(i, { dwellMs: e.target.value })}
                  />
                </td>
                <td className="px-2 py-1 text-xs text-sev-error">{errs.join("; ")}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {rows.some((r) => r.included && !chains.find((c) => c.id === r.chainId && c.laserId === current.laserId)) ? (
        <p className="text-xs text-ink-soft">
          A chain of another laser pair put in this schedule will use laser pair {current.laserKey}.
        </p>
      ) : null}
      {issues.filter(
        (i) => !/^schedule\.(cycleMs|retuneMs|retuneMsPerGHz|relockMs|dwells\[\d+\]\.(dwellMs|chainId))$/.test(i.path),
      ).length ? (
        <ul className="text-sm text-sev-error" role="alert">
          {issues
            .filter(
              (i) =>
                !/^schedule\.(cycleMs|retuneMs|retuneMsPerGHz|relockMs|dwells\[\d+\]\.(dwellMs|chainId))$/.test(i.path),
            )
            .map((i) => (
              <li key={`${i.path}:${i.message}`}>{i.path ? `${i.path}: ${i.message}` : i.message}</li>
            ))}
        </ul>
      ) : null}
      <div className="flex gap-2">
        <button type="submit" className={buttonClass.primary} disabled={save.isPending}>
          {save.isPending ? "Saving…" : "Save schedule"}
        </button>
        {s ? (
          <button
            type="button"
            className={buttonClass.secondary}
            disabled={save.isPending}
            onClick={() => submit(null)}
          >
            Remove schedule
          </button>
        ) : null}
        <button type="button" className={buttonClass.quiet} onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
