import type { FindingsCollector } from "../findings-collector";
import { fBand, fDB, fGHz, fMW } from "../format";
import type { OffsetState } from "../offset-state";

const LASER_TERMS = [
  { term: "carrier-floor", laser: "carrier", kind: "broadband floor" },
  { term: "lo-floor", laser: "LO", kind: "broadband floor" },
  { term: "carrier-rin", laser: "carrier", kind: "relative intensity noise" },
  { term: "lo-rin", laser: "LO", kind: "relative intensity noise" },
] as const;

/** A ratio written for people: 3 significant digits. */
const times = (v: number) => String(Number(v.toPrecision(3)));

/**
 * The noise-budget rules of the chain (docs/plan-format.md §14.6), neither
 * of which depends on the channel: `thermal-noise-limited` (the detector's
 * current noise above a third of the LO's shot noise, 2q·R·P_LO < 3·i_n²)
 * and `laser-noise-dominates` (a laser noise term above the shot noise of
 * the LO and the carrier together), one finding per laser term. Only for a
 * chain with a noise budget; skipped in map-only mode.
 */
export function noiseRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, mapOnly } = at;
  const n = ctx.noise;
  if (mapOnly || !n) return;
  const d = ctx.detector;
  const thermal = n.ratios["detector-noise"];
  if (d.responsivityAPerW !== null && d.noiseCurrentPAPerRtHz !== null && thermal > 1 / 3) {
    const needMW = ctx.loMW * thermal * 3;
    out.add(
      "thermal-noise-limited",
      null,
      `The ${d.noiseCurrentPAPerRtHz} pA/√Hz current noise of detector ${d.id} is ${times(thermal)}× the shot noise of the ${fMW(ctx.loMW)} mW LO (i_n²/(2q·R·P_LO) at ${d.responsivityAPerW} A/W), above a third: the detector, not the LO, sets much of the floor. About ${fMW(needMW)} mW of LO would bring it to a third.`,
      {
        ratio: thermal,
        loMW: ctx.loMW,
        responsivityAPerW: d.responsivityAPerW,
        noiseCurrentPAPerRtHz: d.noiseCurrentPAPerRtHz,
      },
    );
  }
  const shot = 1 + n.ratios["carrier-shot-noise"];
  for (const t of LASER_TERMS) {
    const ratio = n.ratios[t.term];
    if (!(ratio > shot)) continue;
    const offset =
      t.term === "carrier-floor"
        ? {
            text: `${fGHz(Math.abs(ctx.modeCentre))} GHz from the carrier, where the signal is`,
            GHz: Math.abs(ctx.modeCentre),
          }
        : t.term === "lo-floor"
          ? { text: `${fGHz(Math.abs(at.L))} GHz from the LO, where the residual carrier is`, GHz: Math.abs(at.L) }
          : { text: `the IF offsets (${fBand(ctx.detectorBand)})`, GHz: null };
    out.add(
      "laser-noise-dominates",
      null,
      `The ${t.kind} of the ${t.laser} laser of pair ${ctx.laser.id} at ${offset.text} adds ${times(ratio / shot)}× (${fDB(10 * Math.log10(ratio / shot))} dB) the shot noise of the LO and carrier together; it, not the shot noise, limits the receiver.`,
      {
        laser: ctx.laser.id,
        source: t.laser === "LO" ? "lo" : "carrier",
        term: t.term,
        offsetGHz: offset.GHz,
        ratioToShot: ratio / shot,
      },
    );
  }
}
