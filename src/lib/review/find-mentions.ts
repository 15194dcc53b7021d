export interface Mentionable {
  userId: string;
  email: string;
  name: string;
}

const EMAIL = /@([A-Za-z0-9._%+-]+@[A-Za-z0-9-]+(?:\.[A-Za-z0-9-]+)+)/g;

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

/**
 * The team members a comment mentions, in the order they are first
 * mentioned: `@alice@example.org` (the e-mail address, case-insensitive) or
 * `@Alice Smith` (the member's name, case-insensitive, not followed by a
 * letter or digit; the longest matching name wins). Unknown mentions are
 * ignored.
 */
export function findMentions(text: string, members: readonly Mentionable[]): Mentionable[] {
  const hits: { at: number; member: Mentionable }[] = [];
  const byEmail = new Map(members.map((m) => [m.email.toLowerCase(), m]));
  const taken = new Set<number>();
  for (const m of text.matchAll(EMAIL)) {
    const member = byEmail.get(m[1]!.toLowerCase());
    if (member) {
      hits.push({ at: m.index!, member });
      taken.add(m.index!);
    }
  }
  const named = [...members].filter((m) => m.name.trim() !== "").sort((a, b) => b.name.length - a.name.length);
  const claimed: [number, number][] = [];
  for (const member of named) {
    const re = new RegExp(`@${escapeRegExp(member.name.trim())}(?![\\p{L}\\p{N}])`, "giu");
    for (const m of text.matchAll(re)) {
      const at = m.index!;
      if (taken.has(at) || claimed.some(([s, e]) => at >= s && at < e)) continue;
      claimed.push([at, at + m[0].length]);
      hits.push({ at, member });
    }
  }
  hits.sort((x, y) => x.at - y.at);
  const seen = new Set<string>();
  const out: Mentionable[] = [];
  for (const h of hits) {
    if (seen.has(h.member.userId)) continue;
    seen.add(h.member.userId);
    out.push(h.member);
  }
  return out;
}
