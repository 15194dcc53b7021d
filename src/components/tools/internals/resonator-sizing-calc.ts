import {
  freeSpectralRange,
  fsrShiftPerKelvin,
  groupIndex,
  type IndexModel,
  linewidthFromQ,
  loadedQFromLinewidth,
  modeShiftPerKelvin,
  radiusForFsr,
  wavelengthNmFromTHz,
} from "@/lib/optics";
import { LN_FIT_CARRIER_THZ, parseNumberField } from "../format";
import { attempt } from "./attempt";

/**
 * The working of the resonator sizing helper, from the text of its fields:
 * the group index (LiNbO3 fit or measured), radius ↔ FSR, the thermal
 * shifts of a mode and of the FSR, and loaded Q ↔ linewidth. Each step is
 * null until its inputs parse, and an `attempt` (value or message) after.
 */

export type IndexSource = "jundt" | "zelmon-e" | "zelmon-o" | "measured";

export const INDEX_SOURCES: Record<IndexSource, string> = {
  jundt: "LiNbO3 e-ray at temperature (Jundt 1997)",
  "zelmon-e": "LiNbO3 e-ray, 21 °C (Zelmon et al. 1997)",
  "zelmon-o": "LiNbO3 o-ray, 21 °C (Zelmon et al. 1997)",
  measured: "Measured group index",
};

/** The text of each of the helper's number fields. */
export interface SizingTexts {
  carrier: string;
  temp: string;
  radius: string;
  fsr: string;
  ng: string;
  q: string;
  lw: string;
}

/** The helper's choices: where the group index comes from and which way each pair is computed. */
export interface SizingChoices {
  source: IndexSource;
  direction: "fromRadius" | "fromFsr";
  qDirection: "fromQ" | "fromLinewidth";
}

export function resonatorSizing(text: SizingTexts, { source, direction, qDirection }: SizingChoices) {
  const carrier = parseNumberField(text.carrier, "Carrier", LN_FIT_CARRIER_THZ);
  const temp = parseNumberField(text.temp, "Temperature", { min: -50, max: 300 });
  const radius = parseNumberField(text.radius, "Radius", { min: 0, exclusiveMin: true });
  const fsrIn = parseNumberField(text.fsr, "FSR", { min: 0, exclusiveMin: true });
  const ngIn = parseNumberField(text.ng, "Group index", { min: 1 });
  const qIn = parseNumberField(text.q, "Loaded Q", { min: 0, exclusiveMin: true });
  const lwIn = parseNumberField(text.lw, "Linewidth", { min: 0, exclusiveMin: true });

  const index =
    carrier.ok && temp.ok
      ? attempt(() => {
          const lambdaUm = wavelengthNmFromTHz(carrier.value) / 1000;
          if (source === "measured")
            return { n: null as number | null, ng: ngIn.ok ? ngIn.value : Number.NaN, lambdaUm };
          const model: IndexModel =
            source === "jundt"
              ? { fit: "jundt", temperatureC: temp.value }
              : { fit: "zelmon", axis: source === "zelmon-e" ? "e" : "o" };
          const g = groupIndex(lambdaUm, model);
          return { n: g.n as number | null, ng: g.ng, lambdaUm };
        })
      : null;
  const ng = index?.ok && Number.isFinite(index.value.ng) ? index.value.ng : null;

  const sizing =
    ng !== null
      ? direction === "fromRadius"
        ? radius.ok
          ? attempt(() => ({ radiusUm: radius.value, fsrGHz: freeSpectralRange(radius.value, ng) }))
          : null
        : fsrIn.ok
          ? attempt(() => ({ radiusUm: radiusForFsr(fsrIn.value, ng), fsrGHz: fsrIn.value }))
          : null
      : null;
  const size = sizing?.ok ? sizing.value : null;

  const thermal =
    carrier.ok && temp.ok && size
      ? attempt(() => ({
          mode: modeShiftPerKelvin(carrier.value, temp.value),
          fsr: fsrShiftPerKelvin(size.fsrGHz, carrier.value, temp.value),
        }))
      : null;

  const qCalc = carrier.ok
    ? qDirection === "fromQ"
      ? qIn.ok
        ? attempt(() => ({ loadedQ: qIn.value, linewidthMHz: linewidthFromQ(carrier.value, qIn.value) }))
        : null
      : lwIn.ok
        ? attempt(() => ({ loadedQ: loadedQFromLinewidth(carrier.value, lwIn.value), linewidthMHz: lwIn.value }))
        : null
    : null;
  const q = qCalc?.ok ? qCalc.value : null;

  const firstError = [index, sizing, thermal, qCalc].find((a) => a && !a.ok);
  const canApply = size !== null && q !== null;

  return { carrier, temp, radius, fsrIn, ngIn, qIn, lwIn, index, ng, size, thermal, q, firstError, canApply };
}
