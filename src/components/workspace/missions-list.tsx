"use client";

import { reviewStateLabel } from "@/lib/review";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { missionCreateSchema } from "@/schemas/workspace";
import { useCreateMissionMutation, useMissionsQuery } from "@/queries/missions";
import type { MissionSummary } from "@/queries/types";
import { EntityForm } from "./entity-form";
import { formatAge } from "./format";
import { filterByText, filterByValue, nextSort, sortRows, type SortState } from "./table";
import { buttonClass, Card, CountPill, Empty, ErrorNote, Spinner } from "./ui";

type Key = "name" | "status" | "chainCount" | "channelCount" | "openErrors" | "openWarnings" | "updatedAt";
const COLUMNS: { key: Key; label: string; numeric?: boolean }[] = [
  { key: "name", label: "Mission" },
  { key: "status", label: "Status" },
  { key: "chainCount", label: "Chains", numeric: true },
  { key: "channelCount", label: "Channels", numeric: true },
  { key: "openErrors", label: "Errors", numeric: true },
  { key: "openWarnings", label: "Warnings", numeric: true },
  { key: "updatedAt", label: "Last change" },
];

export function MissionsList({ canCreate }: { canCreate: boolean }) {
  const missions = useMissionsQuery();
  const create = useCreateMissionMutation();
  const router = useRouter();
  const [sort, setSort] = useState<SortState<Key>>({ key: "updatedAt", dir: "desc" });
  const [query, setQuery] = useState("");
  const [status, setStatus] = useState("");
  const [creating, setCreating] = useState(false);
  const rows = useMemo(() => missions.data ?? [], [missions.data]);
  const statuses = useMemo(() => [...new Set(rows.map((m) => m.status))].sort(), [rows]);
  const shown = useMemo(
    () =>
      sortRows(
        filterByValue(
          filterByText(rows, query, (m) => [m.name, m.description]),
          status,
          (m) => m.status,
        ),
        sort,
        (m: MissionSummary, k: Key) => m[k],
      ),
    [rows, query, status, sort],
  );

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Missions</h1>
          <p className="text-sm text-ink-soft">One frequency plan per mission, re-checked on every change.</p>
        </div>
        {canCreate && !creating ? (
          <button type="button" className={buttonClass.primary} onClick={() => setCreating(true)}>
            New mission
          </button>
        ) : null}
      </div>
      {creating ? (
        <Card title="New mission">
          <EntityForm
            formId="mission-new"
            schema={missionCreateSchema}
            groups={[
              {
                legend: "Mission",
                fields: [
                  {
                    name: "name",
                    label: "Name",
                    unit: "text",
                    kind: "text",
                    wide: true,
                    help: "E.g. the instrument and its platform.",
                  },
                  { name: "description", label: "Description", unit: "text, optional", kind: "textarea", wide: true },
                ],
              },
            ]}
            defaultValue={{ name: "", description: "" }}
            version={null}
            submitLabel="Create mission"
            save={async (value) => {
              const m = await create.mutateAsync(value);
              router.push(`/missions/${m.id}`);
            }}
            onCancel={() => setCreating(false)}
          />
        </Card>
      ) : null}
      <div className="flex flex-wrap items-end gap-2" role="search" aria-label="Filter missions">
        <label className="text-xs text-ink-soft">
          Search{" "}
          <input
            value={query}
            onChange={(e) => setQuery(e.target.value)}
            placeholder="name or description"
            className="w-56 rounded border border-ink/30 px-2 py-1 text-sm text-ink"
          />
        </label>
        <label className="text-xs text-ink-soft">
          Status{" "}
          <select
            value={status}
            onChange={(e) => setStatus(e.target.value)}
            className="rounded border border-ink/30 bg-white px-2 py-1 text-sm text-ink"
          >
            <option value="">all</option>
            {statuses.map((s) => (
              <option key={s} value={s}>
                {reviewStateLabel(s)}
              </option>
            ))}
          </select>
        </label>
        <span className="ml-auto text-xs text-ink-soft">
          {shown.length} of {rows.length}
        </span>
      </div>
      {missions.error ? (
        <ErrorNote title="The missions could not be loaded.">{missions.error.message}</ErrorNote>
      ) : null}
      {missions.isLoading ? <Spinner label="Loading missions…" /> : null}
      {missions.data && rows.length === 0 ? (
        <Empty>No missions in this team yet.{canCreate ? " Create the first one." : ""}</Empty>
      ) : null}
      {rows.length > 0 ? (
        <table className="w-full border-collapse text-sm" data-testid="missions-table">
          <thead>
            <tr className="border-b border-ink/20 text-left text-xs text-ink-soft">
              {COLUMNS.map((c) => (
                <th
                  key={c.key}
                  scope="col"
                  aria-sort={sort.key === c.key ? (sort.dir === "asc" ? "ascending" : "descending") : "none"}
                  className={`px-2 py-1.5 font-medium ${c.numeric ? "text-right" : ""}`}
                >
                  <button
                    type="button"
                    className="inline-flex items-center gap-1 hover:text-ink"
                    onClick={() => setSort(nextSort(sort, c.key))}
                  >
                    {c.label}
                    <span aria-hidden className={sort.key === c.key ? "text-ink" : "text-transparent"}>
                      {sort.dir === "asc" ? "▲" : "▼"}
                    </span>
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {shown.map((m) => (
              <tr key={m.id} className="border-b border-ink/10 hover:bg-ink-faint/50">
                <td className="px-2 py-2">
                  <Link href={`/missions/${m.id}`} className="font-medium hover:underline">
                    {m.name}
                  </Link>
                  {m.description ? <div className="line-clamp-1 text-xs text-ink-soft">{m.description}</div> : null}
                </td>
                <td className="px-2 py-2">
                  <span className="rounded bg-ink-faint px-1.5 py-0.5 text-xs" data-testid="mission-state">
                    {reviewStateLabel(m.status)}
                  </span>
                </td>
                <td className="px-2 py-2 text-right tabular-nums">{m.chainCount}</td>
                <td className="px-2 py-2 text-right tabular-nums">{m.channelCount}</td>
                <td className="px-2 py-2 text-right">
                  <CountPill n={m.openErrors} severity="error" />
                  {m.waivedErrors > 0 ? (
                    <div className="text-xs text-emerald-900" data-testid="mission-waived">
                      {m.waivedErrors >= m.openErrors ? "all waived" : `${m.waivedErrors} waived`}
                    </div>
                  ) : null}
                </td>
                <td className="px-2 py-2 text-right">
                  <CountPill n={m.openWarnings} severity="warning" />
                </td>
                <td className="px-2 py-2 text-ink-soft" title={m.updatedAt}>
                  {formatAge(m.updatedAt)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </div>
  );
}
