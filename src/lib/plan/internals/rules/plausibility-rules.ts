import type { FindingsCollector } from "../findings-collector";
import type { OffsetState } from "../offset-state";

/**
 * The edges of the telecom bands, THz: the O band starts at 1260 nm and the
 * U band ends at 1675 nm (ITU-T G-series Supplement 39, the table of the
 * O, E, S, C, L and U bands; from memory), f = c/λ with c = 299 792 458 m/s.
 */
export const TELECOM_BAND_THZ: readonly [number, number] = [299_792.458 / 1675, 299_792.458 / 1260];
/**
 * A loaded Q above this is more than lithium niobate resonators have been
 * shown to reach: bulk LiNbO3 whispering-gallery discs reach a few 10⁸
 * (Ilchenko, Savchenkov, Matsko and Maleki, Phys. Rev. Lett. 92, 043903
 * (2004), from memory); 10⁹ leaves a margin (common practice).
 */
export const LITHIUM_NIOBATE_MAX_Q = 1e9;
/** A receiver noise temperature above this is implausible for any radiometer receiver, K (the threshold; common practice). */
export const PLAUSIBLE_RECEIVER_MAX_K = 1e6;

const thz = (v: number) => String(Number(v.toPrecision(6)));

/**
 * The plausibility rules (ADR 030): warnings for values a bench can produce
 * but a microwave-photonic radiometer rarely uses, in the product's words —
 * `carrier-outside-telecom` (per chain, the laser pair's carrier outside
 * the telecom bands), `q-beyond-lithium-niobate` (per chain, its resonator's
 * loaded Q above what lithium niobate reaches) and `receiver-noise-implausible`
 * (per channel, a receiver noise temperature above 10⁶ K). None depends on
 * L; skipped in map-only mode.
 */
export function plausibilityRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, mapOnly } = at;
  if (mapOnly) return;
  const f = ctx.laser.carrierTHz;
  const [lo, hi] = TELECOM_BAND_THZ;
  if (f < lo || f > hi)
    out.add(
      "carrier-outside-telecom",
      null,
      `The carrier of laser pair ${ctx.laser.id}, ${thz(f)} THz, lies outside the telecom bands (${thz(lo)}–${thz(hi)} THz, 1675–1260 nm), where the modulators, resonators and photodiodes of a microwave-photonic receiver are made; check the value and its unit.`,
      { carrierTHz: f, telecomTHz: [lo, hi] },
    );
  const q = ctx.resonator.loadedQ;
  if (q > LITHIUM_NIOBATE_MAX_Q)
    out.add(
      "q-beyond-lithium-niobate",
      null,
      `Resonator ${ctx.resonator.id} has a loaded Q of ${q.toPrecision(3)}, above the 1e9 that lithium niobate resonators have been shown to reach; check the value, or the resonator's material.`,
      { loadedQ: q, limit: LITHIUM_NIOBATE_MAX_Q },
    );
  at.channels.forEach(({ ch }, i) => {
    const t = ch.channel.receiverK;
    if (t > PLAUSIBLE_RECEIVER_MAX_K)
      out.add(
        "receiver-noise-implausible",
        i,
        `The receiver noise temperature of ${ch.channel.id}, ${t.toPrecision(3)} K, is above 1e6 K, far beyond any radiometer receiver; check the value and its unit (K).`,
        { receiverK: t, limit: PLAUSIBLE_RECEIVER_MAX_K },
      );
  });
}
