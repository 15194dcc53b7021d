import "server-only";
import { NOISE_FIELD_DEFAULTS } from "@/schemas/fields";

/**
 * The noise-budget fields (docs/plan-format.md §14.1) carried between rows,
 * API entities and plan documents: the columns are named as the plan's
 * fields, so each mapping picks the same keys from its source. One picker
 * per entity, spread by the mappers, `assemble` and `plan-io`.
 */

type Defaults = typeof NOISE_FIELD_DEFAULTS;
type Picked<K extends keyof Defaults, S> = { [F in keyof Defaults[K]]: F extends keyof S ? S[F] : never };

function picker<K extends keyof Defaults>(kind: K) {
  const keys = Object.keys(NOISE_FIELD_DEFAULTS[kind]) as (keyof Defaults[K] & string)[];
  return <S extends { [F in keyof Defaults[K]]: unknown }>(source: S): Picked<K, S> => {
    const out: Record<string, unknown> = {};
    for (const k of keys) out[k] = source[k];
    return out as Picked<K, S>;
  };
}

export const laserNoise = picker("laser");
export const resonatorNoise = picker("resonator");
export const detectorNoise = picker("detector");
export const chainNoise = picker("chain");
export const channelNoise = picker("channel");
