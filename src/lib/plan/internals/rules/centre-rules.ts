import type { FindingsCollector } from "../findings-collector";
import { fGHz, fMHz } from "../format";
import { whereText } from "../envelope-text";
import type { OffsetState } from "../offset-state";
import { exceeds } from "../tolerance";

/**
 * The centre rule (docs/plan-format.md §12.5 "Rules"): `centre-drift`, per
 * channel with a `centreToleranceMHz`, when the effective centre of one of
 * its passbands strays further than that from its nominal RF centre
 * somewhere in the operating envelope. It does not depend on L (skipped in
 * map-only mode) and is evaluated with or without a slot.
 */
export function centreRules(at: OffsetState, out: FindingsCollector): void {
  if (at.mapOnly) return;
  at.channels.forEach(({ ch, envelope }, i) => {
    const tol = ch.centreToleranceGHz;
    const c = envelope.centre;
    if (tol === null || c === null || !exceeds(c.error, tol)) return;
    out.add(
      "centre-drift",
      i,
      `The effective centre of passband ${fGHz(c.passbandCentre)} GHz of ${ch.channel.id} (the centroid of the mode's response over the received band) strays ${fMHz(c.error)} MHz from its nominal centre ${whereText(at.box, c)}; at most ${fMHz(tol)} MHz is allowed (${fMHz(c.error - tol)} MHz too far).`,
      {
        passbandCentreGHz: c.passbandCentre,
        centreErrorMHz: c.error * 1000,
        centreToleranceMHz: tol * 1000,
        loShiftMHz: c.u * 1000,
        temperatureOffsetK: c.t,
      },
    );
  });
}
