import type { z } from "zod";
import {
  chainNoiseShape,
  channelNoiseShape,
  detectorNoiseShape,
  formRules as r,
  laserNoiseShape,
  NOISE_FIELD_DEFAULTS,
  resonatorNoiseShape,
} from "./fields";

/**
 * The noise-budget fields of the workspace forms (docs/plan-format.md
 * §14.1), in the form dialect of the shared field rules: `fields` for the
 * update schemas (no defaults, so an omitted field keeps its stored value)
 * and `create` with each field's default for the create schemas.
 */

function withDefaults<S extends Record<string, z.ZodType>>(shape: S, defaults: { [K in keyof S]: unknown }) {
  const out: Record<string, z.ZodType> = {};
  for (const k of Object.keys(shape)) out[k] = (shape[k] as z.ZodType).default(defaults[k] as never);
  return out as { [K in keyof S]: z.ZodDefault<S[K]> };
}

export const noiseFormFields = {
  laser: laserNoiseShape(r),
  resonator: resonatorNoiseShape(r),
  detector: detectorNoiseShape(r),
  chain: chainNoiseShape(r),
  channel: channelNoiseShape(r),
};

export const noiseFormCreate = {
  laser: withDefaults(laserNoiseShape(r), NOISE_FIELD_DEFAULTS.laser),
  resonator: withDefaults(resonatorNoiseShape(r), NOISE_FIELD_DEFAULTS.resonator),
  detector: withDefaults(detectorNoiseShape(r), NOISE_FIELD_DEFAULTS.detector),
  chain: withDefaults(chainNoiseShape(r), NOISE_FIELD_DEFAULTS.chain),
  channel: withDefaults(channelNoiseShape(r), NOISE_FIELD_DEFAULTS.channel),
};

/** A resonator's intrinsic Q must exceed its loaded Q (docs/plan-format.md §14.2). */
export const intrinsicQClears = (v: { intrinsicQ?: number | null; loadedQ: number }) =>
  v.intrinsicQ === null || v.intrinsicQ === undefined || v.intrinsicQ > v.loadedQ;
