"use client";

import { useState } from "react";
import {
  chainSchema,
  channelSchema,
  detectorSchema,
  laserSchema,
  resonatorSchema,
  missionCreateSchema,
  settingsFields,
} from "@/schemas/workspace";
import { ApiError } from "@/queries/api";
import { useUpdateChannelMutation } from "@/queries/channels";
import type { Collection } from "@/queries/keys";
import {
  useDeleteEntityMutation,
  useSaveEntityMutation,
  useSaveSettingsMutation,
  useUpdateMissionMutation,
} from "@/queries/missions";
import type { Chain, Detector, Laser, Mission, Resonator, Settings } from "@/queries/types";
import { EntityForm, type FieldGroup } from "./entity-form";
import {
  chainDefaults,
  chainGroups,
  channelDefaults,
  channelGroups,
  detectorDefaults,
  detectorGroups,
  laserDefaults,
  laserGroups,
  resonatorDefaults,
  resonatorGroups,
  nextKey,
  rowToFormValue,
  settingsGroups,
} from "./entity-specs";
import { buttonClass } from "./ui";

export const KIND_LABEL: Record<Collection, string> = {
  lasers: "laser pair",
  resonators: "resonator",
  detectors: "detector",
  chains: "receiver chain",
  channels: "channel",
};

export interface Refs {
  lasers: Laser[];
  resonators: Resonator[];
  detectors: Detector[];
  chains: Chain[];
  /** Plan ids of the channels already in the mission (for the next free id). */
  channelKeys: string[];
}

const opts = (rows: { id: string; key: string }[]) => rows.map((r) => ({ value: r.id, label: r.key }));

function specFor(
  kind: Collection,
  refs: Refs,
): { groups: FieldGroup[]; schema: unknown; defaults: Record<string, unknown> } {
  switch (kind) {
    case "lasers":
      return {
        groups: laserGroups(),
        schema: laserSchema,
        defaults: {
          ...laserDefaults,
          key: nextKey(
            refs.lasers.map((r) => r.key),
            "LP",
          ),
        },
      };
    case "resonators":
      return {
        groups: resonatorGroups(),
        schema: resonatorSchema,
        defaults: {
          ...resonatorDefaults,
          key: nextKey(
            refs.resonators.map((r) => r.key),
            "R",
          ),
        },
      };
    case "detectors":
      return {
        groups: detectorGroups(),
        schema: detectorSchema,
        defaults: {
          ...detectorDefaults,
          key: nextKey(
            refs.detectors.map((r) => r.key),
            "D",
          ),
        },
      };
    case "chains":
      return {
        groups: chainGroups({
          lasers: opts(refs.lasers),
          resonators: opts(refs.resonators),
          detectors: opts(refs.detectors),
        }),
        schema: chainSchema,
        defaults: {
          ...chainDefaults,
          key: nextKey(
            refs.chains.map((c) => c.key),
            "",
            ["A", "B", "C", "D", "E", "F", "G", "H"],
          ),
          laserId: refs.lasers.find((l) => !refs.chains.some((c) => c.laserId === l.id))?.id ?? "",
          resonatorId: refs.resonators[0]?.id ?? "",
          detectorId: refs.detectors[0]?.id ?? "",
        },
      };
    case "channels":
      return {
        groups: channelGroups({ chains: opts(refs.chains) }),
        schema: channelSchema,
        defaults: { ...channelDefaults, key: nextKey(refs.channelKeys, "ch"), chainId: refs.chains[0]?.id ?? "" },
      };
  }
}

