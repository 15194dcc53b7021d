import type { FindingsCollector } from "../findings-collector";
import { fBand, fMHz, pair } from "../format";
import { gap, withinGuard } from "../intervals";
import type { ChannelAtOffset, OffsetState } from "../offset-state";

/**
 * The pair rule `slot-overlap` (docs/plan-format.md §4.1 "The rules"): occupied IF
 * bands of two channels within guard, listed under the first of the pair.
 * A warning when the chain has `sharedIf` (then skipped in map-only mode,
 * where only errors count).
 */
export function overlapRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, mapOnly, channels } = at;
  const sharedIf = ctx.chain.sharedIf;
  if (mapOnly && sharedIf) return;
  const guard = ctx.guard;
  for (let i = 0; i < channels.length; i++) {
    const gi = (channels[i] as ChannelAtOffset).geo;
    if (!gi) continue;
    for (let j = i + 1; j < channels.length; j++) {
      const gj = (channels[j] as ChannelAtOffset).geo;
      if (!gj || !withinGuard(gi.occupied, gj.occupied, guard)) continue;
      const g = gap(gi.occupied, gj.occupied);
      const a = (channels[i] as ChannelAtOffset).ch.channel.id;
      const b = (channels[j] as ChannelAtOffset).ch.channel.id;
      out.add(
        "slot-overlap",
        i,
        `Occupied IF bands of ${a} (${fBand(gi.occupied)}) and ${b} (${fBand(gj.occupied)}) ${g >= 0 ? `are ${fMHz(g)} MHz apart` : `overlap by ${fMHz(-g)} MHz`}; the guard is ${fMHz(guard)} MHz (${fMHz(guard - g)} MHz short)${sharedIf ? "; the chain cuts its channels from one shared IF, so this is a warning" : ""}.`,
        {
          other: b,
          occupiedGHz: pair(gi.occupied),
          otherOccupiedGHz: pair(gj.occupied),
          gapMHz: g * 1000,
          guardMHz: guard * 1000,
        },
        sharedIf ? "warning" : "error",
      );
    }
  }
}
