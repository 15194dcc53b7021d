"use client";
import { useRef } from "react";

export interface TeamOption {
  id: string;
  name: string;
  role: string;
}

/**
 * Chooses the active team. A plain form posting to a server action (it works
 * without JavaScript through the button; with JavaScript a change submits).
 */
export function TeamSwitcher({
  teams,
  activeId,
  action,
}: {
  teams: TeamOption[];
  activeId: string | null;
  action: (formData: FormData) => Promise<void>;
}) {
  const ref = useRef<HTMLFormElement>(null);
  return (
    <form ref={ref} action={action} className="flex items-center gap-1.5">
      <label htmlFor="team-switcher" className="sr-only">
        Active team
      </label>
      <select
        id="team-switcher"
        name="teamId"
        defaultValue={activeId ?? ""}
        onChange={() => ref.current?.requestSubmit()}
        className="max-w-[22rem] rounded border border-white/30 bg-ink-soft px-2 py-1 text-sm text-white"
      >
        {activeId ? null : (
          <option value="" disabled>
            Choose a team
          </option>
        )}
        {teams.map((t) => (
          <option key={t.id} value={t.id}>
            {t.name} ({t.role})
          </option>
        ))}
        <option value="__new">+ New team…</option>
      </select>
      <noscript>
        <button type="submit" className="rounded border border-white/30 px-2 py-1 text-xs text-white">
          Switch
        </button>
      </noscript>
    </form>
  );
}
