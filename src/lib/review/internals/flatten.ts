/** A JSON value as stored in a plan document. */
export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/**
 * Flattens a JSON value to leaf paths in the plan document's notation
 * (`reach[0].minGHz`, `lock.orders`). Empty objects and arrays are leaves
 * so that they are not lost.
 */
export function flatten(value: unknown, prefix = "", out = new Map<string, Json>()): Map<string, Json> {
  if (Array.isArray(value) && value.length > 0) {
    value.forEach((v, i) => flatten(v, `${prefix}[${i}]`, out));
  } else if (value !== null && typeof value === "object" && !Array.isArray(value) && Object.keys(value).length > 0) {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) {
      if (v === undefined) continue;
      flatten(v, prefix === "" ? k : `${prefix}.${k}`, out);
    }
  } else {
    out.set(prefix, (value === undefined ? null : value) as Json);
  }
  return out;
}

/** Structural equality of two flattened leaves (numbers by value, so 0 and -0 are equal). */
export function sameLeaf(a: Json, b: Json): boolean {
  if (a === b) return true;
  return JSON.stringify(a) === JSON.stringify(b);
}
