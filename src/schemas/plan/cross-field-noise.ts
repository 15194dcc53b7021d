import type { RawIssue } from "./cross-field";
import { formatNumber } from "./messages";

/**
 * The rules between the noise-budget fields of version 2
 * (docs/plan-format.md §14.2 "Rules between the noise fields"): a
 * resonator's intrinsic Q above its loaded Q, and a channel whose receiver
 * temperature is `computed` on a chain whose resonator gives the photon
 * conversion efficiency (entered, or computable from g₀, the mm-wave mode
 * and the intrinsic Q). Written against unknown input like
 * `crossFieldIssues`: a rule fires only when the fields it compares are
 * well formed.
 */

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
function isFiniteNumber(v: unknown): v is number {
  return typeof v === "number" && Number.isFinite(v);
}

/** The fields from which the photon conversion efficiency is computed when it is not entered. */
export const ETA_FROM_FIELDS = ["intrinsicQ", "g0Hz", "mmWaveQ", "mmWaveCouplingRatio"] as const;

/** Whether a resonator (as written) gives its conversion efficiency: entered, or every field to compute it. */
export function resonatorGivesEta(resonator: Record<string, unknown>): boolean {
  if (isFiniteNumber(resonator.conversionEfficiency)) return true;
  return ETA_FROM_FIELDS.every((k) => isFiniteNumber(resonator[k]));
}

export function noiseFieldIssues(input: unknown): RawIssue[] {
  const out: RawIssue[] = [];
  if (!isRecord(input)) return out;
  const resonators = Array.isArray(input.resonators) ? input.resonators : [];
  resonators.forEach((res, i) => {
    if (!isRecord(res)) return;
    const q0 = res.intrinsicQ;
    const ql = res.loadedQ;
    if (isFiniteNumber(q0) && isFiniteNumber(ql) && ql > 0 && !(q0 > ql)) {
      out.push({
        path: ["resonators", i, "intrinsicQ"],
        message: `must exceed loadedQ (${formatNumber(ql)}): the loaded Q includes the intrinsic loss`,
      });
    }
  });
  const chains = Array.isArray(input.chains) ? input.chains : [];
  const channels = Array.isArray(input.channels) ? input.channels : [];
  channels.forEach((channel, i) => {
    if (!isRecord(channel) || channel.receiverKSource !== "computed") return;
    const chain = chains.find((c) => isRecord(c) && c.id === channel.chain);
    if (!isRecord(chain)) return;
    const res = resonators.find((r) => isRecord(r) && r.id === chain.resonator);
    if (!isRecord(res) || resonatorGivesEta(res)) return;
    out.push({
      path: ["channels", i, "receiverKSource"],
      message: `is "computed", but resonator "${String(res.id)}" of chain "${String(chain.id)}" has no conversionEfficiency, nor all of ${ETA_FROM_FIELDS.join(", ")} to compute it from`,
    });
  });
  return out;
}
