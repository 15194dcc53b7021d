"use client";

import { useWaivers, waivedErrorCount } from "@/components/waivers";
import { useRouter } from "next/navigation";
import { useCallback, useMemo, useState } from "react";
import type { Collection } from "@/queries/keys";
import { useDeleteMissionMutation, useMissionQuery, useActivityQuery, useMissionDataQueries } from "@/queries/missions";
import type { Channel } from "@/queries/types";
import { KIND_LABEL } from "./entity-editor";
import { countBySeverity } from "./findings";
import { FindingsPanel } from "./findings-panel";
import { ChannelsTable } from "./channels-table";
import { ChainItem, DetectorTable, LaserTable, ResonatorTable } from "./hardware";
import { EditingDrawer, type Editing } from "./overview/editing-drawer";
import { MissionHeader } from "./overview/mission-header";
import { SettingsCard } from "./overview/settings-card";
import { SchedulesCard } from "./schedule/schedules-card";
import { buttonClass, Card, ErrorNote, SENSITIVITY_TEXT, Spinner } from "./ui";

/**
 * A mission's overview: its header, hardware, chains, channels with their
 * figures, the latest check's findings, settings and recent changes, and the
 * drawer that edits any of them (for the roles that may edit).
 */
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
  const { lasers, resonators, detectors, chains, channels, settings, result, revisions } =
    useMissionDataQueries(missionId);
  const activity = useActivityQuery(missionId);
  const waivers = useWaivers(missionId);
  const [editing, setEditing] = useState<Editing | null>(null);
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
      <MissionHeader
        missionId={missionId}
        mission={mission.data}
        canEdit={canEdit}
        canDelete={canDelete}
        onEditMission={() => setEditing({ kind: "mission" })}
        onDelete={confirmDelete}
        deleting={deleteMission.isPending}
        deleteError={deleteMission.error}
        latest={latest}
        counts={result.data ? counts : null}
        waivedErrors={waivedErrorCount(findings, waivers)}
        resultLoading={result.isLoading}
        busy={busy}
      />
      {!canEdit ? (
        <p className="rounded bg-ink-faint px-3 py-1.5 text-sm text-ink-soft" data-testid="read-only-note">
          You can read this mission; your role does not allow changes.
        </p>
      ) : null}

      <Card title="Laser pairs" actions={addButton("lasers")}>
        {lasers.isLoading ? <Spinner label="Loading…" /> : <LaserTable lasers={refs.lasers} onEdit={edit("lasers")} />}
      </Card>
      <SchedulesCard
        missionId={missionId}
        lasers={refs.lasers}
        chains={refs.chains}
        result={result.data}
        canEdit={canEdit}
      />
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
            waivers={waivers}
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
            <FindingsPanel
              findings={findings}
              channelNames={channelNames}
              focus={focus}
              channelCount={channels.data?.length}
              waivers={waivers}
            />
          )}
        </Card>
        <SettingsCard
          settings={settings.data}
          settingsError={settings.error}
          activity={activity.data}
          canEdit={canEdit}
          onEdit={() => setEditing({ kind: "settings" })}
        />
      </div>

      {editing && canEdit ? (
        <EditingDrawer
          editing={editing}
          missionId={missionId}
          mission={mission.data}
          settings={settings.data}
          refs={refs}
          close={close}
        />
      ) : null}
    </div>
  );
}
