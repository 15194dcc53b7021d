import type { ActivityEntry, Settings } from "@/queries/types";
import { formatAge, formatNumber } from "../format";
import { buttonClass, Card, Spinner } from "../ui";

/** The check settings (with their edit control) and the mission's recent changes. */
export function SettingsCard({
  settings,
  settingsError,
  activity,
  canEdit,
  onEdit,
}: {
  settings: Settings | undefined;
  settingsError: Error | null;
  activity: ActivityEntry[] | undefined;
  canEdit: boolean;
  onEdit: () => void;
}) {
  return (
    <Card
      title="Check settings"
      actions={
        canEdit && settings ? (
          <button type="button" className={buttonClass.quiet} onClick={onEdit}>
            Edit
          </button>
        ) : null
      }
    >
      {settings ? (
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
          <dt className="text-ink-soft">Guard band</dt>
          <dd className="tabular-nums">{formatNumber(settings.guardMHz, 1)} MHz</dd>
          <dt className="text-ink-soft">Image rejection</dt>
          <dd className="tabular-nums">{formatNumber(settings.imageRejectionDB, 1)} dB</dd>
          <dt className="text-ink-soft">Spur order</dt>
          <dd className="tabular-nums">up to {settings.spurMaxOrder}</dd>
          <dt className="text-ink-soft">Lock replica limit</dt>
          <dd className="tabular-nums">{formatNumber(settings.replicaLimitDB, 1)} dB</dd>
        </dl>
      ) : settingsError ? (
        <p className="text-sm text-sev-error">{settingsError.message}</p>
      ) : (
        <Spinner label="Loading…" />
      )}
      <h3 className="mt-5 border-t border-ink/10 pt-3 text-sm font-semibold">Recent changes</h3>
      {activity && activity.length === 0 ? <p className="text-sm text-ink-soft">No changes yet.</p> : null}
      <ol className="mt-1 space-y-1.5 text-sm" data-testid="activity">
        {(activity ?? []).slice(0, 8).map((a, i) => (
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
  );
}
