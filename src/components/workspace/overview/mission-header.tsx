import Link from "next/link";
import { api } from "@/queries/api";
import type { Mission } from "@/queries/types";
import { errorCountText } from "@/components/waivers";
import { formatAge, plural } from "../format";
import { buttonClass, ErrorNote, Spinner } from "../ui";

export interface MissionHeaderProps {
  missionId: string;
  mission: Mission | undefined;
  canEdit: boolean;
  canDelete: boolean;
  onEditMission: () => void;
  onDelete: () => void;
  deleting: boolean;
  deleteError: Error | null;
  /** The newest revision's number, or null before the first. */
  latest: number | null;
  /** The latest check's counts, or null while there is none. */
  counts: { error: number; warning: number; info: number } | null;
  /** How many of the errors carry a recorded waiver. */
  waivedErrors?: number;
  resultLoading: boolean;
  /** Something is being refetched after a change (the server re-checks). */
  busy: boolean;
}

/** The mission's title with its edit and delete controls, its revision line, and the links to its views and exports. */
export function MissionHeader({
  missionId,
  mission,
  canEdit,
  canDelete,
  onEditMission,
  onDelete,
  deleting,
  deleteError,
  latest,
  counts,
  waivedErrors = 0,
  resultLoading,
  busy,
}: MissionHeaderProps) {
  return (
    <header className="flex flex-wrap items-start justify-between gap-4">
      <div>
        <p className="text-xs text-ink-soft">
          <Link href="/missions" className="hover:underline">
            Missions
          </Link>{" "}
          /
        </p>
        <h1 className="flex items-baseline gap-2 text-2xl font-semibold tracking-tight">
          {mission?.name ?? "…"}
          {canEdit && mission ? (
            <button
              type="button"
              className={buttonClass.quiet}
              onClick={onEditMission}
              aria-label="Edit mission name and description"
            >
              Edit
            </button>
          ) : null}
          {canDelete && mission ? (
            <button
              type="button"
              className={buttonClass.quiet}
              onClick={onDelete}
              disabled={deleting}
              aria-label="Delete this mission"
            >
              {deleting ? "Deleting…" : "Delete"}
            </button>
          ) : null}
        </h1>
        {deleteError ? (
          <ErrorNote title="The mission was not deleted.">
            {deleteError.message} Reload the page to see its current state.
          </ErrorNote>
        ) : null}
        {mission?.description ? <p className="mt-0.5 max-w-2xl text-sm text-ink-soft">{mission.description}</p> : null}
        <p className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm" data-testid="revision-line">
          <span className="rounded bg-ink-faint px-1.5 py-0.5 text-xs font-medium uppercase tracking-wide">
            {mission?.status ?? "draft"}
          </span>
          <span>
            Revision{" "}
            <span className="font-semibold tabular-nums" data-testid="revision-number">
              {latest ?? "–"}
            </span>
          </span>
          {counts ? (
            <>
              <span
                className={counts.error > 0 && waivedErrors >= counts.error ? "text-emerald-800" : "text-sev-error"}
                data-testid="error-count"
              >
                {errorCountText(counts.error, waivedErrors)}
              </span>
              <span className="text-sev-warning">{plural(counts.warning, "warning")}</span>
              <span className="text-sev-info">{counts.info} info</span>
            </>
          ) : resultLoading ? null : (
            <span className="text-ink-soft">not checked yet</span>
          )}
          <span className="text-ink-soft">changed {formatAge(mission?.updatedAt)}</span>
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
  );
}
