import type { Collection } from "@/queries/keys";
import type { Mission, Settings } from "@/queries/types";
import { Drawer } from "../drawer";
import { EntityEditor, KIND_LABEL, MissionEditor, SettingsEditor, type Refs } from "../entity-editor";

/** What the overview's drawer edits: a row of a collection (null: a new one), the settings or the mission. */
export type Editing =
  | { kind: Collection; row: (Record<string, unknown> & { id: string; version: number }) | null }
  | { kind: "settings" }
  | { kind: "mission" };

/** The drawer with the editor of what is being edited. */
export function EditingDrawer({
  editing,
  missionId,
  mission,
  settings,
  refs,
  close,
}: {
  editing: Editing;
  missionId: string;
  mission: Mission | undefined;
  settings: Settings | undefined;
  refs: Refs;
  close: () => void;
}) {
  return editing.kind === "mission" ? (
    mission ? (
      <Drawer title="Mission" onClose={close}>
        <MissionEditor mission={mission} onClose={close} />
      </Drawer>
    ) : null
  ) : editing.kind === "settings" ? (
    settings ? (
      <Drawer title="Check settings" onClose={close}>
        <SettingsEditor missionId={missionId} settings={settings} onClose={close} />
      </Drawer>
    ) : null
  ) : (
    <Drawer
      title={
        editing.row ? `Edit ${KIND_LABEL[editing.kind]} ${String(editing.row.key)}` : `New ${KIND_LABEL[editing.kind]}`
      }
      onClose={close}
    >
      <EntityEditor missionId={missionId} kind={editing.kind} row={editing.row} refs={refs} onClose={close} />
    </Drawer>
  );
}