/** Create or edit one entity of the mission (the row is null for a new one). */
export function EntityEditor({
  missionId,
  kind,
  row,
  refs,
  onClose,
}: {
  missionId: string;
  kind: Collection;
  row: (Record<string, unknown> & { id: string; version: number }) | null;
  refs: Refs;
  onClose: () => void;
}) {
  const spec = specFor(kind, refs);
  const save = useSaveEntityMutation(missionId, kind);
  const saveChannel = useUpdateChannelMutation(missionId);
  const del = useDeleteEntityMutation(missionId, kind);
  const [deleteError, setDeleteError] = useState<string | null>(null);
  const [confirming, setConfirming] = useState(false);
  return (
    <div>
      <EntityForm
        formId={`${kind}-${row?.id ?? "new"}`}
        schema={spec.schema as typeof channelSchema}
        groups={spec.groups}
        defaultValue={row ? rowToFormValue(row) : spec.defaults}
        version={row ? row.version : null}
        submitLabel={row ? `Save ${KIND_LABEL[kind]}` : `Add ${KIND_LABEL[kind]}`}
        toFormValue={rowToFormValue}
        save={async (value, version) => {
          if (row && kind === "channels")
            await saveChannel.mutateAsync({ id: row.id, input: { ...(value as object), version } });
          else if (row) await save.mutateAsync({ id: row.id, input: { ...(value as object), version } });
          else await save.mutateAsync({ input: value as Record<string, unknown> });
        }}
        onDone={onClose}
        onCancel={onClose}
      />
      {row ? (
        <div className="mt-6 border-t border-ink/10 pt-3">
          {deleteError ? (
            <p role="alert" className="mb-2 text-sm text-sev-error">
              {deleteError}
            </p>
          ) : null}
          {confirming ? (
            <div className="flex items-center gap-2 text-sm">
              <span>
                Delete {KIND_LABEL[kind]} {String(row.key)}? The plan is re-checked at once.
              </span>
              <button
                type="button"
                className={buttonClass.danger}
                disabled={del.isPending}
                onClick={async () => {
                  setDeleteError(null);
                  try {
                    await del.mutateAsync({ id: row.id, version: row.version });
                    onClose();
                  } catch (e) {
                    setDeleteError(e instanceof ApiError ? e.message : String(e));
                    setConfirming(false);
                  }
                }}
              >
                {del.isPending ? "Deleting…" : "Yes, delete"}
              </button>
              <button type="button" className={buttonClass.quiet} onClick={() => setConfirming(false)}>
                Keep it
              </button>
            </div>
          ) : (
            <button type="button" className={buttonClass.danger} onClick={() => setConfirming(true)}>
              Delete {KIND_LABEL[kind]}
            </button>
          )}
        </div>
      ) : null}
    </div>
  );
}

export function SettingsEditor({
  missionId,
  settings,
  onClose,
}: {
  missionId: string;
  settings: Settings;
  onClose: () => void;
}) {
  const save = useSaveSettingsMutation(missionId);
  return (
    <EntityForm
      formId="settings"
      schema={settingsFields}
      groups={settingsGroups()}
      defaultValue={rowToFormValue(settings as unknown as Record<string, unknown>)}
      version={settings.version}
      submitLabel="Save settings"
      toFormValue={rowToFormValue}
      save={async (value, version) => {
        await save.mutateAsync({ ...value, version: version ?? 1 });
      }}
      onDone={onClose}
      onCancel={onClose}
    />
  );
}

export function MissionEditor({ mission, onClose }: { mission: Mission; onClose: () => void }) {
  const save = useUpdateMissionMutation(mission.id);
  return (
    <EntityForm
      formId="mission-edit"
      schema={missionCreateSchema}
      groups={[
        {
          legend: "Mission",
          fields: [
            { name: "name", label: "Name", unit: "text", kind: "text", wide: true },
            { name: "description", label: "Description", unit: "text, optional", kind: "textarea", wide: true },
          ],
        },
      ]}
      defaultValue={{ name: mission.name, description: mission.description ?? "" }}
      version={mission.version}
      submitLabel="Save mission"
      toFormValue={(cur) => ({ name: cur.name, description: cur.description ?? "" })}
      save={async (value, version) => {
        await save.mutateAsync({ ...value, description: value.description ?? "", version: version ?? 1 });
      }}
      onDone={onClose}
      onCancel={onClose}
    />
  );
}
