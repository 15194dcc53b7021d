import type { FindingsCollector } from "../findings-collector";
import { fBand, fMHz, pair } from "../format";
import { insideOf, outsideBy } from "../intervals";
import type { OffsetState } from "../offset-state";

/**
 * The detector rule (docs/plan-format.md §4.1 "The rules"): `if-outside-detector`,
 * per channel with a slot; also for a channel whose occupied-band IF filter
 * cannot be built because its occupied band reaches 0 GHz (§12.3).
 */
export function detectorRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx } = at;
  at.channels.forEach(({ ch, geo, envelope }, i) => {
    if (!geo) return;
    const outside = !insideOf(geo.occupied, ctx.detectorBand);
    if (outside || envelope.filterImpossible) {
      const filter = envelope.filterImpossible
        ? ` Its IF filter is to pass the occupied band, which reaches down to ${fMHz(geo.occupied[0])} MHz: such a filter cannot be built (the slot starts ${fMHz(geo.slot[0])} MHz above 0, no more than the ${fMHz(ctx.D)} MHz drift).`
        : "";
      const text = outside
        ? `Occupied IF band ${fBand(geo.occupied)} of ${ch.channel.id} is not inside the ${fBand(ctx.detectorBand)} band of detector ${ctx.detector.id}; it reaches ${fMHz(outsideBy(geo.occupied, ctx.detectorBand))} MHz beyond it.${filter}`
        : `Occupied IF band ${fBand(geo.occupied)} of ${ch.channel.id} touches 0 GHz.${filter}`;
      out.add("if-outside-detector", i, text, {
        occupiedGHz: pair(geo.occupied),
        detectorGHz: pair(ctx.detectorBand),
        outsideMHz: outsideBy(geo.occupied, ctx.detectorBand) * 1000,
      });
    }
  });
}
