import type { FindingsCollector } from "../findings-collector";
import { fDB, fMW } from "../format";
import type { OffsetState } from "../offset-state";
import { exceeds } from "../tolerance";

/** The shot-noise penalty of the carrier, `(P_c + P_LO)/P_LO`, as "×3.48 (+5.4 dB)". */
function penaltyText(carrierMW: number, loMW: number): string {
  const p = (carrierMW + loMW) / loMW;
  return `×${Number(p.toPrecision(3))} (+${Number((10 * Math.log10(p)).toFixed(1))} dB)`;
}

/**
 * The optical power rules of the chain, neither of which depends on L
 * (docs/plan-format.md §4.1 "The rules"): `carrier-dominates-lo` and `pd-overload`.
 * Skipped in map-only mode. With a noise budget, or a carrier worked out
 * from the coupling, `carrier-dominates-lo` also states its shot-noise
 * penalty `(P_c + P_LO)/P_LO` (docs/plan-format.md §14.6); without them its
 * message is the one of version 1, word for word.
 */
export function powerRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, mapOnly } = at;
  if (mapOnly) return;
  if (exceeds(ctx.carrierMW, ctx.loMW)) {
    out.add(
      "carrier-dominates-lo",
      null,
      ctx.noise === null && ctx.throughTransmission === null
        ? `Up to ${fMW(ctx.carrierMW)} mW of residual carrier reaches detector ${ctx.detector.id}, ${fDB(10 * Math.log10(ctx.carrierMW / ctx.loMW))} dB more than the ${fMW(ctx.loMW)} mW LO, so the carrier, not the LO, sets the shot-noise floor; that much more carrier rejection or LO power would balance them.`
        : `${ctx.throughTransmission === null ? "Up to " : ""}${fMW(ctx.carrierMW)} mW of residual carrier reaches detector ${ctx.detector.id}, ${fDB(10 * Math.log10(ctx.carrierMW / ctx.loMW))} dB more than the ${fMW(ctx.loMW)} mW LO, so the carrier, not the LO, sets the shot-noise floor: it raises the shot noise ${penaltyText(ctx.carrierMW, ctx.loMW)} over the LO's alone. That much more carrier rejection or LO power would balance them.`,
      { carrierMW: ctx.carrierMW, loMW: ctx.loMW },
    );
  }
  if (exceeds(ctx.pdMW, ctx.detector.maxInputMW)) {
    out.add(
      "pd-overload",
      null,
      `Each photodiode of detector ${ctx.detector.id} receives up to ${fMW(ctx.pdMW)} mW ((carrier ${fMW(ctx.carrierMW)} mW + LO ${fMW(ctx.loMW)} mW)/2), above its ${fMW(ctx.detector.maxInputMW)} mW limit by ${fMW(ctx.pdMW - ctx.detector.maxInputMW)} mW.`,
      { pdInputMW: ctx.pdMW, maxInputMW: ctx.detector.maxInputMW, carrierMW: ctx.carrierMW, loMW: ctx.loMW },
    );
  }
}
