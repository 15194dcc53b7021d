/**
 * The fields of every workspace form: label, unit, help text and, for a new
 * entity, a sensible default (the example values of docs/plan-format.md §8.1 "The plan", which
 * describe a 183 GHz water-vapour channel on a 193.4 THz carrier).
 */
export {
  laserGroups,
  laserDefaults,
  resonatorGroups,
  resonatorDefaults,
  detectorGroups,
  detectorDefaults,
} from "./entity-specs/hardware";
export { chainGroups, chainDefaults } from "./entity-specs/chain";
export { channelGroups, channelDefaults } from "./entity-specs/channel";
export { settingsGroups } from "./entity-specs/settings";

/** A choice of a select field: a referenced row's id and the key shown for it. */
export interface RefOption {
  value: string;
  label: string;
}

/** A stored row as form values: strips bookkeeping fields the strict schemas refuse. */
export function rowToFormValue(row: Record<string, unknown>): Record<string, unknown> {
  const { id: _i, version: _v, createdAt: _c, updatedAt: _u, missionId: _m, revision: _r, ...rest } = row;
  return rest;
}

/** The first of `preferred` not yet used, else prefix + the lowest free number (new plan ids). */
export function nextKey(used: readonly string[], prefix: string, preferred: readonly string[] = []): string {
  const taken = new Set(used);
  for (const p of preferred) if (!taken.has(p)) return p;
  for (let i = 1; ; i++) if (!taken.has(`${prefix}${i}`)) return `${prefix}${i}`;
}
