import type { FindingsCollector } from "../findings-collector";
import { fBand, fDB, fGHz, fMHz, pair } from "../format";
import { insideOf, outsideBy } from "../intervals";
import { hasEnvelope, whereText } from "../envelope-text";
import type { OffsetState } from "../offset-state";
import { exceeds } from "../tolerance";

/**
 * The passband rules, none of which depends on L (docs/plan-format.md
 * §4.1 "The rules"): `band-outside-rf-input`, `mode-detuned` (on the worst
 * mode response over the operating envelope, §12.5) and
 * `band-wider-than-mode`, per channel. Skipped in map-only mode.
 */
export function passbandRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, mapOnly } = at;
  if (mapOnly) return;
  const chainId = ctx.chain.id;
  const halfDelta = ctx.delta / 2;
  at.channels.forEach(({ ch, envelope }, i) => {
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
    // mode-detuned on the worst mode response over the operating envelope (docs/plan-format.md §12.5)
    const mode = envelope.mode;
    if (mode.detunedCentres.length) {
      const responseDB = 10 * Math.log10(mode.response);
      const text = hasEnvelope(at.box)
        ? `Passband centre ${fGHz(mode.passbandCentre)} GHz of ${id} is received up to ${fMHz(mode.detuning)} MHz from the centre of mode ${ctx.nStar} (${fGHz(Math.abs(ctx.modeCentre))} GHz) over the operating envelope (${whereText(at.box, mode)}), more than half the ${fMHz(ctx.delta)} MHz linewidth (${fMHz(mode.detuning - halfDelta)} MHz too far); the mode passes only ${fDB(responseDB)} dB there.`
        : `Passband centre ${fGHz(mode.passbandCentre)} GHz of ${id} is ${fMHz(mode.detuning)} MHz from the centre of mode ${ctx.nStar} (${fGHz(Math.abs(ctx.modeCentre))} GHz), more than half the ${fMHz(ctx.delta)} MHz linewidth (${fMHz(mode.detuning - halfDelta)} MHz too far); the mode passes only ${fDB(responseDB)} dB there.`;
      out.add("mode-detuned", i, text, {
        passbandCentresGHz: mode.detunedCentres,
        modeCentreGHz: Math.abs(ctx.modeCentre),
        detuningMHz: mode.detuning * 1000,
        halfLinewidthMHz: halfDelta * 1000,
        responseDB,
      });
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
