/**
 * The identity of a finding across revisions: rule code, chain and channel.
 * Revisions store fresh finding rows, so a waiver or a comparison cannot use
 * row ids; the same rule failing on the same chain and channel is "the same
 * finding" even when its numbers move (docs/decisions/016-review-readings.md).
 */
export function findingKeyOf(f: { code: string; chain: string; channel: string | null }): string {
  return `${f.code}|${f.chain}|${f.channel ?? ""}`;
}
