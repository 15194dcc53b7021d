import type { UnresolvedMention } from "./resolve-mentions";

/** The field error for unresolved mentions, naming each one ("no team member is called @erin; …"), or null. */
export function unresolvedMentionsMessage(unresolved: readonly UnresolvedMention[]): string | null {
  if (unresolved.length === 0) return null;
  return unresolved
    .map((u) =>
      u.candidates.length > 1
        ? `${u.written} fits ${u.candidates.join(" and ")}: write the full name or the e-mail address`
        : `no team member is called ${u.written}`,
    )
    .join("; ");
}
