import type { FindingsCollector } from "../findings-collector";
import { fBand, fGHz, fMHz, pair } from "../format";
import { absInterval, gap, withinGuard } from "../intervals";
import { interiorNyquistEdge, nyquistZone } from "../nyquist";
import type { ChannelAtOffset, OffsetState } from "../offset-state";

/**
 * The rules of a sampled IF (docs/plan-format.md §4.1 "The rules"): `noise-folding` for
 * the chain (L-independent, skipped in map-only mode), `nyquist-straddle`
 * per channel and the pair rule `alias-overlap`. Nothing without a sample
 * rate.
 */
export function samplingRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, mapOnly, channels, foldedOcc } = at;
  const fs = ctx.sampleRate;
  if (fs === null) return;
  const guard = ctx.guard;
  if (!mapOnly) {
    const edge = interiorNyquistEdge(ctx.detectorBand, fs);
    if (edge !== null) {
      const zones = nyquistZone(ctx.detectorBand[1], fs) - nyquistZone(ctx.detectorBand[0], fs) + 1;
      out.add(
        "noise-folding",
        null,
        `Detector ${ctx.detector.id} passes ${fBand(ctx.detectorBand)}, which spans ${zones} Nyquist zones of the ${fGHz(fs)} GHz sample rate (edge at ${fGHz(edge)} GHz); its noise folds onto every slot. Narrow the detector band to the anti-alias filter, inside one zone.`,
        { detectorGHz: pair(ctx.detectorBand), sampleRateGHz: fs, nyquistEdgeGHz: edge, zones },
      );
    }
  }
  // the interior of O itself (docs/plan-format.md §5.4); folding below uses |O|
  const straddles = channels.map((c) => (c.geo ? interiorNyquistEdge(c.geo.occupied, fs) : null));
  channels.forEach((c, i) => {
    const edge = straddles[i];
    if (!c.geo || edge === null || edge === undefined) return;
    const occ = c.geo.occupied;
    const need = Math.min(edge - occ[0], occ[1] - edge);
    out.add(
      "nyquist-straddle",
      i,
      `Occupied IF band ${fBand(occ)} of ${c.ch.channel.id} contains the Nyquist edge ${fGHz(edge)} GHz of the ${fGHz(fs)} GHz sample rate, so part of it folds onto the rest; it must move at least ${fMHz(need)} MHz to clear the edge.`,
      { occupiedGHz: pair(occ), sampleRateGHz: fs, nyquistEdgeGHz: edge, moveMHz: need * 1000 },
    );
  });
  for (let i = 0; i < channels.length; i++) {
    const ci = channels[i] as ChannelAtOffset;
    const fi = foldedOcc[i];
    if (!ci.geo || !fi || straddles[i] !== null) continue;
    const oi = absInterval(ci.geo.occupied);
    const zi = nyquistZone((oi[0] + oi[1]) / 2, fs);
    for (let j = i + 1; j < channels.length; j++) {
      const cj = channels[j] as ChannelAtOffset;
      const fj = foldedOcc[j];
      if (!cj.geo || !fj || straddles[j] !== null) continue;
      const oj = absInterval(cj.geo.occupied);
      const zj = nyquistZone((oj[0] + oj[1]) / 2, fs);
      if (zi === zj || !withinGuard(fi, fj, guard)) continue;
      const g = gap(fi, fj);
      out.add(
        "alias-overlap",
        i,
        `After sampling at ${fGHz(fs)} GHz, ${ci.ch.channel.id} (Nyquist zone ${zi + 1}, folded to ${fBand(fi)}) and ${cj.ch.channel.id} (zone ${zj + 1}, folded to ${fBand(fj)}) ${g >= 0 ? `are ${fMHz(g)} MHz apart` : `overlap by ${fMHz(-g)} MHz`}; the guard is ${fMHz(guard)} MHz (${fMHz(guard - g)} MHz short).`,
        {
          other: cj.ch.channel.id,
          foldedGHz: pair(fi),
          otherFoldedGHz: pair(fj),
          zone: zi + 1,
          otherZone: zj + 1,
          gapMHz: g * 1000,
          guardMHz: guard * 1000,
        },
      );
    }
  }
}
