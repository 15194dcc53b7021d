import { requireInRange } from "./internals/errors";
import { jundtIndexSquared, jundtIndexSquaredSlope } from "./internals/jundt";
import { type LnAxis, zelmonIndexSquared, zelmonIndexSquaredSlope } from "./internals/zelmon";

/** Which published fit supplies n(λ). */
export type IndexModel = { fit: "zelmon"; axis: LnAxis } | { fit: "jundt"; temperatureC: number };

export interface GroupIndexResult {
  /** phase index n */
  n: number;
  /** dn/dλ per µm */
  dnDlambdaPerUm: number;
  /** group index n_g = n − λ·dn/dλ */
  ng: number;
}

/**
 * Group index n_g = n − λ·dn/dλ of LiNbO3 from the analytic derivative of the
 * chosen Sellmeier form (dn/dλ = (dn²/dλ)/(2n)). Material dispersion only:
 * the geometric dispersion of a whispering-gallery mode is not included, so a
 * measured value should override this where one exists.
 */
export function groupIndex(wavelengthUm: number, model: IndexModel): GroupIndexResult {
  requireInRange("wavelengthUm", wavelengthUm, 0.4, 5);
  let n2: number;
  let slope: number;
  if (model.fit === "zelmon") {
    n2 = zelmonIndexSquared(model.axis, wavelengthUm);
    slope = zelmonIndexSquaredSlope(model.axis, wavelengthUm);
  } else {
    requireInRange("temperatureC", model.temperatureC, -50, 300);
    n2 = jundtIndexSquared(wavelengthUm, model.temperatureC);
    slope = jundtIndexSquaredSlope(wavelengthUm, model.temperatureC);
  }
  const n = Math.sqrt(n2);
  const dnDlambdaPerUm = slope / (2 * n);
  return { n, dnDlambdaPerUm, ng: n - wavelengthUm * dnDlambdaPerUm };
}
