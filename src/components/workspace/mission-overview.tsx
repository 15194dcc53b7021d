"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useCallback, useMemo, useState } from "react";
import { api } from "@/queries/api";
import type { Collection } from "@/queries/keys";
import {
  useCollectionQuery,
  useDeleteMissionMutation,
  useMissionQuery,
  useResultQuery,
  useActivityQuery,
  useRevisionsQuery,
  useSettingsQuery,
} from "@/queries/missions";
import type { Channel } from "@/queries/types";
import { Drawer } from "./drawer";
import { EntityEditor, KIND_LABEL, MissionEditor, SettingsEditor } from "./entity-editor";
import { countBySeverity } from "./findings";
import { FindingsPanel } from "./findings-panel";
import { ChannelsTable } from "./channels-table";
import { ChainItem, DetectorTable, LaserTable, ResonatorTable } from "./hardware";
import { formatAge, formatNumber, plural } from "./format";
import { buttonClass, Card, ErrorNote, SENSITIVITY_TEXT, Spinner } from "./ui";

type Editing =
  | { kind: Collection; row: (Record<string, unknown> & { id: string; version: number }) | null }
  | { kind: "settings" }
  | { kind: "mission" }
  | null;

export function MissionOverview({
  missionId,
  canEdit,
  canDelete = false,
}: {
  missionId: string;
  canEdit: boolean;
  canDelete?: boolean;
}) {
  const mission = useMissionQuery(missionId);
  const router = useRouter();
  const deleteMission = useDeleteMissionMutation(missionId);
  const confirmDelete = () => {
    const m = mission.data;
    if (!m) return;
    if (
      !window.confirm(
        `Delete the mission "${m.name}" with all its hardware, chains, channels, revisions and findings? This cannot be undone.`,
      )
    )
      return;
    deleteMission.mutate({ version: m.version }, { onSuccess: () => router.push("/missions") });
  };
  const lasers = useCollectionQuery(missionId, "lasers");
  const resonators = useCollectionQuery(missionId, "resonators");
  const detectors = useCollectionQuery(missionId, "detectors");
  const chains = useCollectionQuery(missionId, "chains");
  const channels = useCollectionQuery(missionId, "channels");
  const settings = useSettingsQuery(missionId);
  const result = useResultQuery(missionId);
  const revisions = useRevisionsQuery(missionId);
  const activity = useActivityQuery(missionId);
  const [editing, setEditing] = useState<Editing>(null);
  const [focus, setFocus] = useState<string | null>(null);
  const close = useCallback(() => setEditing(null), []);

  const refs = {
    lasers: lasers.data ?? [],
    resonators: resonators.data ?? [],
    detectors: detectors.data ?? [],
    chains: chains.data ?? [],
    channelKeys: (channels.data ?? []).map((c) => c.key),
  };
  const findings = result.data?.findings ?? [];
  const counts = countBySeverity(findings);
  const latest = revisions.data?.reduce((m, r) => Math.max(m, r.number), 0) ?? null;
  const channelNames = useMemo(() => new Map((channels.data ?? []).map((c) => [c.key, c.name])), [channels.data]);
  const keyOf = (rows: { id: string; key: string }[], id: string) => rows.find((r) => r.id === id)?.key ?? "?";
  const edit = (kind: Collection) => (row: { id: string; version: number }) =>
    canEdit
      ? () => setEditing({ kind, row: row as unknown as Record<string, unknown> & { id: string; version: number } })
      : undefined;

  if (mission.error) return <ErrorNote title="This mission could not be loaded.">{mission.error.message}</ErrorNote>;
  const busy = [lasers, resonators, detectors, chains, channels, result].some((q) => q.isFetching);

  const addButton = (kind: Collection) =>
    canEdit ? (
      <button type="button" className={buttonClass.quiet} onClick={() => setEditing({ kind, row: null })}>
        + Add {KIND_LABEL[kind]}
      </button>
    ) : null;

  return (
    <div className="space-y-5">
      <header className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-xs text-ink-soft">
            <Link href="/missions" className="hover:underline">
              Missions
            </Link>{" "}
            /
          </p>
          <h1 className="flex items-baseline gap-2 text-2xl font-semibold tracking-tight">
            {mission.data?.name ?? "…"}
            {canEdit && mission.data ? (
              <button
                type="button"
                className={buttonClass.quiet}
                onClick={() => setEditing({ kind: "mission" })}
                aria-label="Edit mission name and description"
              >
                Edit
              </button>
            ) : null}
            {canDelete && mission.data ? (
              <button
                type="button"
                className={buttonClass.quiet}
                onClick={confirmDelete}
                disabled={deleteMission.isPending}
                aria-label="Delete this mission"
              >
                {deleteMission.isPending ? "Deleting…" : "Delete"}
              </button>
            ) : null}
          </h1>
          {deleteMission.error ? (
            <ErrorNote title="The mission was not deleted.">
              {deleteMission.error.message} Reload the page to see its current state.
            </ErrorNote>
          ) : null}
          {mission.data?.description ? (
            <p className="mt-0.5 max-w-2xl text-sm text-ink-soft">{mission.data.description}</p>
          ) : null}
          <p className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm" data-testid="revision-line">
            <span className="rounded bg-ink-faint px-1.5 py-0.5 text-xs font-medium uppercase tracking-wide">
              {mission.data?.status ?? "draft"}
            </span>
            <span>
              Revision{" "}
              <span className="font-semibold tabular-nums" data-testid="revision-number">
                {latest ?? "–"}
              </span>
            </span>
            {result.data ? (
              <>
                <span className="text-sev-error">{plural(counts.error, "error")}</span>
                <span className="text-sev-warning">{plural(counts.warning, "warning")}</span>
                <span className="text-sev-info">{counts.info} info</span>
              </>
            ) : result.isLoading ? null : (
              <span className="text-ink-soft">not checked yet</span>
            )}
            <span className="text-ink-soft">changed {formatAge(mission.data?.updatedAt)}</span>
            {busy ? <Spinner label="Re-checking…" /> : null}
          </p>
        </div>
        <nav className="flex flex-wrap gap-2" aria-label="Views and exports">
          <Link className={buttonClass.secondary} href={`/missions/${missionId}/lanes`}>
            Lane view
          </Link>
          <a className={buttonClass.secondary} href={api.collection(missionId, "plan")} download="plan.json">
            Plan JSON
          </a>
          <a className={buttonClass.secondary} href={api.collection(missionId, "channels.csv")} download="channels.csv">
            Channels CSV
          </a>
          <Link className={buttonClass.secondary} href={`/missions/${missionId}/report`}>
            Printable report
          </Link>
          {canEdit ? (
            <Link className={buttonClass.primary} href={`/missions/${missionId}/uploads`}>
              Upload data
            </Link>
          ) : null}
        </nav>
      </header>
      {!canEdit ? (
        <p className="rounded bg-ink-faint px-3 py-1.5 text-sm text-ink-soft" data-testid="read-only-note">
          You can read this mission; your role does not allow changes.
        </p>
      ) : null}

      <Card title="Laser pairs" actions={addButton("lasers")}>
        {lasers.isLoading ? <Spinner label="Loading…" /> : <LaserTable lasers={refs.lasers} onEdit={edit("lasers")} />}
      </Card>
      <div className="grid gap-4 lg:grid-cols-2">
        <Card title="Resonators" actions={addButton("resonators")}>
          {resonators.isLoading ? <Spinner label="Loading…" /> : null}
          <ResonatorTable
            loading={resonators.isLoading}
            resonators={refs.resonators}
            onEdit={edit("resonators")}
            linewidthMHz={(r) => {
              const chain = refs.chains.find((c) => c.resonatorId === r.id);
              return chain ? result.data?.chains.find((c) => c.id === chain.key)?.linewidthMHz : null;
            }}
          />
        </Card>
        <Card title="Detectors" actions={addButton("detectors")}>
          {detectors.isLoading ? (
            <Spinner label="Loading…" />
          ) : (
            <DetectorTable detectors={refs.detectors} onEdit={edit("detectors")} />
          )}
        </Card>
      </div>

      <Card title="Receiver chains" actions={addButton("chains")}>
        <div className="grid gap-2 md:grid-cols-2 xl:grid-cols-3">
          {chains.isLoading ? <Spinner label="Loading…" /> : null}
          {!chains.isLoading && refs.chains.length === 0 ? (
            <p className="text-sm text-ink-soft">
              No chain yet: a chain joins one laser pair, one resonator mode and one detector.
            </p>
          ) : null}
          {refs.chains.map((c) => (
            <ChainItem
              key={c.id}
              chain={c}
              result={result.data?.chains.find((r) => r.id === c.key)}
              keys={{
                laser: keyOf(refs.lasers, c.laserId),
                resonator: keyOf(refs.resonators, c.resonatorId),
                detector: keyOf(refs.detectors, c.detectorId),
              }}
              carrierTHz={refs.lasers.find((l) => l.id === c.laserId)?.carrierTHz}
              fsrGHz={refs.resonators.find((r) => r.id === c.resonatorId)?.fsrGHz}
              onEdit={edit("chains")(c)}
            />
          ))}
        </div>
      </Card>

      <Card title="Channels" actions={addButton("channels")}>
        {channels.isLoading ? (
          <Spinner label="Loading channels…" />
        ) : (
          <ChannelsTable
            resultPending={result.isLoading}
            channels={channels.data ?? []}
            chains={refs.chains}
            result={result.data}
            canEdit={canEdit}
            onEdit={(c: Channel) =>
              setEditing({
                kind: "channels",
                row: c as unknown as Record<string, unknown> & { id: string; version: number },
              })
            }
            onSelect={(key) => {
              setFocus(key);
              document.getElementById(`findings-${key}`)?.scrollIntoView({ behavior: "smooth", block: "center" });
            }}
          />
        )}
        <p className="mt-2 text-xs text-ink-soft">{SENSITIVITY_TEXT}</p>
      </Card>

      <div className="grid gap-4 lg:grid-cols-3">
        <Card title={`Findings${latest ? ` · revision ${latest}` : ""}`} className="lg:col-span-2">
          {result.isLoading ? (
            <Spinner label="Loading findings…" />
          ) : (
            <FindingsPanel findings={findings} channelNames={channelNames} focus={focus} />
          )}
        </Card>
        <Card
          title="Check settings"
          actions={
            canEdit && settings.data ? (
              <button type="button" className={buttonClass.quiet} onClick={() => setEditing({ kind: "settings" })}>
                Edit
              </button>
            ) : null
          }
        >
          {settings.data ? (
            <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
              <dt className="text-ink-soft">Guard band</dt>
              <dd className="tabular-nums">{formatNumber(settings.data.guardMHz, 1)} MHz</dd>
              <dt className="text-ink-soft">Image rejection</dt>
              <dd className="tabular-nums">{formatNumber(settings.data.imageRejectionDB, 1)} dB</dd>
              <dt className="text-ink-soft">Spur order</dt>
              <dd className="tabular-nums">up to {settings.data.spurMaxOrder}</dd>
              <dt className="text-ink-soft">Lock replica limit</dt>
              <dd className="tabular-nums">{formatNumber(settings.data.replicaLimitDB, 1)} dB</dd>
            </dl>
          ) : settings.error ? (
            <p className="text-sm text-sev-error">{settings.error.message}</p>
          ) : (
            <Spinner label="Loading…" />
          )}
          <h3 className="mt-5 border-t border-ink/10 pt-3 text-sm font-semibold">Recent changes</h3>
          {activity.data && activity.data.length === 0 ? (
            <p className="text-sm text-ink-soft">No changes yet.</p>
          ) : null}
          <ol className="mt-1 space-y-1.5 text-sm" data-testid="activity">
            {(activity.data ?? []).slice(0, 8).map((a, i) => (
              <li key={`${a.at}-${i}`}>
                <span className="text-ink">{a.summary ?? `${a.action} ${a.entity}`}</span>
                <span className="block text-xs text-ink-soft">
                  {a.actorName ?? "someone"} · {formatAge(a.at)}
                  {a.revision ? ` · revision ${a.revision}` : ""}
                </span>
              </li>
            ))}
          </ol>
        </Card>
      </div>

      {editing && canEdit ? (
        editing.kind === "mission" ? (
          mission.data ? (
            <Drawer title="Mission" onClose={close}>
              <MissionEditor mission={mission.data} onClose={close} />
            </Drawer>
          ) : null
        ) : editing.kind === "settings" ? (
          settings.data ? (
            <Drawer title="Check settings" onClose={close}>
              <SettingsEditor missionId={missionId} settings={settings.data} onClose={close} />
            </Drawer>
          ) : null
        ) : (
          <Drawer
            title={
              editing.row
                ? `Edit ${KIND_LABEL[editing.kind]} ${String(editing.row.key)}`
                : `New ${KIND_LABEL[editing.kind]}`
            }
            onClose={close}
          >
            <EntityEditor missionId={missionId} kind={editing.kind} row={editing.row} refs={refs} onClose={close} />
          </Drawer>
        )
      ) : null}
    </div>
  );
}
