import type { FindingsCollector } from "../findings-collector";
import { fBand, fDB, fGHz, fMHz, pair } from "../format";
import { insideOf, outsideBy } from "../intervals";
import type { OffsetState } from "../offset-state";
import { exceeds } from "../tolerance";

/**
 * The passband rules, none of which depends on L (docs/plan-format.md
 * §4.1 "The rules"): `band-outside-rf-input`, `mode-detuned` and
 * `band-wider-than-mode`, per channel. Skipped in map-only mode.
 */
export function passbandRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, mapOnly } = at;
  if (mapOnly) return;
  const chainId = ctx.chain.id;
  const halfDelta = ctx.delta / 2;
  at.channels.forEach(({ ch }, i) => {
    const id = ch.channel.id;
    const outside = ch.passbands.filter((p) => !insideOf(p, ctx.rfInput));
    if (outside.length) {
      const worst = Math.max(...outside.map((p) => outsideBy(p, ctx.rfInput)));
      out.add(
        "band-outside-rf-input",
        i,
        `Passband ${outside.map(fBand).join(" and ")} of ${id} is not inside the RF input ${fBand(ctx.rfInput)} of chain ${chainId}; it reaches ${fMHz(worst)} MHz beyond it.`,
        { passbandsGHz: outside.map(pair), rfInputGHz: pair(ctx.rfInput), outsideMHz: worst * 1000 },
      );
    }
    const detuned = ch.centres
      .map((f) => ({ f, detune: Math.abs(ctx.s * f - ctx.modeCentre) }))
      .filter((d) => exceeds(d.detune, halfDelta));
    if (detuned.length) {
      const worst = detuned.reduce((p, q) => (q.detune > p.detune ? q : p));
      const response = 1 / (1 + ((2 * worst.detune) / ctx.delta) ** 2);
      out.add(
        "mode-detuned",
        i,
        `Passband centre ${fGHz(worst.f)} GHz of ${id} is ${fMHz(worst.detune)} MHz from the centre of mode ${ctx.nStar} (${fGHz(Math.abs(ctx.modeCentre))} GHz), more than half the ${fMHz(ctx.delta)} MHz linewidth (${fMHz(worst.detune - halfDelta)} MHz too far); the mode passes only ${fDB(10 * Math.log10(response))} dB there.`,
        {
          passbandCentresGHz: detuned.map((d) => d.f),
          modeCentreGHz: Math.abs(ctx.modeCentre),
          detuningMHz: worst.detune * 1000,
          halfLinewidthMHz: halfDelta * 1000,
          responseDB: 10 * Math.log10(response),
        },
      );
    }
    if (exceeds(ch.B, ctx.delta)) {
      out.add(
        "band-wider-than-mode",
        i,
        `The ${fMHz(ch.B)} MHz passband of ${id} is wider than the ${fMHz(ctx.delta)} MHz mode linewidth (by ${fMHz(ch.B - ctx.delta)} MHz): the mode, not the channel filter, shapes the response.`,
        { bandwidthMHz: ch.B * 1000, linewidthMHz: ctx.delta * 1000 },
      );
    }
  });
}
