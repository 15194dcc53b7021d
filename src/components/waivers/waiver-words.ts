import { findingKey } from "@/lib/review/finding-key";

/** A recorded waiver as the screens show it (who, why, when). */
export interface WaiverNote {
  waivedBy: string;
  reason: string;
  waivedAt: string;
}

/** Waivers by finding key (`code|chain|channel`). */
export type WaiverMap = ReadonlyMap<string, WaiverNote>;

/**
 * The error count in words, saying how many are waived: "4 errors, all
 * waived", "4 errors, 1 waived", "1 error, waived", "0 errors".
 */
export function errorCountText(errors: number, waived: number): string {
  const noun = `${errors} error${errors === 1 ? "" : "s"}`;
  const w = Math.max(0, Math.min(waived, errors));
  if (errors === 0 || w === 0) return noun;
  if (w === errors) return errors === 1 ? `${noun}, waived` : `${noun}, all waived`;
  return `${noun}, ${w} waived`;
}

/** "Waived by Erin on 2026-12-03 14:05 UTC: “accepted for the breadboard”" — the hover and focus text of a waived finding. */
export function waiverText(w: WaiverNote): string {
  return `Waived by ${w.waivedBy} on ${w.waivedAt.slice(0, 16).replace("T", " ")} UTC: “${w.reason}”`;
}

/** The waiver of an error finding, or null (warnings and info findings are never waived). */
export function waiverOf(
  f: { code: string; severity: string; chain: string; channel: string | null },
  waivers: WaiverMap | undefined,
): WaiverNote | null {
  if (!waivers || f.severity !== "error") return null;
  return waivers.get(findingKey(f)) ?? null;
}

/** How many of `findings`' errors carry a waiver. */
export function waivedErrorCount(
  findings: readonly { code: string; severity: string; chain: string; channel: string | null }[],
  waivers: WaiverMap | undefined,
): number {
  return findings.filter((f) => waiverOf(f, waivers) !== null).length;
}
