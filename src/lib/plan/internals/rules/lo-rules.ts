import type { FindingsCollector } from "../findings-collector";
import { fBand, fGHz, fMHz, pair } from "../format";
import { type Interval, insideOf, outsideBy } from "../intervals";
import type { OffsetState } from "../offset-state";
import { bandHoldingLo } from "../slot";
import { TOL, exceeds } from "../tolerance";

/**
 * The LO rules (docs/plan-format.md §4.1 "The rules"): `lo-uncovered` and `lo-off-step`
 * for the chain, `lo-in-band` and `dsb-lo-off-centre` per channel.
 */
export function loRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, L, mapOnly } = at;
  const window: Interval = [L - ctx.D, L + ctx.D];
  if (!ctx.reach.some((r) => insideOf(window, r))) {
    let short = Infinity;
    for (const r of ctx.reach) short = Math.min(short, outsideBy(window, r));
    const reachText = ctx.reach.length ? ctx.reach.map((r) => fBand(r)).join(", ") : "no interval at all";
    out.add(
      "lo-uncovered",
      null,
      ctx.reach.length
        ? `The LO at ${fGHz(L)} GHz with its ±${fMHz(ctx.D)} MHz drift spans ${fBand(window)}, which is not inside one reach interval of laser ${ctx.laser.id} (${reachText}); it reaches ${fMHz(short)} MHz beyond the nearest one.`
        : `Laser ${ctx.laser.id} has no reach interval, so the LO at ${fGHz(L)} GHz cannot be set.`,
      {
        loGHz: L,
        driftGHz: ctx.D,
        windowGHz: pair(window),
        reachGHz: ctx.reach.map(pair),
        shortGHz: Number.isFinite(short) ? short : null,
      },
    );
  }
  if (!mapOnly && ctx.step > 0) {
    const nearest = Math.round(L / ctx.step) * ctx.step;
    const off = Math.abs(L - nearest);
    if (off > TOL) {
      out.add(
        "lo-off-step",
        null,
        `The LO offset ${fGHz(L)} GHz is not a multiple of the ${fMHz(ctx.step)} MHz tuning step of laser ${ctx.laser.id}; the nearest settable offset is ${fGHz(nearest)} GHz (${fMHz(off)} MHz away).`,
        { loGHz: L, stepMHz: ctx.laser.stepMHz, nearestGHz: nearest, offMHz: off * 1000 },
      );
    }
  }
  at.channels.forEach(({ ch, geo }, i) => {
    const id = ch.channel.id;
    if (!geo) {
      const band = bandHoldingLo(ch, L) as Interval;
      const margin = Math.min(L - band[0], band[1] - L);
      out.add(
        "lo-in-band",
        i,
        `The LO at ${fGHz(L)} GHz lies inside the optical band ${fBand(band)} of ${id}, so the channel has no IF slot; the LO must move at least ${fMHz(margin)} MHz to reach the band edge.`,
        { loGHz: L, bandGHz: pair(band), marginGHz: margin },
      );
    }
    if (!mapOnly && ch.dsb) {
      const centre = ctx.s * ch.channel.centerGHz;
      const off = Math.abs(L - centre);
      const allowed = Math.max(ctx.step / 2, 0.0005);
      if (exceeds(off, allowed)) {
        out.add(
          "dsb-lo-off-centre",
          i,
          `The LO at ${fGHz(L)} GHz is ${fMHz(off)} MHz from the centre ${fGHz(centre)} GHz of the double-sideband channel ${id}; at most ${fMHz(allowed)} MHz is allowed (${fMHz(off - allowed)} MHz too far), and the off-centre LO widens the IF slot.`,
          { loGHz: L, centreGHz: centre, offsetMHz: off * 1000, allowedMHz: allowed * 1000 },
        );
      }
    }
  });
}
