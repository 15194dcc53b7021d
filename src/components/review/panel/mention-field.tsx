"use client";
import { useQuery } from "@tanstack/react-query";
import { useEffect, useId, useMemo, useRef, useState } from "react";
import { resolveMentions, unresolvedMentionsMessage, type Mentionable } from "@/lib/review";
import { apiFetch } from "@/queries/api";

/** The team's members, for completing and checking @mentions (GET /api/team, readable by every member). */
export function useTeamMembers() {
  return useQuery({
    queryKey: ["team", "members"],
    queryFn: async () => (await apiFetch<{ members: Mentionable[] }>("/api/team")).members,
    staleTime: 60_000,
  });
}

/** The `@word` being typed just before the caret, or null. */
function typedMention(text: string, caret: number): { start: number; query: string } | null {
  const m = /(^|[^\p{L}\p{N}._%+-])@([\p{L}\p{N}._-]*)$/u.exec(text.slice(0, caret));
  return m ? { start: caret - m[2]!.length - 1, query: m[2]! } : null;
}

/**
 * The comment text with @mention completion: typing `@` and a few letters
 * lists the team members whose name or e-mail address starts with them
 * (arrow keys and Enter or Tab pick one, Escape closes the list); below the
 * field, who will be notified, or a field error for a mention that names
 * nobody in the team (the server refuses it too).
 */
export function MentionField({
  id,
  value,
  onChange,
  selfUserId,
  errorId,
  onValidity,
}: {
  id: string;
  value: string;
  onChange: (v: string) => void;
  selfUserId?: string;
  errorId: string;
  onValidity: (ok: boolean) => void;
}) {
  const members = useTeamMembers();
  const ref = useRef<HTMLTextAreaElement>(null);
  const [caret, setCaret] = useState(0);
  const [active, setActive] = useState(0);
  const [closed, setClosed] = useState(false);
  const listId = useId();
  const list = useMemo(() => members.data ?? [], [members.data]);
  const typed = typedMention(value, caret);
  const options = useMemo(() => {
    if (!typed) return [];
    const q = typed.query.toLocaleLowerCase("en");
    return list
      .filter(
        (m) =>
          m.name
            .toLocaleLowerCase("en")
            .split(/\s+/)
            .some((w) => w.startsWith(q)) || m.email.startsWith(q),
      )
      .slice(0, 8);
  }, [typed, list]);
  const open = !closed && typed !== null && options.length > 0;
  const resolved = members.data ? resolveMentions(value, list) : null;
  const error = resolved ? unresolvedMentionsMessage(resolved.unresolved) : null;
  const notified = resolved?.mentioned.filter((m) => m.userId !== selfUserId) ?? [];
  useEffect(() => onValidity(error === null), [error, onValidity]);

  const pick = (m: Mentionable) => {
    if (!typed) return;
    const insert = `@${m.name.trim() || m.email} `;
    const next = value.slice(0, typed.start) + insert + value.slice(caret);
    onChange(next);
    const at = typed.start + insert.length;
    setCaret(at);
    setClosed(true);
    requestAnimationFrame(() => ref.current?.setSelectionRange(at, at));
  };

  return (
    <div className="relative">
      <textarea
        ref={ref}
        id={id}
        value={value}
        role="combobox"
        aria-expanded={open}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={open ? `${listId}-${active}` : undefined}
        aria-invalid={error ? true : undefined}
        aria-describedby={errorId}
        onChange={(e) => {
          onChange(e.target.value);
          setCaret(e.target.selectionStart);
          setClosed(false);
          setActive(0);
        }}
        onSelect={(e) => setCaret((e.target as HTMLTextAreaElement).selectionStart)}
        onKeyDown={(e) => {
          if (!open) return;
          if (e.key === "ArrowDown" || e.key === "ArrowUp") {
            e.preventDefault();
            setActive((a) => (a + (e.key === "ArrowDown" ? 1 : options.length - 1)) % options.length);
          } else if (e.key === "Enter" || e.key === "Tab") {
            e.preventDefault();
            pick(options[Math.min(active, options.length - 1)]!);
          } else if (e.key === "Escape") {
            e.preventDefault();
            setClosed(true);
          }
        }}
        rows={2}
        maxLength={5000}
        className="w-full rounded border border-slate-400 px-2 py-1 text-sm"
      />
      {open ? (
        <ul
          id={listId}
          role="listbox"
          aria-label="Team members"
          className="absolute left-0 z-20 mt-0.5 w-80 rounded border border-slate-300 bg-white py-1 text-sm shadow"
        >
          {options.map((m, i) => (
            <li
              key={m.userId}
              id={`${listId}-${i}`}
              role="option"
              aria-selected={i === active}
              onMouseDown={(e) => {
                e.preventDefault();
                pick(m);
              }}
              className={`cursor-pointer px-2 py-1 ${i === active ? "bg-slate-100" : ""}`}
            >
              {m.name} <span className="text-xs text-slate-600">{m.email}</span>
            </li>
          ))}
        </ul>
      ) : null}
      <p id={errorId} className="min-h-5 mt-0.5 text-xs" data-testid="mention-preview">
        {error ? (
          <span role="alert" className="text-rose-800">
            {error}.
          </span>
        ) : notified.length ? (
          <span className="text-slate-700">
            Will notify by e-mail: {notified.map((m) => `${m.name} (${m.email})`).join(", ")}
          </span>
        ) : null}
      </p>
    </div>
  );
}
