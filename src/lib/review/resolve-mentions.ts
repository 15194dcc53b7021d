import type { Mentionable } from "./find-mentions";

export interface UnresolvedMention {
  /** The mention as written, e.g. `@erin` or `@"Erin Engineer"`. */
  written: string;
  /** Where it starts in the text. */
  at: number;
  /** Several members fit (e.g. two people called Erin): their names. Empty when nobody fits. */
  candidates: string[];
}

export interface ResolvedMentions {
  /** The members mentioned, in the order first mentioned, each once. */
  mentioned: Mentionable[];
  /** Mentions that name nobody, or more than one person. */
  unresolved: UnresolvedMention[];
}

const EMAIL = /@([A-Za-z0-9._%+-]+@[A-Za-z0-9-]+(?:\.[A-Za-z0-9-]+)+)/y;
const WORD = /[\p{L}\p{N}][\p{L}\p{N}._-]*/uy;
/** A character that, just before `@`, makes it part of a word or an e-mail address rather than a mention. */
const WORDISH = /[\p{L}\p{N}._%+-]/u;
const NAME_END = /[\p{L}\p{N}]/u;

const lower = (s: string) => s.trim().toLocaleLowerCase("en");

/**
 * Every `@` mention of a comment, resolved against the team (ADR 030):
 * `@"Erin Engineer"` (a quoted full name), `@erin@example.org` (an e-mail
 * address), `@Erin Engineer` (a full name, the longest that fits, ending at a
 * word boundary), and `@erin` (one word: a member's first name or the part
 * of their e-mail address before the @, when exactly one member fits).
 * Case does not matter. An `@` inside a word or an address (`bob@site`) and
 * a lone `@` are not mentions. Anything else after an `@` is unresolved:
 * nobody fits, or several people do.
 */
export function resolveMentions(text: string, members: readonly Mentionable[]): ResolvedMentions {
  const byEmail = new Map(members.map((m) => [lower(m.email), m]));
  const byName = [...members].filter((m) => m.name.trim() !== "").sort((a, b) => b.name.length - a.name.length);
  const hits: Mentionable[] = [];
  const unresolved: UnresolvedMention[] = [];
  for (let at = text.indexOf("@"); at !== -1; at = text.indexOf("@", at + 1)) {
    if (at > 0 && WORDISH.test(text[at - 1]!)) continue;
    const rest = text.slice(at + 1);
    if (rest.startsWith('"')) {
      const close = rest.indexOf('"', 1);
      const name = close === -1 ? rest.slice(1) : rest.slice(1, close);
      const written = `@"${name}${close === -1 ? "" : '"'}`;
      const fits = members.filter((m) => lower(m.name) === lower(name));
      if (fits.length === 1) hits.push(fits[0]!);
      else unresolved.push({ written, at, candidates: fits.map((m) => m.name) });
      continue;
    }
    EMAIL.lastIndex = at;
    const email = EMAIL.exec(text);
    if (email) {
      const m = byEmail.get(lower(email[1]!));
      if (m) hits.push(m);
      else unresolved.push({ written: email[0], at, candidates: [] });
      continue;
    }
    const full = byName.find((m) => {
      const name = m.name.trim();
      const after = rest.charAt(name.length);
      return lower(rest.slice(0, name.length)) === lower(name) && !(after && NAME_END.test(after));
    });
    if (full) {
      hits.push(full);
      continue;
    }
    WORD.lastIndex = 0;
    const word = WORD.exec(rest)?.[0]?.replace(/[._-]+$/, "");
    if (!word) continue;
    const w = lower(word);
    const fits = members.filter(
      (m) => lower(m.name.split(/\s+/)[0] ?? "") === w || lower(m.email.split("@")[0]!) === w,
    );
    const distinct = [...new Map(fits.map((m) => [m.userId, m])).values()];
    if (distinct.length === 1) hits.push(distinct[0]!);
    else unresolved.push({ written: `@${word}`, at, candidates: distinct.map((m) => m.name) });
  }
  const seen = new Set<string>();
  const mentioned = hits.filter((m) => (seen.has(m.userId) ? false : (seen.add(m.userId), true)));
  return { mentioned, unresolved };
}
