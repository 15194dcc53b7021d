import { FIELD_DEFAULTS, NOISE_FIELD_DEFAULTS } from "../fields";
import type { RawIssue } from "./cross-field";

/**
 * The versions of the plan document (docs/plan-format.md, "A version of the
 * format is named by its format string", and §12.6 "Reading a version 1
 * document"), and the one place that lists which fields a version adds.
 *
 * - `heterolane.plan/1` and `heterolane.plan/2` are both accepted.
 * - A version 1 document carrying a field of version 2 is refused, with the
 *   issue at that field telling the user to change the format line.
 * - Every document is read as the current version: the fields a document
 *   leaves out take the defaults below, and the parsed plan's `format` is
 *   `heterolane.plan/2`, so the engine never looks at the version.
 *
 * A later version 2 field is added here (with its default), in the zod rule
 * of its entity (`../fields.ts`, `document.ts`) and in the format document.
 */

export const PLAN_FORMAT_V1 = "heterolane.plan/1" as const;
/** The current version: what a parsed plan says and what exports write. */
export const PLAN_FORMAT = "heterolane.plan/2" as const;
/** Every accepted `format` string, oldest first. */
export const PLAN_FORMATS = [PLAN_FORMAT_V1, PLAN_FORMAT] as const;
export type PlanFormat = (typeof PLAN_FORMATS)[number];

/**
 * The fields version 2 adds, where they sit (`document` for the top level,
 * `settings`, or the name of a list whose entries carry them), and the value
 * a document without them is read with.
 */
export const VERSION_2_FIELDS = {
  document: {},
  settings: {},
  lasers: { schedule: null },
  resonators: { fsrShiftMHzPerK: FIELD_DEFAULTS.resonator.fsrShiftMHzPerK },
  detectors: {},
  chains: { temperatureExcursionK: FIELD_DEFAULTS.chain.temperatureExcursionK },
  channels: {
    ifFilter: FIELD_DEFAULTS.channel.ifFilter,
    centreToleranceMHz: FIELD_DEFAULTS.channel.centreToleranceMHz,
  },
} as const;
export type Version2Place = keyof typeof VERSION_2_FIELDS;

/**
 * The noise-budget fields version 2 adds (docs/plan-format.md §14), in the
 * same form as `VERSION_2_FIELDS` (the fields of the operating envelope):
 * a version 1 document may carry neither. A parsed entry lists them after
 * its version 1 fields and before the envelope's.
 */
export const VERSION_2_NOISE_FIELDS = {
  document: {},
  settings: {},
  lasers: NOISE_FIELD_DEFAULTS.laser,
  resonators: NOISE_FIELD_DEFAULTS.resonator,
  detectors: NOISE_FIELD_DEFAULTS.detector,
  chains: NOISE_FIELD_DEFAULTS.chain,
  channels: NOISE_FIELD_DEFAULTS.channel,
} as const;

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

/** The message at a version 2 field of a version 1 document. */
export const VERSION_2_FIELD_MESSAGE = `is a field of ${PLAN_FORMAT}: change "format" to "${PLAN_FORMAT}" to use it`;

/**
 * The version 2 fields present in a document whose `format` is
 * `heterolane.plan/1`, one issue at each. Works on any value (a malformed
 * part is skipped; the field rules report it); nothing for other formats.
 */
export function versionIssues(input: unknown): RawIssue[] {
  const out: RawIssue[] = [];
  if (!isRecord(input) || input.format !== PLAN_FORMAT_V1) return out;
  const flag = (obj: unknown, fields: Record<string, unknown>, path: (string | number)[]) => {
    if (!isRecord(obj)) return;
    for (const key of Object.keys(fields)) {
      if (Object.hasOwn(obj, key)) out.push({ path: [...path, key], message: VERSION_2_FIELD_MESSAGE });
    }
  };
  for (const table of [VERSION_2_FIELDS, VERSION_2_NOISE_FIELDS]) {
    for (const [place, fields] of Object.entries(table) as [Version2Place, Record<string, unknown>][]) {
      if (place === "document") flag(input, fields, []);
      else if (place === "settings") flag(input.settings, fields, ["settings"]);
      else {
        const list = input[place];
        if (Array.isArray(list)) list.forEach((entry, i) => flag(entry, fields, [place, i]));
      }
    }
  }
  return out;
}

type Defaults = Record<string, unknown>;

/**
 * An entry with the version 2 fields of its place filled in (the value
 * given, else the default), placed after its version 1 fields in the
 * order of the table, so every parsed plan has the same key order.
 */
export function withVersion2Fields<T extends object, D extends Defaults>(
  entry: T,
  defaults: D,
): Omit<T, keyof D> & { [K in keyof D & keyof T]-?: Exclude<T[K], undefined> } {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(entry)) if (!Object.hasOwn(defaults, k)) out[k] = v;
  for (const [k, d] of Object.entries(defaults)) {
    const v = (entry as Record<string, unknown>)[k];
    out[k] = v === undefined ? d : v;
  }
  return out as Omit<T, keyof D> & { [K in keyof D & keyof T]-?: Exclude<T[K], undefined> };
}
