import type { LaneItem } from "@/lib/lanes";

/** What a screen reader says for an item: its label, where it is, and its worst finding. */
export function itemAria(it: LaneItem): string {
  const sev = it.severity ? `, ${it.severity}${it.codes.length ? `: ${it.codes.join(", ")}` : ""}` : "";
  const where = it.lo === it.hi ? `at ${it.lo.toFixed(4)} GHz` : `${it.lo.toFixed(4)} to ${it.hi.toFixed(4)} GHz`;
  return `${it.label}, ${where}${sev}`;
}
