import type { FindingsCollector } from "../findings-collector";
import { fDB, fMW } from "../format";
import type { OffsetState } from "../offset-state";
import { exceeds } from "../tolerance";

/**
 * The optical power rules of the chain, neither of which depends on L
 * (docs/plan-format.md §4.1 "The rules"): `carrier-dominates-lo` and `pd-overload`.
 * Skipped in map-only mode.
 */
export function powerRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, mapOnly } = at;
  if (mapOnly) return;
  if (exceeds(ctx.carrierMW, ctx.loMW)) {
    out.add(
      "carrier-dominates-lo",
      null,
      `Up to ${fMW(ctx.carrierMW)} mW of residual carrier reaches detector ${ctx.detector.id}, ${fDB(10 * Math.log10(ctx.carrierMW / ctx.loMW))} dB more than the ${fMW(ctx.loMW)} mW LO, so the carrier, not the LO, sets the shot-noise floor; that much more carrier rejection or LO power would balance them.`,
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
