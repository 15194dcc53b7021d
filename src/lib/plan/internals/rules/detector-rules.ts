import type { FindingsCollector } from "../findings-collector";
import { fBand, fMHz, pair } from "../format";
import { insideOf, outsideBy } from "../intervals";
import type { OffsetState } from "../offset-state";

/** The detector rule (docs/plan-format.md §4.1 "The rules"): `if-outside-detector`, per channel with a slot. */
export function detectorRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx } = at;
  at.channels.forEach(({ ch, geo }, i) => {
    if (geo && !insideOf(geo.occupied, ctx.detectorBand)) {
      out.add(
        "if-outside-detector",
        i,
        `Occupied IF band ${fBand(geo.occupied)} of ${ch.channel.id} is not inside the ${fBand(ctx.detectorBand)} band of detector ${ctx.detector.id}; it reaches ${fMHz(outsideBy(geo.occupied, ctx.detectorBand))} MHz beyond it.`,
        {
          occupiedGHz: pair(geo.occupied),
          detectorGHz: pair(ctx.detectorBand),
          outsideMHz: outsideBy(geo.occupied, ctx.detectorBand) * 1000,
        },
      );
    }
  });
}
