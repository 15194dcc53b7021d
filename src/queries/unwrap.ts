/**
 * The agreed API names the fields of each answer but leaves the envelope of
 * list and item answers open (`[...]`, `{ channels: [...] }` or
 * `{ items: [...] }`; an entity alone or `{ channel, revision }`). These two
 * readers accept each of those forms so the screens do not depend on it.
 */

export function unwrapList<T>(body: unknown, name: string): T[] {
  if (Array.isArray(body)) return body as T[];
  if (body && typeof body === "object") {
    const o = body as Record<string, unknown>;
    for (const k of [name, "items", "data"]) if (Array.isArray(o[k])) return o[k] as T[];
  }
  return [];
}

export function unwrapItem<T>(body: unknown, singular: string): T {
  if (body && typeof body === "object") {
    const o = body as Record<string, unknown>;
    const inner = o[singular];
    if (inner && typeof inner === "object" && !Array.isArray(inner)) return inner as T;
  }
  return body as T;
}

export const singularOf: Record<string, string> = {
  lasers: "laser",
  resonators: "resonator",
  detectors: "detector",
  chains: "chain",
  channels: "channel",
  missions: "mission",
};
